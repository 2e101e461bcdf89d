import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { ListResult, Snapshot } from '../../../types/api.js';
import { docSetQueryKey } from './get-doc-set.js';

export const snapshotsQueryKey = (docSetId: string) => [...docSetQueryKey(docSetId), 'snapshots'] as const;

export async function getSnapshots(docSetId: string, signal?: AbortSignal): Promise<Snapshot[]> {
  const result = await apiFetch<ListResult<Snapshot> | Snapshot[]>(`/doc-sets/${encodeURIComponent(docSetId)}/snapshots`, {
    query: { page: 1, pageSize: 100 },
    signal,
  });
  return Array.isArray(result) ? result : result.items;
}

export const isSnapshotBusy = (s: Pick<Snapshot, 'status'>) => s.status === 'received' || s.status === 'importing';

export function snapshotsQueryOptions(docSetId: string) {
  return queryOptions({
    queryKey: [...snapshotsQueryKey(docSetId), 'list'] as const,
    queryFn: ({ signal }) => getSnapshots(docSetId, signal),
    // Keep the history live while an import is under way.
    refetchInterval: (query) => (query.state.data?.some(isSnapshotBusy) ? 2000 : false),
  });
}

export function useSnapshots(docSetId: string) {
  return useQuery(snapshotsQueryOptions(docSetId));
}
