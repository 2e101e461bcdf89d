import { queryOptions, useQuery } from '@tanstack/react-query';
import { subscriptionsSchema, type Subscriptions } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

export const subscriptionsQueryKey = () => ['me', 'subscriptions'] as const;

export function getSubscriptions(signal?: AbortSignal): Promise<Subscriptions> {
  return apiFetch('/me/subscriptions', subscriptionsSchema, { signal });
}

export function subscriptionsQueryOptions() {
  return queryOptions({ queryKey: subscriptionsQueryKey(), queryFn: ({ signal }) => getSubscriptions(signal) });
}

export function useSubscriptions() {
  return useQuery(subscriptionsQueryOptions());
}
