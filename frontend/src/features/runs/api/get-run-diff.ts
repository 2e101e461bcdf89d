import { queryOptions, useQuery } from '@tanstack/react-query';
import { runDiffSchema, type RunDiff, type RunDiffKind } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { runsQueryKey } from './get-runs.js';

/** One finding kind's change, as the diff panel lists it. */
export interface FindingChange {
  kind: RunDiffKind;
  /** Exact counts; the item lists may be capped by the server. */
  appearedTotal: number;
  disappearedTotal: number;
  appeared: RunDiff['kinds'][RunDiffKind]['appeared']['items'];
  disappeared: RunDiff['kinds'][RunDiffKind]['disappeared']['items'];
}

export interface RunDiffView {
  findings: FindingChange[];
  scoreMoves: RunDiff['scoreMoves'];
}

/** The diff as one list of kinds, leaving out kinds with no change either way. */
export function diffView(diff: RunDiff): RunDiffView {
  const findings = (Object.entries(diff.kinds) as [RunDiffKind, RunDiff['kinds'][RunDiffKind]][])
    .map(([kind, change]) => ({
      kind,
      appearedTotal: change.appeared.total,
      disappearedTotal: change.disappeared.total,
      appeared: change.appeared.items,
      disappeared: change.disappeared.items,
    }))
    .filter((f) => f.appearedTotal > 0 || f.disappearedTotal > 0);
  return { findings, scoreMoves: diff.scoreMoves };
}

export async function getRunDiff(docSetId: string, runId: string, againstId: string, signal?: AbortSignal): Promise<RunDiffView> {
  const diff = await apiFetch(`/doc-sets/${encodeURIComponent(docSetId)}/runs/${encodeURIComponent(runId)}/diff`, runDiffSchema, {
    query: { against: againstId },
    signal,
  });
  return diffView(diff);
}

export function runDiffQueryOptions(docSetId: string, runId: string, againstId: string) {
  return queryOptions({
    queryKey: [...runsQueryKey(docSetId), runId, 'diff', againstId] as const,
    queryFn: ({ signal }) => getRunDiff(docSetId, runId, againstId, signal),
  });
}

export function useRunDiff(docSetId: string, runId: string | null, againstId: string | null) {
  return useQuery({ ...runDiffQueryOptions(docSetId, runId ?? '', againstId ?? ''), enabled: Boolean(runId && againstId) });
}
