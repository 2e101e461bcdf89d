import { useMutation, useQueryClient } from '@tanstack/react-query';
import { outboxDeliveryResultSchema } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { mailQueryKey } from './get-mailbox.js';

/** Sends what is due now instead of waiting for the server's next delivery pass. */
export function deliverOutbox(): Promise<{ sent: number }> {
  return apiFetch('/outbox/deliver', outboxDeliveryResultSchema, { method: 'POST' });
}

export function useDeliverOutbox() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deliverOutbox,
    // Sent mail lands in the local mailbox too, so both lists are refreshed.
    onSettled: () => queryClient.invalidateQueries({ queryKey: mailQueryKey() }),
  });
}
