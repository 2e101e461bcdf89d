import { useMutation } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import { setSession } from '../../../lib/session.js';
import type { SignInResult } from '../../../types/api.js';

export interface SignInInput {
  email: string;
  password: string;
}

export function signIn(input: SignInInput): Promise<SignInResult> {
  return apiFetch<SignInResult>('/auth/sign-in', { method: 'POST', body: input });
}

export function useSignIn() {
  return useMutation({
    mutationFn: signIn,
    onSuccess: (result) => setSession(result),
  });
}
