import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiFetch } from '../../../lib/api-client.js';
import { runsQueryKey } from './get-runs.js';

export interface FindingChange {
  kind: string;
  /** Exact counts; the item lists may be capped by the server. */
  appearedTotal: number;
  disappearedTotal: number;
  appeared: unknown[];
  disappeared: unknown[];
}

export interface ScoreMove {
  path: string;
  title?: string;
  before: number | null;
  after: number | null;
}

export interface RunDiff {
  findings: FindingChange[];
  scoreMoves: ScoreMove[];
}

/** The back end sends `{ total, items }` per direction; a bare array is accepted too. */
type ChangeList = unknown[] | { total?: number; items?: unknown[] };
type RawKind = { appeared?: ChangeList; disappeared?: ChangeList };
type RawDiff = {
  kinds?: Record<string, RawKind> | Array<RawKind & { kind: string }>;
  findings?: Record<string, RawKind> | Array<RawKind & { kind: string }>;
  scoreMoves?: Array<Partial<ScoreMove> & { path: string }>;
};

function readList(list: ChangeList | undefined): { total: number; items: unknown[] } {
  if (!list) return { total: 0, items: [] };
  if (Array.isArray(list)) return { total: list.length, items: list };
  const items = list.items ?? [];
  return { total: list.total ?? items.length, items };
}

/** Shapes GET .../runs/:runId/diff into one list of kinds, leaving out kinds with no change either way. */
export function normaliseDiff(raw: RawDiff): RunDiff {
  const source = raw.kinds ?? raw.findings ?? {};
  const entries: Array<[string, RawKind]> = Array.isArray(source) ? source.map((k) => [k.kind, k]) : Object.entries(source);
  const findings = entries
    .map(([kind, k]) => {
      const appeared = readList(k.appeared);
      const disappeared = readList(k.disappeared);
      return {
        kind,
        appearedTotal: appeared.total,
        disappearedTotal: disappeared.total,
        appeared: appeared.items,
        disappeared: disappeared.items,
      };
    })
    .filter((f) => f.appearedTotal > 0 || f.disappearedTotal > 0);
  const scoreMoves = (raw.scoreMoves ?? []).map((m) => ({
    path: m.path,
    title: m.title,
    before: m.before ?? null,
    after: m.after ?? null,
  }));
  return { findings, scoreMoves };
}

export async function getRunDiff(docSetId: string, runId: string, againstId: string, signal?: AbortSignal): Promise<RunDiff> {
  const raw = await apiFetch<RawDiff>(`/doc-sets/${encodeURIComponent(docSetId)}/runs/${encodeURIComponent(runId)}/diff`, {
    query: { against: againstId },
    signal,
  });
  return normaliseDiff(raw);
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
