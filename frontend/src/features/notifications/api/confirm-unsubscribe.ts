import { useMutation } from '@tanstack/react-query';
import { unsubscribeResultSchema, type UnsubscribeResult } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

export function confirmUnsubscribe(token: string): Promise<UnsubscribeResult> {
  return apiFetch(`/unsubscribe/${encodeURIComponent(token)}`, unsubscribeResultSchema, { method: 'POST' });
}

export function useConfirmUnsubscribe() {
  return useMutation({ mutationFn: confirmUnsubscribe });
}
