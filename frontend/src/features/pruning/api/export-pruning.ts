import { apiDownload } from '../../../lib/api-client.js';

/** Downloads the approved list: CSV with notes, or a plain list of paths for scripts. */
export function exportPruning(docSetId: string, format: 'csv' | 'txt'): Promise<void> {
  return apiDownload(`/doc-sets/${encodeURIComponent(docSetId)}/pruning/export.${format}`, undefined, `pruning-approved.${format}`);
}
