import { useMutation, useQueryClient } from '@tanstack/react-query';
import { runAcceptedSchema, type DocSetSettingsPatch, type Run } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { runsQueryKey } from './get-runs.js';

/** Starts an analysis of the latest snapshot; `settings` override the doc set's for this run only. */
export function createRun(docSetId: string, settings?: DocSetSettingsPatch): Promise<{ run: Run }> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/runs`, runAcceptedSchema, {
    method: 'POST',
    body: settings ? { settings } : {},
  });
}

export function useCreateRun(docSetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings?: DocSetSettingsPatch) => createRun(docSetId, settings),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: runsQueryKey(docSetId) }),
  });
}
