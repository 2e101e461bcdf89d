import { useMutation, useQueryClient } from '@tanstack/react-query';
import { runNowResultSchema, type RunNowResult } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { scheduleQueryKey } from './get-schedule.js';

export function runNightlyNow(): Promise<RunNowResult> {
  return apiFetch('/schedule/run-now', runNowResultSchema, { method: 'POST' });
}

export function useRunNightlyNow() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: runNightlyNow,
    // The refetched status says `running`, which switches on polling until the job is done.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: scheduleQueryKey() }),
  });
}
