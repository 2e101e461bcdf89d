import { queryOptions, useQuery } from '@tanstack/react-query';
import { runListSchema, type Run } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { docSetQueryKey } from '../../doc-sets/api/get-doc-set.js';

export const runsQueryKey = (docSetId: string) => [...docSetQueryKey(docSetId), 'runs'] as const;

export const isRunBusy = (run: Pick<Run, 'status'>) => run.status === 'running' || run.status === 'queued';

/** Runs newest first, whatever order the server used. */
export async function getRuns(docSetId: string, signal?: AbortSignal): Promise<Run[]> {
  const result = await apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/runs`, runListSchema, {
    query: { page: 1, pageSize: 500 },
    signal,
  });
  return [...result.items].sort((a, b) => Date.parse(b.createdAt) - Date.parse(a.createdAt));
}

export function runsQueryOptions(docSetId: string) {
  return queryOptions({
    queryKey: [...runsQueryKey(docSetId), 'list'] as const,
    queryFn: ({ signal }) => getRuns(docSetId, signal),
    refetchInterval: (query) => (query.state.data?.some(isRunBusy) ? 2000 : false),
  });
}

export function useRuns(docSetId: string) {
  return useQuery(runsQueryOptions(docSetId));
}

/** The two newest finished runs: the headline and the one it is compared with. */
export function latestFinished(runs: Run[] | undefined): { latest: Run | null; previous: Run | null } {
  const finished = (runs ?? []).filter((r) => r.status === 'finished' && r.counts);
  return { latest: finished[0] ?? null, previous: finished[1] ?? null };
}
