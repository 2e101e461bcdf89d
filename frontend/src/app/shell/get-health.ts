import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../lib/api-client.js';
import type { Health } from '../../types/api.js';

export function getHealth(signal?: AbortSignal): Promise<Health> {
  return apiFetch<Health>('/health', { signal });
}

export function healthQueryOptions() {
  return queryOptions({ queryKey: ['health'] as const, queryFn: ({ signal }) => getHealth(signal), staleTime: 5 * 60_000 });
}

export function useHealth() {
  return useQuery(healthQueryOptions());
}
