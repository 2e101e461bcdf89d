import { queryOptions, useQuery } from '@tanstack/react-query';
import { snapshotSchema, type Snapshot } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { isSnapshotBusy, snapshotsQueryKey } from './get-snapshots.js';

export function getSnapshot(docSetId: string, snapshotId: string, signal?: AbortSignal): Promise<Snapshot> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/snapshots/${encodeURIComponent(snapshotId)}`, snapshotSchema, { signal });
}

export function snapshotQueryOptions(docSetId: string, snapshotId: string) {
  return queryOptions({
    queryKey: [...snapshotsQueryKey(docSetId), snapshotId] as const,
    queryFn: ({ signal }) => getSnapshot(docSetId, snapshotId, signal),
    refetchInterval: (query) => (query.state.data && !isSnapshotBusy(query.state.data) ? false : 1000),
  });
}

export function useSnapshot(docSetId: string, snapshotId: string | null) {
  return useQuery({ ...snapshotQueryOptions(docSetId, snapshotId ?? ''), enabled: Boolean(snapshotId) });
}
