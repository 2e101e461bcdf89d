import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { taskListSchema, type ListResult, type TaskItem } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import type { TaskFilters } from '../components/task-labels.js';

export const tasksQueryKey = () => ['tasks'] as const;

export function getTasks(filters: TaskFilters, signal?: AbortSignal): Promise<ListResult<TaskItem>> {
  const { overdue, status, ...rest } = filters;
  return apiFetch('/tasks', taskListSchema, { query: { ...rest, status, overdue: overdue ? 'true' : undefined }, signal });
}

export function tasksQueryOptions(filters: TaskFilters) {
  return queryOptions({
    queryKey: [...tasksQueryKey(), 'list', filters] as const,
    queryFn: ({ signal }) => getTasks(filters, signal),
    placeholderData: keepPreviousData,
  });
}

export function useTasks(filters: TaskFilters, enabled = true) {
  return useQuery({ ...tasksQueryOptions(filters), enabled });
}
