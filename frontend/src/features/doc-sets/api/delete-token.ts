import { useMutation, useQueryClient } from '@tanstack/react-query';
import { noContentSchema } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { tokensQueryKey } from './get-tokens.js';

export function deleteToken(docSetId: string, tokenId: string): Promise<void> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/tokens/${encodeURIComponent(tokenId)}`, noContentSchema, { method: 'DELETE' });
}

export function useDeleteToken(docSetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (tokenId: string) => deleteToken(docSetId, tokenId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: tokensQueryKey(docSetId) }),
  });
}
