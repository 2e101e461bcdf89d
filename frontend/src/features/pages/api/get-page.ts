import { queryOptions, useQuery } from '@tanstack/react-query';
import { pageDetailSchema, type PageDetail } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { runQueryKey } from './get-run.js';
import { runPath } from '../../../lib/run-path.js';

export function getPage(docSetId: string, runId: string, path: string, signal?: AbortSignal): Promise<PageDetail> {
  return apiFetch(`${runPath(docSetId, runId)}/page`, pageDetailSchema, { query: { path }, signal });
}

export function pageQueryOptions(docSetId: string, runId: string, path: string) {
  return queryOptions({
    queryKey: [...runQueryKey(docSetId, runId), 'page', path] as const,
    queryFn: ({ signal }) => getPage(docSetId, runId, path, signal),
  });
}

export function usePage(docSetId: string, runId: string, path: string) {
  return useQuery({ ...pageQueryOptions(docSetId, runId, path), enabled: path !== '' });
}
