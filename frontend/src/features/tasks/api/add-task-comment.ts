import { useMutation, useQueryClient } from '@tanstack/react-query';
import { taskEventSchema, type TaskEventItem } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { taskQueryOptions } from './get-task.js';

export function addTaskComment({ taskId, body }: { taskId: string; body: string }): Promise<TaskEventItem> {
  return apiFetch(`/tasks/${encodeURIComponent(taskId)}/comments`, taskEventSchema, { method: 'POST', body: { body } });
}

export function useAddTaskComment() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: addTaskComment,
    onSuccess: (_event, { taskId }) => queryClient.invalidateQueries({ queryKey: taskQueryOptions(taskId).queryKey }),
  });
}
