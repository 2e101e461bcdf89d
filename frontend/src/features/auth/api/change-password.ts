import { useMutation } from '@tanstack/react-query';
import { signInResultSchema, type ChangePasswordInput, type SignInResult } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { setSession } from '../../../lib/session.js';

/** The server revokes every older token on a password change and answers with a new one. */
export function changePassword(input: ChangePasswordInput): Promise<SignInResult> {
  return apiFetch('/me/password', signInResultSchema, { method: 'POST', body: input });
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword, onSuccess: (result) => setSession(result) });
}
