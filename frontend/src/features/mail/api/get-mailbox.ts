import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { ListResult } from '../../../types/api.js';

/** A message the built-in local mailbox caught (GET /api/mail). */
export interface MailboxMessageSummary {
  id: string;
  messageId: string;
  from: string;
  to: string[];
  subject: string;
  receivedAt: string;
}

/** Root of every mail key (mailbox and outbox): "Send due mail now" refreshes all of it. */
export const mailQueryKey = () => ['mail'] as const;

export function getMailbox(page: number, pageSize: number, signal?: AbortSignal): Promise<ListResult<MailboxMessageSummary>> {
  return apiFetch<ListResult<MailboxMessageSummary>>('/mail', { query: { page, pageSize }, signal });
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
