import { queryOptions, useQuery } from '@tanstack/react-query';
import { healthSchema, type Health } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

export function getHealth(signal?: AbortSignal): Promise<Health> {
  return apiFetch('/health', healthSchema, { signal });
}

export function healthQueryOptions() {
  return queryOptions({ queryKey: ['health'] as const, queryFn: ({ signal }) => getHealth(signal), staleTime: 5 * 60_000 });
}

export function useHealth() {
  return useQuery(healthQueryOptions());
}
