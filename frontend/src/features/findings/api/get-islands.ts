import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import { runQueryKey } from '../../pages/api/get-run.js';
import { runPath } from '../../pages/api/run-path.js';
import type { Island } from '../types.js';

export function getIslands(docSetId: string, runId: string, signal?: AbortSignal): Promise<{ items: Island[] }> {
  return apiFetch<{ items: Island[] }>(`${runPath(docSetId, runId)}/islands`, { signal });
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
