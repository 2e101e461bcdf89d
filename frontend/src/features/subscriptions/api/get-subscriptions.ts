import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';

/** One doc set's mail choice for the signed-in user. */
export interface Subscription {
  docSetId: string;
  /** Get the nightly digest for this doc set. */
  digest: boolean;
  /** Also get it when the night's run changed nothing. */
  nothingChanged: boolean;
}

export interface Subscriptions {
  subscriptions: Subscription[];
}

export const subscriptionsQueryKey = () => ['me', 'subscriptions'] as const;

export function getSubscriptions(signal?: AbortSignal): Promise<Subscriptions> {
  return apiFetch<Subscriptions>('/me/subscriptions', { signal });
}

export function subscriptionsQueryOptions() {
  return queryOptions({ queryKey: subscriptionsQueryKey(), queryFn: ({ signal }) => getSubscriptions(signal) });
}

export function useSubscriptions() {
  return useQuery(subscriptionsQueryOptions());
}
