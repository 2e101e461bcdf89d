import { queryOptions, useQuery } from '@tanstack/react-query';
import { unsubscribeInfoSchema, type UnsubscribeInfo } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

/** What an unsubscribe link stands for; reading it changes nothing (mail scanners open links too). */
export function getUnsubscribeLink(token: string, signal?: AbortSignal): Promise<UnsubscribeInfo> {
  return apiFetch(`/unsubscribe/${encodeURIComponent(token)}`, unsubscribeInfoSchema, { signal });
}

export function unsubscribeLinkQueryOptions(token: string) {
  return queryOptions({
    queryKey: ['unsubscribe', token] as const,
    queryFn: ({ signal }) => getUnsubscribeLink(token, signal),
    retry: false,
  });
}

export function useUnsubscribeLink(token: string) {
  return useQuery(unsubscribeLinkQueryOptions(token));
}
