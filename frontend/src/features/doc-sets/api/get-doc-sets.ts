import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { DocSet, ListResult } from '../../../types/api.js';

/** Root of every doc-set key: invalidating it refreshes lists and everything under each doc set. */
export const docSetsQueryKey = () => ['doc-sets'] as const;

/** The contract says "lists" are paged; accept a bare array too so an early back end still works. */
export async function getDocSets(signal?: AbortSignal): Promise<DocSet[]> {
  const result = await apiFetch<ListResult<DocSet> | DocSet[]>('/doc-sets', { query: { page: 1, pageSize: 500 }, signal });
  return Array.isArray(result) ? result : result.items;
}

export function docSetsQueryOptions() {
  return queryOptions({ queryKey: [...docSetsQueryKey(), 'list'] as const, queryFn: ({ signal }) => getDocSets(signal) });
}

export function useDocSets() {
  return useQuery(docSetsQueryOptions());
}
