import { queryOptions, useQuery } from '@tanstack/react-query';
import { docSetListSchema, type DocSet } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

/** Root of every doc-set key: invalidating it refreshes lists and everything under each doc set. */
export const docSetsQueryKey = () => ['doc-sets'] as const;

/** Every doc set (the server answers them all on one page). */
export async function getDocSets(signal?: AbortSignal): Promise<DocSet[]> {
  const result = await apiFetch('/doc-sets', docSetListSchema, { signal });
  return result.items;
}

export function docSetsQueryOptions() {
  return queryOptions({ queryKey: [...docSetsQueryKey(), 'list'] as const, queryFn: ({ signal }) => getDocSets(signal) });
}

export function useDocSets() {
  return useQuery(docSetsQueryOptions());
}
