import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { Role, User } from '../../../types/api.js';
import { usersQueryKey } from './get-users.js';

export interface CreateUserInput {
  email: string;
  name: string;
  role: Role;
  password: string;
}

export function createUser(input: CreateUserInput): Promise<User> {
  return apiFetch<User>('/users', { method: 'POST', body: input });
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey() }),
  });
}
