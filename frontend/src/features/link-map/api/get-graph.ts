import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch, ApiError } from '../../../lib/api-client.js';
import { runQueryKey } from '../../pages/api/get-run.js';
import { runPath } from '../../pages/api/run-path.js';
import type { MapGraph } from '../types.js';

export interface GraphQuery {
  folder: string;
  folderDepth: number;
  limit: number;
}

export function getGraph(docSetId: string, runId: string, query: GraphQuery, signal?: AbortSignal): Promise<MapGraph> {
  return apiFetch<MapGraph>(`${runPath(docSetId, runId)}/graph`, { query: { ...query }, signal });
}

export function graphQueryOptions(docSetId: string, runId: string, query: GraphQuery) {
  return queryOptions({
    queryKey: [...runQueryKey(docSetId, runId), 'graph', query] as const,
    queryFn: ({ signal }) => getGraph(docSetId, runId, query, signal),
    // A 404 means the server has no graph route yet (or no run): retrying will not change that.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
  });
}

export function useGraph(docSetId: string, runId: string, query: GraphQuery) {
  return useQuery(graphQueryOptions(docSetId, runId, query));
}
