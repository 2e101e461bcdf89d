import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { ApiToken, ListResult } from '../../../types/api.js';
import { docSetQueryKey } from './get-doc-set.js';

export const tokensQueryKey = (docSetId: string) => [...docSetQueryKey(docSetId), 'tokens'] as const;

export async function getTokens(docSetId: string, signal?: AbortSignal): Promise<ApiToken[]> {
  const result = await apiFetch<ListResult<ApiToken> | ApiToken[]>(`/doc-sets/${encodeURIComponent(docSetId)}/tokens`, { signal });
  return Array.isArray(result) ? result : result.items;
}

export function tokensQueryOptions(docSetId: string) {
  return queryOptions({ queryKey: tokensQueryKey(docSetId), queryFn: ({ signal }) => getTokens(docSetId, signal) });
}

export function useTokens(docSetId: string) {
  return useQuery(tokensQueryOptions(docSetId));
}
