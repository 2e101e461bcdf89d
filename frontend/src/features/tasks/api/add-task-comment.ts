import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { TaskEvent } from '../types.js';
import { taskQueryOptions } from './get-task.js';

export function addTaskComment({ taskId, body }: { taskId: string; body: string }): Promise<TaskEvent> {
  return apiFetch<TaskEvent>(`/tasks/${encodeURIComponent(taskId)}/comments`, { method: 'POST', body: { body } });
}

export function useAddTaskComment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addTaskComment,
    onSuccess: (_event, { taskId }) => queryClient.invalidateQueries({ queryKey: taskQueryOptions(taskId).queryKey }),
  });
}
