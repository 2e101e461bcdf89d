import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import type { DocSet } from '../../../types/api.js';
import { docSetsQueryKey } from './get-doc-sets.js';

export interface CreateDocSetInput {
  name: string;
  description?: string;
}

export function createDocSet(input: CreateDocSetInput): Promise<DocSet> {
  return apiFetch<DocSet>('/doc-sets', { method: 'POST', body: input });
}

export function useCreateDocSet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDocSet,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: docSetsQueryKey() }),
  });
}
