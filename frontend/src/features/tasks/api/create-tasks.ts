import { useMutation, useQueryClient } from '@tanstack/react-query';
import { taskBatchSchema, type TaskItem, type TaskKind, type TaskPriority } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { tasksQueryKey } from './get-tasks.js';

export interface CreateTasksInput {
  docSetId: string;
  kind: TaskKind;
  pagePaths: string[];
  title?: string;
  details?: string;
  assigneeId?: string | null;
  priority?: TaskPriority;
  dueDate?: string | null;
}

/** POST /api/tasks/bulk: one task per page, details prefilled by the server from the latest run. */
export function createTasks(input: CreateTasksInput): Promise<{ items: TaskItem[] }> {
  return apiFetch('/tasks/bulk', taskBatchSchema, { method: 'POST', body: input });
}

export function useCreateTasks() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createTasks, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
