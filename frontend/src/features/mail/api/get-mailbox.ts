import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { mailboxListSchema, type ListResult, type MailboxMessageSummary } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

/** Root of every mail key (mailbox and outbox): "Send due mail now" refreshes all of it. */
export const mailQueryKey = () => ['mail'] as const;

export function getMailbox(page: number, pageSize: number, signal?: AbortSignal): Promise<ListResult<MailboxMessageSummary>> {
  return apiFetch('/mail', mailboxListSchema, { query: { page, pageSize }, signal });
}

export function mailboxQueryOptions(page: number, pageSize: number) {
  return queryOptions({
    queryKey: [...mailQueryKey(), 'mailbox', { page, pageSize }] as const,
    queryFn: ({ signal }) => getMailbox(page, pageSize, signal),
    placeholderData: keepPreviousData,
  });
}

export function useMailbox(page: number, pageSize: number) {
  return useQuery(mailboxQueryOptions(page, pageSize));
}
