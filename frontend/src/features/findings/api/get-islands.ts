import { queryOptions, useQuery } from '@tanstack/react-query';
import { islandListSchema, type Island } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { runQueryKey } from '../../pages/api/get-run.js';
import { runPath } from '../../../lib/run-path.js';

/** Islands are few (each is a group of pages), so one page of the largest size holds them all. */
export async function getIslands(docSetId: string, runId: string, signal?: AbortSignal): Promise<Island[]> {
  const result = await apiFetch(`${runPath(docSetId, runId)}/islands`, islandListSchema, { query: { pageSize: 500 }, signal });
  return result.items;
}

export function islandsQueryOptions(docSetId: string, runId: string) {
  return queryOptions({
    queryKey: [...runQueryKey(docSetId, runId), 'islands'] as const,
    queryFn: ({ signal }) => getIslands(docSetId, runId, signal),
  });
}

export function useIslands(docSetId: string, runId: string, enabled = true) {
  return useQuery({ ...islandsQueryOptions(docSetId, runId), enabled });
}
