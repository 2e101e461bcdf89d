import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { ListResult, User } from '../../../types/api.js';

export const usersQueryKey = () => ['users'] as const;

export function getUsers(page: number, pageSize: number, signal?: AbortSignal): Promise<ListResult<User>> {
  return apiFetch<ListResult<User>>('/users', { query: { page, pageSize }, signal });
}

export function usersQueryOptions(page: number, pageSize: number) {
  return queryOptions({
    queryKey: [...usersQueryKey(), { page, pageSize }] as const,
    queryFn: ({ signal }) => getUsers(page, pageSize, signal),
  });
}

export function useUsers(page: number, pageSize: number) {
  return useQuery(usersQueryOptions(page, pageSize));
}
