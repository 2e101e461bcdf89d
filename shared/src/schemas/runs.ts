import { z } from 'zod';

/** Counts of every finding of one run (the `counts` of a run in the HTTP contract). */
export interface RunCounts {
  pages: number;
  links: number;
  internalLinks: number;
  externalLinks: number;
  brokenLinks: number;
  brokenAnchors: number;
  brokenAssets: number;
  unsafeLinks: number;
  ambiguousLinks: number;
  redirectedLinks: number;
  outOfScopeLinks: number;
  orphans: number;
  deadEnds: number;
  unreachable: number;
  deepPages: number;
  islands: number;
}

/** A page of a run as the page list and the page detail return it. */
export interface RunPageItem {
  path: string;
  title: string;
  stationaryScore: number;
  timesAverage: number;
  rank: number;
  inboundCount: number;
  outboundCount: number;
  depth: number | null;
  reachable: boolean;
  orphan: boolean;
  deadEnd: boolean;
  deep: boolean;
  island: boolean;
  brokenLinkCount: number;
  wordCount: number;
}

/** A run as GET .../runs and .../runs/:runId answer it. `number` counts the doc set's runs from 1, oldest first. */
export const runViewSchema = z.object({
  id: z.string(),
  number: z.number().int().nullable(),
  docSetId: z.string(),
  snapshotId: z.string(),
  status: z.enum(['queued', 'running', 'finished', 'failed']),
  trigger: z.enum(['import', 'manual', 'nightly']),
  settings: z.record(z.string(), z.unknown()),
  createdAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
  iterations: z.number().nullable(),
  residual: z.number().nullable(),
  durationMs: z.number().nullable(),
  counts: z.custom<RunCounts>().nullable(),
  warnings: z.array(z.object({ code: z.string(), message: z.string() })),
  error: z.string().nullable(),
  createdBy: z.string().nullable(),
});
export type RunViewItem = z.infer<typeof runViewSchema>;
