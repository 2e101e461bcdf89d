import { useMutation, useQueryClient } from '@tanstack/react-query';
import { taskItemSchema, type TaskItem, type TaskPriority, type TaskStatus } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { tasksQueryKey } from './get-tasks.js';

export interface UpdateTaskInput {
  id: string;
  title?: string;
  details?: string;
  assigneeId?: string | null;
  priority?: TaskPriority;
  dueDate?: string | null;
  status?: TaskStatus;
}

export function updateTask({ id, ...patch }: UpdateTaskInput): Promise<TaskItem> {
  return apiFetch(`/tasks/${encodeURIComponent(id)}`, taskItemSchema, { method: 'PATCH', body: patch });
}

export function useUpdateTask() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateTask, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
