import { queryOptions, useQuery } from '@tanstack/react-query';
import { runSchema, type Run } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { docSetQueryKey } from '../../doc-sets/api/get-doc-set.js';
import { runPath } from '../../../lib/run-path.js';

/** Key prefix of everything read from one run; `latest` is its own key, as the server resolves it. */
export const runQueryKey = (docSetId: string, runId: string) => [...docSetQueryKey(docSetId), 'run', runId] as const;

export function getRun(docSetId: string, runId: string, signal?: AbortSignal): Promise<Run> {
  return apiFetch(runPath(docSetId, runId), runSchema, { signal });
}

export function runQueryOptions(docSetId: string, runId: string) {
  return queryOptions({
    queryKey: [...runQueryKey(docSetId, runId), 'detail'] as const,
    queryFn: ({ signal }) => getRun(docSetId, runId, signal),
  });
}

export function useRun(docSetId: string, runId: string) {
  return useQuery(runQueryOptions(docSetId, runId));
}
