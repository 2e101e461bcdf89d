/**
 * The CPU-heavy parts of a run, executed inside a worker thread (see analysis-worker.ts): the whole link
 * graph analysis, and the score gains of proposed links. Pure functions over typed arrays, so the worker
 * can receive and return them without copying object graphs. Methods and sources are those of the shared
 * engine (`@linkloom/shared/graph`): power iteration after Brin and Page 1998 / Langville and Meyer 2004.
 */
import { analyzeLinkGraph, buildGraphFromEdgePairs, computeScoreGainsForTarget, type LinkGraphSummary } from '@linkloom/shared/graph';

export interface GraphSettings {
  readonly damping: number;
  readonly teleport: 'uniform' | 'entry-pages';
  readonly depthThreshold: number;
}

export interface AnalyzeJob {
  readonly kind: 'analyze';
  /** Page ids in a fixed order; edge pairs refer to positions in this list. */
  readonly pageIds: readonly string[];
  /** Interleaved [source, target] positions of resolved page-to-page links. */
  readonly edgePairs: Int32Array;
  /** Positions of the entry pages. */
  readonly entries: readonly number[];
  readonly settings: GraphSettings;
}

/** Per-page metrics column by column (position i = pageIds[i]); -1 / 0 stand for null depth / no island. */
export interface AnalyzeJobResult {
  readonly scores: Float64Array;
  readonly rank: Int32Array;
  readonly inbound: Int32Array;
  readonly outbound: Int32Array;
  readonly depth: Int32Array;
  /** bit 0 reachable, 1 orphan, 2 dead end, 3 deep */
  readonly flags: Uint8Array;
  readonly islandId: Int32Array;
  readonly summary: LinkGraphSummary;
}

export interface GainsJob {
  readonly kind: 'gains';
  readonly pageCount: number;
  readonly edgePairs: Int32Array;
  /** The converged scores of this graph with these settings (the warm start). */
  readonly scores: Float64Array;
  readonly damping: number;
  /** Positions that carry the teleport weight; empty = uniform teleport. */
  readonly teleportEntries: readonly number[];
  readonly targets: readonly { readonly target: number; readonly sources: readonly number[] }[];
  /** Stop starting new targets after this many milliseconds (the rest are computed on demand). */
  readonly budgetMs: number;
}

export interface GainsJobResult {
  /** Per finished target (a prefix of the asked ones), per source: new score of the target minus its current score. */
  readonly gains: number[][];
}

export const FLAG_REACHABLE = 1;
export const FLAG_ORPHAN = 2;
export const FLAG_DEAD_END = 4;
export const FLAG_DEEP = 8;

export function runAnalyzeJob(job: AnalyzeJob): AnalyzeJobResult {
  const { pageIds, edgePairs } = job;
  const edges = new Array<readonly [string, string]>(edgePairs.length / 2);
  for (let k = 0; k < edges.length; k++) edges[k] = [pageIds[edgePairs[2 * k]], pageIds[edgePairs[2 * k + 1]]];
  const analysis = analyzeLinkGraph({
    pageIds,
    edges,
    entryPages: job.entries.map((i) => pageIds[i]),
    damping: job.settings.damping,
    teleport: job.settings.teleport,
    depthThreshold: job.settings.depthThreshold,
  });
  const n = pageIds.length;
  const result = {
    scores: new Float64Array(n),
    rank: new Int32Array(n),
    inbound: new Int32Array(n),
    outbound: new Int32Array(n),
    depth: new Int32Array(n),
    flags: new Uint8Array(n),
    islandId: new Int32Array(n),
    summary: analysis.summary,
  };
  analysis.pages.forEach((p, i) => {
    result.scores[i] = p.stationaryScore;
    result.rank[i] = p.rank;
    result.inbound[i] = p.inboundCount;
    result.outbound[i] = p.outboundCount;
    result.depth[i] = p.depth ?? -1;
    result.flags[i] =
      (p.reachable ? FLAG_REACHABLE : 0) | (p.orphan ? FLAG_ORPHAN : 0) | (p.deadEnd ? FLAG_DEAD_END : 0) | (p.deep ? FLAG_DEEP : 0);
    result.islandId[i] = p.islandId ?? 0;
  });
  return result;
}

export function runGainsJob(job: GainsJob): GainsJobResult {
  const graph = buildGraphFromEdgePairs(job.pageCount, job.edgePairs);
  let teleport: Float64Array | undefined;
  if (job.teleportEntries.length > 0) {
    teleport = new Float64Array(job.pageCount);
    for (const e of job.teleportEntries) teleport[e] = 1;
  }
  const started = performance.now();
  const gains: number[][] = [];
  for (const { target, sources } of job.targets) {
    if (gains.length > 0 && performance.now() - started > job.budgetMs) break;
    gains.push(computeScoreGainsForTarget(graph, job.scores, target, sources, { damping: job.damping, teleport }).map((g) => g.gain));
  }
  return { gains };
}
