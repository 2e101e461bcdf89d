import { useMutation } from '@tanstack/react-query';
import { signInResultSchema, type SignInInput, type SignInResult } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { setSession } from '../../../lib/session.js';

export function signIn(input: SignInInput): Promise<SignInResult> {
  return apiFetch('/auth/sign-in', signInResultSchema, { method: 'POST', body: input });
}

export function useSignIn() {
  return useMutation({
    mutationFn: signIn,
    onSuccess: (result) => setSession(result),
  });
}
