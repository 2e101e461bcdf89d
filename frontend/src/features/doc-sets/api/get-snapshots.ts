import { queryOptions, useQuery } from '@tanstack/react-query';
import { snapshotListSchema, type Snapshot } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { docSetQueryKey } from './get-doc-set.js';

export const snapshotsQueryKey = (docSetId: string) => [...docSetQueryKey(docSetId), 'snapshots'] as const;

export async function getSnapshots(docSetId: string, signal?: AbortSignal): Promise<Snapshot[]> {
  const result = await apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/snapshots`, snapshotListSchema, {
    query: { page: 1, pageSize: 100 },
    signal,
  });
  return result.items;
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
