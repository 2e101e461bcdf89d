import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { ListResult, PageItem } from '../../../types/api.js';
import { docSetQueryKey } from './get-doc-set.js';

export function getTopPages(docSetId: string, runId: string, limit: number, signal?: AbortSignal): Promise<ListResult<PageItem>> {
  return apiFetch<ListResult<PageItem>>(`/doc-sets/${encodeURIComponent(docSetId)}/runs/${encodeURIComponent(runId)}/pages`, {
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
