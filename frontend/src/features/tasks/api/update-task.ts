import { useMutation, useQueryClient } from '@tanstack/react-query';
import { taskItemSchema, type TASK_STATUSES_SET_BY_PEOPLE, type TaskItem, type TaskPriority } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { tasksQueryKey } from './get-tasks.js';

export interface UpdateTaskInput {
  id: string;
  title?: string;
  details?: string;
  assigneeId?: string | null;
  priority?: TaskPriority;
  dueDate?: string | null;
  /** `verified` is set by runs only. */
  status?: (typeof TASK_STATUSES_SET_BY_PEOPLE)[number];
}

export function updateTask({ id, ...patch }: UpdateTaskInput): Promise<TaskItem> {
  return apiFetch(`/tasks/${encodeURIComponent(id)}`, taskItemSchema, { method: 'PATCH', body: patch });
}

export function useUpdateTask() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateTask, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
