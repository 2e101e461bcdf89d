import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { DocSet, DocSetSettings } from '../../../types/api.js';
import { docSetQueryKey } from './get-doc-set.js';
import { docSetsQueryKey } from './get-doc-sets.js';

export interface UpdateDocSetInput {
  name?: string;
  description?: string;
  settings?: Partial<DocSetSettings>;
}

export function updateDocSet(docSetId: string, input: UpdateDocSetInput): Promise<DocSet> {
  return apiFetch<DocSet>(`/doc-sets/${encodeURIComponent(docSetId)}`, { method: 'PATCH', body: input });
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
