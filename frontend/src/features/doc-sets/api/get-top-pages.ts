import { queryOptions, useQuery } from '@tanstack/react-query';
import { runPageListSchema, type RunPageList } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { docSetQueryKey } from './get-doc-set.js';

export function getTopPages(docSetId: string, runId: string, limit: number, signal?: AbortSignal): Promise<RunPageList> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/runs/${encodeURIComponent(runId)}/pages`, runPageListSchema, {
    query: { sort: '-stationaryScore', page: 1, pageSize: limit },
    signal,
  });
}

export function topPagesQueryOptions(docSetId: string, runId: string, limit = 10) {
  return queryOptions({
    queryKey: [...docSetQueryKey(docSetId), 'runs', runId, 'top-pages', limit] as const,
    queryFn: ({ signal }) => getTopPages(docSetId, runId, limit, signal),
  });
}

export function useTopPages(docSetId: string, runId: string | null, limit = 10) {
  return useQuery({ ...topPagesQueryOptions(docSetId, runId ?? '', limit), enabled: Boolean(runId) });
}
