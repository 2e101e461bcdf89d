import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userDetailsSchema, type CreateUserInput, type UserDetails } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { usersQueryKey } from './get-users.js';

export function createUser(input: CreateUserInput): Promise<UserDetails> {
  return apiFetch('/users', userDetailsSchema, { method: 'POST', body: input });
}

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey() }),
  });
}
