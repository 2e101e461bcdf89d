/**
 * Linkloom's pure link-graph engine: no I/O, no framework, typed arrays throughout.
 * Pages are numbered 0..N-1 in the order of the page ids given to `buildLinkGraph`.
 */

/** CSR link graph: build from page ids and links, or quickly from Int32Array edge pairs. */
export { buildLinkGraph, buildGraphFromEdgePairs, hasEdge, inDegree, outDegree } from './build-graph.js';
export type { IndexedLinkGraph, LinkGraph, LinkPair } from './build-graph.js';

/** Stationary score (PageRank) by power iteration, as defined in docs/metrics.md. */
export { computeStationaryScore, STATIONARY_SCORE_DEFAULTS } from './algorithms/stationary-score.js';
export type { StationaryScoreOptions, StationaryScoreResult } from './algorithms/stationary-score.js';

/** Click depth from entry pages (multi-source BFS); -1 marks unreachable pages. */
export { computeClickDepth } from './algorithms/reachability.js';

/** Weakly and strongly connected components, numbered in order of their lowest page. */
export { strongComponents, weakComponents } from './algorithms/components.js';
export type { Components } from './algorithms/components.js';

/** Score gain of a proposed link (warm-started recomputation), singly or for many sources of one target. */
export { computeScoreGain, computeScoreGainsForTarget } from './algorithms/score-gain.js';
export type { ScoreGain, ScoreGainOptions } from './algorithms/score-gain.js';

/** Islands: weak components apart from the entry pages' own (0 = main site). */
export { islandNumbers } from './algorithms/islands.js';

/** Rank pages by score (1 = highest; equal scores ordered by page id). */
export { rankByScore } from './algorithms/rank-order.js';

/**
 * Every per-page metric and the summary of one run, from page ids and links. Without a known entry page,
 * pages count as reachable (depth null), the largest weak component is the main site, and the teleport is uniform.
 */
export { analyzeLinkGraph } from './analyze.js';
export type { AnalyzeLinkGraphInput, LinkGraphAnalysis, LinkGraphSummary, PageMetrics } from './analyze.js';
