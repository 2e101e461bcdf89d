/** Small helpers shared by the graph tests (not exported from the package). */
import { buildGraphFromEdgePairs, buildLinkGraph, type LinkGraph } from '../build-graph.js';

/** Graph from edges written "a->b" between single-letter or numbered pages, in the order pageIds gives. */
export function graphOf(pageIds: readonly string[], edges: readonly string[]): LinkGraph {
  return buildLinkGraph(
    pageIds,
    edges.map((e) => e.split('->') as [string, string]),
  ).graph;
}

/** Deterministic pseudo-random numbers in [0, 1) (mulberry32, a public-domain generator). */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Random graph with several components and dead ends: nodes split into `parts` blocks, each block's
 * nodes link only inside the block, and about `deadEndShare` of nodes have no out-links.
 */
export function randomSplitGraph(
  seed: number,
  n: number,
  edgesPerNode: number,
  parts: number,
  deadEndShare: number,
): { graph: LinkGraph; pairs: Int32Array } {
  const random = seededRandom(seed);
  const blockOf = (u: number) => Math.floor((u * parts) / n);
  const blockStart = (b: number) => Math.ceil((b * n) / parts);
  const pairs: number[] = [];
  for (let u = 0; u < n; u++) {
    if (random() < deadEndShare) continue;
    const b = blockOf(u);
    const start = blockStart(b);
    const size = blockStart(b + 1) - start;
    const count = 1 + Math.floor(random() * 2 * edgesPerNode);
    for (let k = 0; k < count; k++) pairs.push(u, start + Math.floor(random() ** 2 * size));
  }
  const typed = Int32Array.from(pairs);
  return { graph: buildGraphFromEdgePairs(n, typed), pairs: typed };
}
