import { useMutation, useQueryClient } from '@tanstack/react-query';
import { taskBatchSchema, type BulkCreateTasksRequest, type TaskItem } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { tasksQueryKey } from './get-tasks.js';

export type CreateTasksInput = BulkCreateTasksRequest;

/** POST /api/tasks/bulk: tasks holding exactly the selected pages or links, one per row or one for all. */
export function createTasks(input: CreateTasksInput): Promise<{ items: TaskItem[] }> {
  return apiFetch('/tasks/bulk', taskBatchSchema, { method: 'POST', body: input });
}

export function useCreateTasks() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createTasks, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
