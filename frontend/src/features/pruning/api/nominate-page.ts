import { useMutation, useQueryClient } from '@tanstack/react-query';
import { pruningItemSchema, type PruningItem } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { pruningQueryKey } from './get-pruning-list.js';

export function nominatePage({ docSetId, path, reason }: { docSetId: string; path: string; reason: string }): Promise<PruningItem> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/pruning/nominations`, pruningItemSchema, {
    method: 'POST',
    body: { path, reason },
  });
}

export function useNominatePage() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: nominatePage,
    onSuccess: (_r, { docSetId }) => queryClient.invalidateQueries({ queryKey: pruningQueryKey(docSetId) }),
  });
}
