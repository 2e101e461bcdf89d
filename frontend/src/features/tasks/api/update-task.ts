import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { Priority, Task, TASK_STATUSES_SET_BY_PEOPLE } from '../types.js';
import { tasksQueryKey } from './get-tasks.js';

export interface UpdateTaskInput {
  id: string;
  title?: string;
  details?: string;
  assigneeId?: string | null;
  priority?: Priority;
  dueDate?: string | null;
  /** `verified` is set by runs only. */
  status?: (typeof TASK_STATUSES_SET_BY_PEOPLE)[number];
}

export function updateTask({ id, ...patch }: UpdateTaskInput): Promise<Task> {
  return apiFetch<Task>(`/tasks/${encodeURIComponent(id)}`, { method: 'PATCH', body: patch });
}

export function useUpdateTask() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateTask, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
