import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import { tokensQueryKey } from './get-tokens.js';

/** The secret comes back once, here; the list never shows it again. */
export function createToken(docSetId: string, name: string): Promise<{ token: string }> {
  return apiFetch<{ token: string }>(`/doc-sets/${encodeURIComponent(docSetId)}/tokens`, { method: 'POST', body: { name } });
}

export function useCreateToken(docSetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (name: string) => createToken(docSetId, name),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: tokensQueryKey(docSetId) }),
  });
}
