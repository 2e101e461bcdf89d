import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { ListResult } from '../../../types/api.js';
import { mailQueryKey } from './get-mailbox.js';

export const OUTBOX_STATUSES = ['pending', 'sending', 'sent', 'failed'] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

/** One e-mail in the durable outbox with its delivery state (GET /api/outbox). */
export interface OutboxMessage {
  id: string;
  messageId: string;
  kind: string;
  toAddress: string;
  subject: string;
  status: OutboxStatus;
  attempts: number;
  nextAttemptAt: string | null;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
}

export function getOutbox(
  status: OutboxStatus | '',
  page: number,
  pageSize: number,
  signal?: AbortSignal,
): Promise<ListResult<OutboxMessage>> {
  return apiFetch<ListResult<OutboxMessage>>('/outbox', { query: { status, page, pageSize }, signal });
}

export function outboxQueryOptions(status: OutboxStatus | '', page: number, pageSize: number) {
  return queryOptions({
    queryKey: [...mailQueryKey(), 'outbox', { status, page, pageSize }] as const,
    queryFn: ({ signal }) => getOutbox(status, page, pageSize, signal),
    placeholderData: keepPreviousData,
  });
}

export function useOutbox(status: OutboxStatus | '', page: number, pageSize: number) {
  return useQuery(outboxQueryOptions(status, page, pageSize));
}
