import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { outboxListSchema, type ListResult, type OutboxMessage, type OutboxStatus } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { mailQueryKey } from './get-mailbox.js';

export function getOutbox(
  status: OutboxStatus | '',
  page: number,
  pageSize: number,
  signal?: AbortSignal,
): Promise<ListResult<OutboxMessage>> {
  return apiFetch('/outbox', outboxListSchema, { query: { status, page, pageSize }, signal });
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
