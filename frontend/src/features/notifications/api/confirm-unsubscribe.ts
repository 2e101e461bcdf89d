import { useMutation } from '@tanstack/react-query';
import type { UnsubscribeResult } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

export function confirmUnsubscribe(token: string): Promise<UnsubscribeResult> {
  return apiFetch<UnsubscribeResult>(`/unsubscribe/${encodeURIComponent(token)}`, { method: 'POST' });
}

export function useConfirmUnsubscribe() {
  return useMutation({ mutationFn: confirmUnsubscribe });
}
