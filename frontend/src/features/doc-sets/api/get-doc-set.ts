import { queryOptions, useQuery } from '@tanstack/react-query';
import { docSetSchema, type DocSet } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { docSetsQueryKey } from './get-doc-sets.js';

/** Key prefix of everything belonging to one doc set (runs, snapshots, tokens...). */
export const docSetQueryKey = (docSetId: string) => [...docSetsQueryKey(), docSetId] as const;

export function getDocSet(docSetId: string, signal?: AbortSignal): Promise<DocSet> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}`, docSetSchema, { signal });
}

export function docSetQueryOptions(docSetId: string) {
  return queryOptions({ queryKey: [...docSetQueryKey(docSetId), 'detail'] as const, queryFn: ({ signal }) => getDocSet(docSetId, signal) });
}

export function useDocSet(docSetId: string) {
  return useQuery(docSetQueryOptions(docSetId));
}
