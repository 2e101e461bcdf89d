import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { BulkCreateTasksRequest } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import type { Task } from '../types.js';
import { tasksQueryKey } from './get-tasks.js';

export type CreateTasksInput = BulkCreateTasksRequest;

/** POST /api/tasks/bulk: tasks holding exactly the selected pages or links, one per row or one for all. */
export function createTasks(input: CreateTasksInput): Promise<{ items: Task[] }> {
  return apiFetch<{ items: Task[] }>('/tasks/bulk', { method: 'POST', body: input });
}

export function useCreateTasks() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createTasks, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
