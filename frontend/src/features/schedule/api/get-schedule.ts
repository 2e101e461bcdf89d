import { queryOptions, useQuery } from '@tanstack/react-query';
import { scheduleStatusSchema, type ScheduleStatus } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

/** While the job runs the screen asks again this often; a nightly job takes minutes, so 3 s is plenty. */
export const RUNNING_POLL_MS = 3_000;

export const scheduleQueryKey = () => ['schedule'] as const;

export function getSchedule(signal?: AbortSignal): Promise<ScheduleStatus> {
  return apiFetch('/schedule', scheduleStatusSchema, { signal });
}

/** A "Run now" the server accepted: when, and the `lastStartedAt` seen before it. */
export interface RunNowPress {
  at: number;
  baseline: string | null;
}

/** How long to keep asking for a job that was accepted but has not shown up as running. */
export const START_WAIT_MS = 60_000;

/** The job starts in the background just after the 202, so the first status may not show it running yet. */
export function isAwaitingStart(press: RunNowPress | null, status: ScheduleStatus | undefined, now = Date.now()): boolean {
  if (!press || !status || status.running) return false;
  return status.lastStartedAt === press.baseline && now - press.at < START_WAIT_MS;
}

export function scheduleQueryOptions(press: RunNowPress | null = null) {
  return queryOptions({
    queryKey: scheduleQueryKey(),
    queryFn: ({ signal }) => getSchedule(signal),
    refetchInterval: (query) => (query.state.data?.running || isAwaitingStart(press, query.state.data) ? RUNNING_POLL_MS : false),
  });
}

export function useSchedule(press: RunNowPress | null = null) {
  return useQuery(scheduleQueryOptions(press));
}
