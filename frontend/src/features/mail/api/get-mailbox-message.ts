import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import { mailQueryKey, type MailboxMessageSummary } from './get-mailbox.js';

export interface MailboxMessage extends MailboxMessageSummary {
  text: string | null;
  html: string | null;
}

export function getMailboxMessage(id: string, signal?: AbortSignal): Promise<MailboxMessage> {
  return apiFetch<MailboxMessage>(`/mail/${encodeURIComponent(id)}`, { signal });
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
