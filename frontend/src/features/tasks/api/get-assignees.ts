import { queryOptions, useQuery } from '@tanstack/react-query';
import { assigneeListSchema, type Assignee, type ListResult } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';

export function getAssignees(signal?: AbortSignal): Promise<ListResult<Assignee>> {
  return apiFetch('/tasks/assignees', assigneeListSchema, { signal });
}

export function assigneesQueryOptions() {
  return queryOptions({ queryKey: ['tasks', 'assignees'] as const, queryFn: ({ signal }) => getAssignees(signal), staleTime: 60_000 });
}

/** Only editors may list assignees; others pass `enabled = false`. */
export function useAssignees(enabled: boolean) {
  return useQuery({ ...assigneesQueryOptions(), enabled });
}
