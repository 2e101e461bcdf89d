import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import { docSetQueryKey } from '../../doc-sets/api/get-doc-set.js';
import { runPath } from './run-path.js';

/** Every count the findings views show; older servers may send only the first eleven. */
export interface RunFindingCounts {
  pages: number;
  links: number;
  internalLinks: number;
  externalLinks: number;
  brokenLinks: number;
  brokenAnchors: number;
  brokenAssets?: number;
  unsafeLinks?: number;
  ambiguousLinks?: number;
  redirectedLinks?: number;
  outOfScopeLinks?: number;
  orphans: number;
  deadEnds: number;
  unreachable: number;
  deepPages: number;
  islands: number;
}

export interface AnalysisRun {
  id: string;
  status: string;
  finishedAt?: string | null;
  counts: RunFindingCounts | null;
}

/** Key prefix of everything read from one run; `latest` is its own key, as the server resolves it. */
export const runQueryKey = (docSetId: string, runId: string) => [...docSetQueryKey(docSetId), 'run', runId] as const;

export function getRun(docSetId: string, runId: string, signal?: AbortSignal): Promise<AnalysisRun> {
  return apiFetch<AnalysisRun>(runPath(docSetId, runId), { signal });
}

export function runQueryOptions(docSetId: string, runId: string) {
  return queryOptions({ queryKey: [...runQueryKey(docSetId, runId), 'detail'] as const, queryFn: ({ signal }) => getRun(docSetId, runId, signal) });
}

export function useRun(docSetId: string, runId: string) {
  return useQuery(runQueryOptions(docSetId, runId));
}
