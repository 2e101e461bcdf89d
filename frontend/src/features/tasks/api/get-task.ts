import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { TaskDetail } from '../types.js';
import { tasksQueryKey } from './get-tasks.js';

export function getTask(taskId: string, signal?: AbortSignal): Promise<TaskDetail> {
  return apiFetch<TaskDetail>(`/tasks/${encodeURIComponent(taskId)}`, { signal });
}

export function taskQueryOptions(taskId: string) {
  return queryOptions({ queryKey: [...tasksQueryKey(), 'detail', taskId] as const, queryFn: ({ signal }) => getTask(taskId, signal) });
}

export function useTask(taskId: string | null) {
  return useQuery({ ...taskQueryOptions(taskId ?? ''), enabled: !!taskId });
}
