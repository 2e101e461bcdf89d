import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { PruningItem } from '../types.js';
import { pruningQueryKey } from './get-pruning-list.js';

export function nominatePage({ docSetId, path, reason }: { docSetId: string; path: string; reason: string }): Promise<PruningItem> {
  return apiFetch<PruningItem>(`/doc-sets/${encodeURIComponent(docSetId)}/pruning/nominations`, { method: 'POST', body: { path, reason } });
}

export function useNominatePage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: nominatePage,
    onSuccess: (_r, { docSetId }) => queryClient.invalidateQueries({ queryKey: pruningQueryKey(docSetId) }),
  });
}
