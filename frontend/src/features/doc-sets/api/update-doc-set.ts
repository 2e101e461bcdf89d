import { useMutation, useQueryClient } from '@tanstack/react-query';
import { docSetSchema, type DocSet, type UpdateDocSetInput } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { docSetQueryKey } from './get-doc-set.js';
import { docSetsQueryKey } from './get-doc-sets.js';

export function updateDocSet(docSetId: string, input: UpdateDocSetInput): Promise<DocSet> {
  return apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}`, docSetSchema, { method: 'PATCH', body: input });
}

export function useUpdateDocSet(docSetId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateDocSetInput) => updateDocSet(docSetId, input),
    onSuccess: async () => {
      await queryClient.invalidateQueries({ queryKey: docSetQueryKey(docSetId) });
      await queryClient.invalidateQueries({ queryKey: [...docSetsQueryKey(), 'list'] });
    },
  });
}
