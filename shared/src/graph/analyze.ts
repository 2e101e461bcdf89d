/**
 * One analysis of a doc set's link graph: stationary score, rank, inbound/outbound counts, click depth,
 * reachability, orphans, dead ends, deep pages and islands, as defined in docs/metrics.md.
 *
 * When no entry page is given (or none of the given ids is a page), reachability cannot be judged, so the
 * analysis reports no false alarms: every page counts as reachable with depth null and deep false, the
 * largest weak component (lowest page index on a tie) is treated as the main site and only the others are
 * islands, and an 'entry-pages' teleport falls back to uniform. `summary.entryPagesFound` says it happened.
 */
import { buildLinkGraph, type LinkGraph, type LinkPair } from './build-graph.js';
import { strongComponents, weakComponents } from './algorithms/components.js';
import { rankByScore } from './algorithms/rank-order.js';
import { islandNumbers } from './algorithms/islands.js';
import { computeClickDepth } from './algorithms/reachability.js';
import { computeStationaryScore } from './algorithms/stationary-score.js';

export interface AnalyzeLinkGraphInput {
  readonly pageIds: readonly string[];
  /** Resolved links between pages; links naming an unknown page are skipped and counted. */
  readonly edges: readonly LinkPair[];
  readonly entryPages: readonly string[];
  readonly damping: number;
  readonly teleport: 'uniform' | 'entry-pages';
  /** A page deeper than this many clicks is "deep" (3 is the common rule of thumb). */
  readonly depthThreshold: number;
  readonly tolerance?: number;
  readonly maxIterations?: number;
  /** Previous scores by page id (pages missing from it start at 0), e.g. from the last run. */
  readonly warmStart?: ReadonlyMap<string, number>;
}

export interface PageMetrics {
  readonly pageId: string;
  readonly stationaryScore: number;
  /** stationaryScore * N: 1 means an average page. */
  readonly timesAverage: number;
  /** 1 = highest score; equal scores ordered by page id. */
  readonly rank: number;
  readonly inboundCount: number;
  readonly outboundCount: number;
  /** Clicks from the nearest entry page; null when unreachable or when there is no entry page. */
  readonly depth: number | null;
  readonly reachable: boolean;
  readonly orphan: boolean;
  readonly deadEnd: boolean;
  readonly deep: boolean;
  /** null for the component holding the entry pages, else an island number from 1. */
  readonly islandId: number | null;
}

export interface LinkGraphSummary {
  readonly pageCount: number;
  /** Distinct page-to-page edges (duplicates merged, self-links dropped). */
  readonly edgeCount: number;
  readonly skippedLinks: number;
  readonly entryPagesFound: number;
  readonly teleportUsed: 'uniform' | 'entry-pages';
  readonly iterations: number;
  readonly residual: number;
  readonly converged: boolean;
  readonly counts: {
    readonly orphans: number;
    readonly deadEnds: number;
    readonly unreachable: number;
    readonly deepPages: number;
    readonly islands: number;
    readonly sccCount: number;
  };
}

export interface LinkGraphAnalysis {
  /** In the order of input.pageIds. */
  readonly pages: PageMetrics[];
  readonly summary: LinkGraphSummary;
}

export function analyzeLinkGraph(input: AnalyzeLinkGraphInput): LinkGraphAnalysis {
  if (!(Number.isInteger(input.depthThreshold) && input.depthThreshold >= 0)) {
    throw new RangeError(`depthThreshold must be a non-negative integer, got ${input.depthThreshold}`);
  }
  const { graph, indexOf, skippedLinks } = buildLinkGraph(input.pageIds, input.edges);
  const n = graph.nodeCount;
  const entries = [...new Set(input.entryPages.flatMap((id) => (indexOf.has(id) ? [indexOf.get(id)!] : [])))];
  const teleportUsed = input.teleport === 'entry-pages' && entries.length > 0 ? 'entry-pages' : 'uniform';
  const score = computeStationaryScore(graph, {
    damping: input.damping,
    tolerance: input.tolerance,
    maxIterations: input.maxIterations,
    teleport: teleportUsed === 'entry-pages' ? entryTeleport(n, entries) : undefined,
    start: input.warmStart ? warmStartVector(input.pageIds, input.warmStart) : undefined,
  });
  const islandOf = islandNumbers(weakComponents(graph).componentOf, entries);
  const facts: PageFacts = {
    graph,
    scores: score.scores,
    rank: rankByScore(score.scores, input.pageIds),
    depth: entries.length > 0 ? computeClickDepth(graph, entries) : undefined,
    isEntry: membership(n, entries),
    islandOf,
    depthThreshold: input.depthThreshold,
  };
  const pages = input.pageIds.map((pageId, i) => pageMetrics(pageId, i, facts));
  const counts = {
    orphans: pages.filter((p) => p.orphan).length,
    deadEnds: pages.filter((p) => p.deadEnd).length,
    unreachable: pages.filter((p) => !p.reachable).length,
    deepPages: pages.filter((p) => p.deep).length,
    islands: islandOf.reduce((max, id) => Math.max(max, id), 0),
    sccCount: strongComponents(graph).count,
  };
  const { iterations, residual, converged } = score;
  const summary = {
    pageCount: n,
    edgeCount: graph.edgeCount,
    skippedLinks,
    entryPagesFound: entries.length,
    teleportUsed,
    iterations,
    residual,
    converged,
    counts,
  } as const;
  return { pages, summary };
}

interface PageFacts {
  readonly graph: LinkGraph;
  readonly scores: Float64Array;
  readonly rank: Int32Array;
  /** undefined when there is no entry page (reachability not judged). */
  readonly depth: Int32Array | undefined;
  readonly isEntry: Uint8Array;
  readonly islandOf: Int32Array;
  readonly depthThreshold: number;
}

function pageMetrics(pageId: string, i: number, facts: PageFacts): PageMetrics {
  const { graph, depth } = facts;
  const inboundCount = graph.inOffsets[i + 1] - graph.inOffsets[i];
  const outboundCount = graph.outOffsets[i + 1] - graph.outOffsets[i];
  const pageDepth = depth && depth[i] >= 0 ? depth[i] : null;
  return {
    pageId,
    stationaryScore: facts.scores[i],
    timesAverage: facts.scores[i] * graph.nodeCount,
    rank: facts.rank[i],
    inboundCount,
    outboundCount,
    depth: pageDepth,
    reachable: depth ? depth[i] >= 0 : true,
    orphan: inboundCount === 0 && facts.isEntry[i] === 0,
    deadEnd: outboundCount === 0,
    deep: pageDepth !== null && pageDepth > facts.depthThreshold,
    islandId: facts.islandOf[i] === 0 ? null : facts.islandOf[i],
  };
}

function membership(n: number, members: readonly number[]): Uint8Array {
  const flags = new Uint8Array(n);
  for (const m of members) flags[m] = 1;
  return flags;
}

function entryTeleport(n: number, entries: readonly number[]): Float64Array {
  const teleport = new Float64Array(n);
  for (const e of entries) teleport[e] = 1 / entries.length;
  return teleport;
}

function warmStartVector(pageIds: readonly string[], previous: ReadonlyMap<string, number>): Float64Array | undefined {
  const start = Float64Array.from(pageIds, (id) => previous.get(id) ?? 0);
  // A warm start with no weight on any current page carries no information: start from the teleport vector.
  return start.some((value) => value > 0) ? start : undefined;
}
