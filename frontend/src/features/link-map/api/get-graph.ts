import { queryOptions, useQuery } from '@tanstack/react-query';
import { linkMapSchema, type LinkMap } from '@linkloom/shared';
import { apiFetch, ApiError } from '../../../lib/api-client.js';
import { runQueryKey } from '../../pages/api/get-run.js';
import { runPath } from '../../../lib/run-path.js';

export interface GraphQuery {
  folder: string;
  folderDepth: number;
  limit: number;
}

export function getGraph(docSetId: string, runId: string, query: GraphQuery, signal?: AbortSignal): Promise<LinkMap> {
  return apiFetch(`${runPath(docSetId, runId)}/graph`, linkMapSchema, { query: { ...query }, signal });
}

export function graphQueryOptions(docSetId: string, runId: string, query: GraphQuery) {
  return queryOptions({
    queryKey: [...runQueryKey(docSetId, runId), 'graph', query] as const,
    queryFn: ({ signal }) => getGraph(docSetId, runId, query, signal),
    // A 404 means there is no such run (or no finished one yet): retrying will not change that.
    retry: (count, error) => !(error instanceof ApiError && error.status === 404) && count < 2,
  });
}

export function useGraph(docSetId: string, runId: string, query: GraphQuery) {
  return useQuery(graphQueryOptions(docSetId, runId, query));
}
