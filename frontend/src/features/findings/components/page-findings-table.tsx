import { useMemo } from 'react';
import type { ColumnDef } from '@tanstack/react-table';
import { Link, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { DataTable } from '../../../components/ui/data-table.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { usePages } from '../../pages/api/get-pages.js';
import { formatCount, formatScore, pageDetailHref } from '../../pages/components/format.js';
import type { FixTaskKind } from '../../pages/components/work-hook-dialog.js';
import type { PageFlag, RunPageItem } from '@linkloom/shared';
import { BulkActionBar } from './bulk-action-bar.js';
import { downloadCsv, toCsv } from './csv.js';
import { pageReason } from './findings-views.js';
import type { FindingsTableProps } from './findings-table-props.js';
import { useRowSelection } from './use-row-selection.js';

const TASK_FOR_FLAG: Record<PageFlag, FixTaskKind> = {
  orphan: 'add-inbound-links',
  unreachable: 'make-reachable',
  deep: 'add-inbound-links',
  'dead-end': 'add-outbound-links',
  island: 'make-reachable',
};
const pagePath = (row: RunPageItem) => row.path;

function columns(docSetId: string, runId: string, flag: PageFlag): ColumnDef<RunPageItem>[] {
  return [
    {
      id: 'path',
      header: 'Page',
      accessorKey: 'path',
      enableHiding: false,
      cell: ({ row }) => (
        <>
          <Link component={RouterLink} to={pageDetailHref(docSetId, row.original.path, runId)}>
            {row.original.title || row.original.path}
          </Link>
          <Typography variant="caption" color="text.secondary" component="div">
            {row.original.path}
          </Typography>
        </>
      ),
    },
    { id: 'reason', header: 'Why it is listed', enableSorting: false, cell: ({ row }) => pageReason(row.original, flag) },
    { id: 'inboundCount', header: 'Inbound', accessorKey: 'inboundCount', meta: { align: 'right', sortDescFirst: true } },
    {
      id: 'depth',
      header: 'Depth',
      accessorKey: 'depth',
      cell: ({ getValue }) => formatCount(getValue() as number | null),
      meta: { align: 'right' },
    },
    {
      id: 'stationaryScore',
      header: 'Score',
      accessorKey: 'stationaryScore',
      cell: ({ getValue }) => formatScore(getValue() as number),
      meta: { align: 'right', sortDescFirst: true },
    },
  ];
}

/** Pages carrying one finding flag, with the reason for each and bulk actions. */
export function PageFindingsTable({ docSetId, runId, kind, table, label }: FindingsTableProps) {
  const flag = kind.flag as PageFlag;
  const pages = usePages(docSetId, runId, {
    page: table.page,
    pageSize: table.pageSize,
    sort: table.sort || '-stationaryScore',
    flags: [flag],
  });
  const selection = useRowSelection(pagePath);
  const cols = useMemo(() => columns(docSetId, runId, flag), [docSetId, runId, flag]);
  const exportSelected = () =>
    downloadCsv(
      `${flag}-pages.csv`,
      toCsv(
        ['path', 'title', 'reason', 'inboundCount', 'depth', 'stationaryScore'],
        selection.rows.map((r) => [r.path, r.title, pageReason(r, flag), r.inboundCount, r.depth, r.stationaryScore]),
      ),
    );
  return (
    <>
      <BulkActionBar
        count={selection.ids.length}
        onExport={exportSelected}
        onClear={selection.clear}
        taskRequest={{ kind: TASK_FOR_FLAG[flag], pagePaths: selection.ids }}
      />
      <DataTable
        label={label}
        columns={cols}
        data={pages.data?.items}
        total={pages.data?.total ?? 0}
        page={table.page}
        pageSize={table.pageSize}
        sort={table.sort || '-stationaryScore'}
        onPageChange={table.onPageChange}
        onPageSizeChange={table.onPageSizeChange}
        onSortChange={table.onSortChange}
        loading={pages.isFetching}
        error={pages.error}
        onRetry={() => pages.refetch()}
        rowId={pagePath}
        selectable
        selectedIds={selection.ids}
        onSelectionChange={(ids) => selection.onSelectionChange(ids, pages.data?.items ?? [])}
        emptyState={
          <EmptyState title={`No ${kind.label.toLowerCase()} in this run`} hint="Nothing to fix here. Check the other views in the list." />
        }
      />
    </>
  );
}
