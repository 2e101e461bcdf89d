import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { Priority, Task, TaskStatus } from '../types.js';
import { tasksQueryKey } from './get-tasks.js';

export interface UpdateTaskInput {
  id: string;
  title?: string;
  details?: string;
  assigneeId?: string | null;
  priority?: Priority;
  dueDate?: string | null;
  status?: TaskStatus;
}

export function updateTask({ id, ...patch }: UpdateTaskInput): Promise<Task> {
  return apiFetch<Task>(`/tasks/${encodeURIComponent(id)}`, { method: 'PATCH', body: patch });
}

export function useUpdateTask() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateTask, onSuccess: () => queryClient.invalidateQueries({ queryKey: tasksQueryKey() }) });
}
