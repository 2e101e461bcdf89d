import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { Priority, Task, TaskKind } from '../types.js';
import { tasksQueryKey } from './get-tasks.js';

export interface CreateTaskInput {
  docSetId: string;
  pagePath: string;
  kind: TaskKind;
  title: string;
  details?: string;
  assigneeId?: string | null;
  priority?: Priority;
  dueDate?: string | null;
}

/** POST /api/tasks: one task made by hand. */
export function createTask(input: CreateTaskInput): Promise<Task> {
  return apiFetch<Task>('/tasks', { method: 'POST', body: input });
}

export function useCreateTask() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createTask, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
