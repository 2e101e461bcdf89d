import { useMutation } from '@tanstack/react-query';
import { apiDownload, type Query } from '../../../lib/api-client.js';
import { runPath } from '../../../lib/run-path.js';

export interface ExportRequest {
  /** `pages`, `links`, ...: which rows the server writes. */
  view: string;
  /** The same filters as the list on screen, without paging. */
  filters: Query;
}

export function exportCsv(docSetId: string, runId: string, { view, filters }: ExportRequest): Promise<void> {
  const { page: _page, pageSize: _pageSize, ...rest } = filters;
  return apiDownload(`${runPath(docSetId, runId)}/export.csv`, { ...rest, view }, `${view}.csv`);
}

/** A download, not cached data: a mutation gives pending and error states for the button. */
export function useExportCsv(docSetId: string, runId: string) {
  return useMutation({ mutationFn: (request: ExportRequest) => exportCsv(docSetId, runId, request) });
}
