import type { SubKind } from './findings-views.js';

/** Paging and sort of a findings table, kept in the URL by the route. */
export interface FindingsTableState {
  page: number;
  pageSize: number;
  sort: string;
  onPageChange: (page: number) => void;
  onPageSizeChange: (pageSize: number) => void;
  onSortChange: (sort: string) => void;
}

export interface FindingsTableProps {
  docSetId: string;
  runId: string;
  kind: SubKind;
  table: FindingsTableState;
  label: string;
}
