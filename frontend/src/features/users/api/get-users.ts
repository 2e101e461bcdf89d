import { queryOptions, useQuery } from '@tanstack/react-query';
import { userDetailsListSchema, type ListResult, type UserDetails } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

export const usersQueryKey = () => ['users'] as const;

export function getUsers(page: number, pageSize: number, signal?: AbortSignal): Promise<ListResult<UserDetails>> {
  return apiFetch('/users', userDetailsListSchema, { query: { page, pageSize }, signal });
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
