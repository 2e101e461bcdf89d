import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { Priority, Task, TaskKind } from '../types.js';
import { tasksQueryKey } from './get-tasks.js';

export interface CreateTasksInput {
  docSetId: string;
  kind: TaskKind;
  pagePaths: string[];
  title?: string;
  details?: string;
  assigneeId?: string | null;
  priority?: Priority;
  dueDate?: string | null;
}

/** POST /api/tasks/bulk: one task per page, details prefilled by the server from the latest run. */
export function createTasks(input: CreateTasksInput): Promise<{ items: Task[] }> {
  return apiFetch<{ items: Task[] }>('/tasks/bulk', { method: 'POST', body: input });
}

export function useCreateTasks() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createTasks, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
