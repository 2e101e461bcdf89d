import { useMutation, useQueryClient } from '@tanstack/react-query';
import { noContentSchema } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { clearSession } from '../../../lib/session.js';

export function signOut(): Promise<void> {
  return apiFetch('/auth/sign-out', noContentSchema, { method: 'POST' });
}

export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOut,
    // Sign out locally even when the server call fails: the user asked to leave.
    onSettled: () => {
      clearSession();
      queryClient.clear();
    },
  });
}
