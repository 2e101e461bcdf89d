import { useMutation, useQueryClient } from '@tanstack/react-query';
import { docSetSchema, type createDocSetSchema, type DocSet } from '@linkloom/shared';
import type { z } from 'zod';
import { apiFetch } from '../../../lib/api-client.js';
import { docSetsQueryKey } from './get-doc-sets.js';

export function createDocSet(input: z.input<typeof createDocSetSchema>): Promise<DocSet> {
  return apiFetch('/doc-sets', docSetSchema, { method: 'POST', body: input });
}

export function useCreateDocSet() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDocSet,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: docSetsQueryKey() }),
  });
}
