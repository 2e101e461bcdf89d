import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import { scheduleQueryKey } from './get-schedule.js';

export interface RunNowResult {
  started: boolean;
  /** Why the job was not started, in a sentence from the server. */
  reason?: string;
}

export function runNightlyNow(): Promise<RunNowResult> {
  return apiFetch<RunNowResult>('/schedule/run-now', { method: 'POST' });
}

export function useRunNightlyNow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: runNightlyNow,
    // The refetched status says `running`, which switches on polling until the job is done.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: scheduleQueryKey() }),
  });
}
