import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { Role, User } from '../../../types/api.js';
import { usersQueryKey } from './get-users.js';

export interface UpdateUserInput {
  id: string;
  role?: Role;
  disabled?: boolean;
}

export function updateUser({ id, ...patch }: UpdateUserInput): Promise<User> {
  return apiFetch<User>(`/users/${encodeURIComponent(id)}`, { method: 'PATCH', body: patch });
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey() }),
  });
}
