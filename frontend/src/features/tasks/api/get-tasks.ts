import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { ListResult } from '../../../types/api.js';
import type { Task, TaskFilters } from '../types.js';

export const tasksQueryKey = () => ['tasks'] as const;

export function getTasks(filters: TaskFilters, signal?: AbortSignal): Promise<ListResult<Task>> {
  const { overdue, status, ...rest } = filters;
  return apiFetch<ListResult<Task>>('/tasks', { query: { ...rest, status, overdue: overdue ? 'true' : undefined }, signal });
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
