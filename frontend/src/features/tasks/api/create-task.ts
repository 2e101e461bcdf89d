import { useMutation, useQueryClient } from '@tanstack/react-query';
import { taskItemSchema, type TaskItem, type TaskKind, type TaskPriority } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { tasksQueryKey } from './get-tasks.js';

export interface CreateTaskInput {
  docSetId: string;
  pagePath: string;
  kind: TaskKind;
  title: string;
  details?: string;
  assigneeId?: string | null;
  priority?: TaskPriority;
  dueDate?: string | null;
}

/** POST /api/tasks: one task made by hand. */
export function createTask(input: CreateTaskInput): Promise<TaskItem> {
  return apiFetch('/tasks', taskItemSchema, { method: 'POST', body: input });
}

export function useCreateTask() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: createTask, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
