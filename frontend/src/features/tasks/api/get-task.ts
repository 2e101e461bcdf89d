import { queryOptions, useQuery } from '@tanstack/react-query';
import { taskDetailSchema, type TaskDetail } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { tasksQueryKey } from './get-tasks.js';

export function getTask(taskId: string, signal?: AbortSignal): Promise<TaskDetail> {
  return apiFetch(`/tasks/${encodeURIComponent(taskId)}`, taskDetailSchema, { signal });
}

export function taskQueryOptions(taskId: string) {
  return queryOptions({ queryKey: [...tasksQueryKey(), 'detail', taskId] as const, queryFn: ({ signal }) => getTask(taskId, signal) });
}

export function useTask(taskId: string | null) {
  return useQuery({ ...taskQueryOptions(taskId ?? ''), enabled: !!taskId });
}
