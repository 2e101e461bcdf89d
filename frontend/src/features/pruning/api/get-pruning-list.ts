import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { pruningListSchema, type PruningList } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import type { PruningStatusFilter } from '../components/pruning-labels.js';

export const pruningQueryKey = (docSetId: string) => ['pruning', docSetId] as const;

export interface PruningQuery {
  status: PruningStatusFilter;
  page: number;
  pageSize: number;
}

export function getPruningList(docSetId: string, query: PruningQuery, signal?: AbortSignal): Promise<PruningList> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/pruning`, pruningListSchema, {
    query: { ...query, status: query.status || undefined },
    signal,
  });
}

export function pruningListQueryOptions(docSetId: string, query: PruningQuery) {
  return queryOptions({
    queryKey: [...pruningQueryKey(docSetId), query] as const,
    queryFn: ({ signal }) => getPruningList(docSetId, query, signal),
    placeholderData: keepPreviousData,
  });
}

export function usePruningList(docSetId: string, query: PruningQuery) {
  return useQuery(pruningListQueryOptions(docSetId, query));
}
