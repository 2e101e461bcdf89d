import { useMutation, useQueryClient } from '@tanstack/react-query';
import { pruningDecisionsResultSchema, type PruningDecision } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { pruningQueryKey } from './get-pruning-list.js';

export interface DecidePruningInput {
  docSetId: string;
  /** The list version the editor looked at; a newer list answers 409. */
  version: number;
  decisions: { path: string; decision: PruningDecision; note: string }[];
}

export function decidePruning({ docSetId, ...body }: DecidePruningInput): Promise<{ version: number; decided: number }> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/pruning/decisions`, pruningDecisionsResultSchema, { method: 'POST', body });
}

export function useDecidePruning() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: decidePruning,
    // Also after a 409, so the editor sees the newer list.
    onSettled: (_r, _e, { docSetId }) => queryClient.invalidateQueries({ queryKey: pruningQueryKey(docSetId) }),
  });
}
