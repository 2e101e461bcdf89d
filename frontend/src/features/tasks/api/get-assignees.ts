import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { ListResult } from '../../../types/api.js';
import type { Assignee } from '../types.js';

export function getAssignees(signal?: AbortSignal): Promise<ListResult<Assignee>> {
  return apiFetch<ListResult<Assignee>>('/tasks/assignees', { signal });
}

export function assigneesQueryOptions() {
  return queryOptions({ queryKey: ['tasks', 'assignees'] as const, queryFn: ({ signal }) => getAssignees(signal), staleTime: 60_000 });
}

/** Only editors may list assignees; others pass `enabled = false`. */
export function useAssignees(enabled: boolean) {
  return useQuery({ ...assigneesQueryOptions(), enabled });
}
