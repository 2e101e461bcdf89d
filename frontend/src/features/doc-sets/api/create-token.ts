import { useMutation, useQueryClient } from '@tanstack/react-query';
import { createdApiTokenSchema, type CreatedApiToken } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { tokensQueryKey } from './get-tokens.js';

/** The secret comes back once, here; the list never shows it again. */
export function createToken(docSetId: string, name: string): Promise<CreatedApiToken> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/tokens`, createdApiTokenSchema, { method: 'POST', body: { name } });
}

export function useCreateToken(docSetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (name: string) => createToken(docSetId, name),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: tokensQueryKey(docSetId) }),
  });
}
