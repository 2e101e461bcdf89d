import { queryOptions, useQuery } from '@tanstack/react-query';
import { mailboxMessageSchema, type MailboxMessage } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { mailQueryKey } from './get-mailbox.js';

export function getMailboxMessage(id: string, signal?: AbortSignal): Promise<MailboxMessage> {
  return apiFetch(`/mail/${encodeURIComponent(id)}`, mailboxMessageSchema, { signal });
}

export function mailboxMessageQueryOptions(id: string) {
  return queryOptions({
    queryKey: [...mailQueryKey(), 'message', id] as const,
    queryFn: ({ signal }) => getMailboxMessage(id, signal),
    // A caught message never changes.
    staleTime: Infinity,
  });
}

export function useMailboxMessage(id: string | null) {
  return useQuery({ ...mailboxMessageQueryOptions(id ?? ''), enabled: Boolean(id) });
}
