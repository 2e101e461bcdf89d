import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { DocSetSettings, Run } from '../../../types/api.js';
import { runsQueryKey } from './get-runs.js';

/** Starts an analysis of the latest snapshot; `settings` override the doc set's for this run only. */
export function createRun(docSetId: string, settings?: Partial<DocSetSettings>): Promise<{ run: Run }> {
  return apiFetch<{ run: Run }>(`/doc-sets/${encodeURIComponent(docSetId)}/runs`, {
    method: 'POST',
    body: settings ? { settings } : {},
  });
}

export function useCreateRun(docSetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings?: Partial<DocSetSettings>) => createRun(docSetId, settings),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: runsQueryKey(docSetId) }),
  });
}
