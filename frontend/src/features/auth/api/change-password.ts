import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';

export interface ChangePasswordInput {
  currentPassword: string;
  newPassword: string;
}

export function changePassword(input: ChangePasswordInput): Promise<unknown> {
  return apiFetch('/me/password', { method: 'POST', body: input });
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
