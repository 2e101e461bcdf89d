import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiTokenListSchema, type ApiToken } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { docSetQueryKey } from './get-doc-set.js';

export const tokensQueryKey = (docSetId: string) => [...docSetQueryKey(docSetId), 'tokens'] as const;

export async function getTokens(docSetId: string, signal?: AbortSignal): Promise<ApiToken[]> {
  const result = await apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/tokens`, apiTokenListSchema, { signal });
  return result.items;
}

export function tokensQueryOptions(docSetId: string) {
  return queryOptions({ queryKey: tokensQueryKey(docSetId), queryFn: ({ signal }) => getTokens(docSetId, signal) });
}

export function useTokens(docSetId: string) {
  return useQuery(tokensQueryOptions(docSetId));
}
