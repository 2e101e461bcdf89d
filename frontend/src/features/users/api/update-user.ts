import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userDetailsSchema, type UpdateUserInput, type UserDetails } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { usersQueryKey } from './get-users.js';

export function updateUser({ id, ...patch }: UpdateUserInput & { id: string }): Promise<UserDetails> {
  return apiFetch(`/users/${encodeURIComponent(id)}`, userDetailsSchema, { method: 'PATCH', body: patch });
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey() }),
  });
}
