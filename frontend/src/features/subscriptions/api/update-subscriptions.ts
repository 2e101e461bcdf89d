import { useMutation, useQueryClient } from '@tanstack/react-query';
import { subscriptionsSchema, type Subscription, type Subscriptions } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { subscriptionsQueryKey } from './get-subscriptions.js';

/** Replaces all of the user's choices; the server answers with the stored state. */
export function updateSubscriptions(subscriptions: Subscription[]): Promise<Subscriptions> {
  return apiFetch('/me/subscriptions', subscriptionsSchema, { method: 'PUT', body: { subscriptions } });
}

export function useUpdateSubscriptions() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSubscriptions,
    // Each PUT replaces the whole list, so quick successive toggles must reach the server in order.
    scope: { id: 'me-subscriptions' },
    onSuccess: (saved) => queryClient.setQueryData(subscriptionsQueryKey(), saved),
  });
}
