import { useMutation, useQueryClient } from '@tanstack/react-query';
import { snapshotAcceptedSchema, type Snapshot } from '@linkloom/shared';
import { apiUpload } from '../../../lib/api-client.js';
import { snapshotsQueryKey } from './get-snapshots.js';

export function uploadArchive(docSetId: string, file: File, onProgress?: (fraction: number) => void): Promise<{ snapshot: Snapshot }> {
  const form = new FormData();
  form.append('archive', file, file.name);
  return apiUpload(`/doc-sets/${encodeURIComponent(docSetId)}/snapshots`, snapshotAcceptedSchema, form, onProgress);
}

export function useUploadArchive(docSetId: string, onProgress: (fraction: number) => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (file: File) => uploadArchive(docSetId, file, onProgress),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: snapshotsQueryKey(docSetId) }),
  });
}
