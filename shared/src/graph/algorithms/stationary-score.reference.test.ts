import { describe, expect, it } from 'vitest';
import { ReferenceGraph, referencePagerank } from '../testing/graphology-reference.js';
import type { LinkGraph } from '../build-graph.js';
import { randomSplitGraph } from '../testing/graph-fixtures.js';
import { computeStationaryScore } from './stationary-score.js';

/**
 * Reference: graphology-metrics 2.4.2, centrality/pagerank (a general-purpose graph library from npm).
 * Settings mapped after reading its source (node_modules/graphology-metrics/centrality/pagerank.js):
 * - alpha = d; it starts from the uniform vector and teleports uniformly, as our default does;
 * - dangling nodes: it sums their weight and spreads it uniformly (x[i] += dangleSum * 1/N), which is our
 *   "dead ends hand their weight to t" with t uniform;
 * - getEdgeWeight: null makes every edge weigh 1, so each out-edge gets 1/outdegree; we feed it a plain
 *   DirectedGraph of our merged edges (no duplicates, no self-links), so both see the same P;
 * - it stops when the summed absolute change is below N * tolerance, so we pass tolerance / N to obtain our
 *   absolute L1 rule; maxIterations = 1000 as ours.
 */
function graphologyScores(graph: LinkGraph, damping: number, tolerance: number): Float64Array {
  const reference = new ReferenceGraph({ type: 'directed', multi: false, allowSelfLoops: false });
  for (let u = 0; u < graph.nodeCount; u++) reference.addNode(String(u));
  for (let u = 0; u < graph.nodeCount; u++) {
    for (let j = graph.outOffsets[u]; j < graph.outOffsets[u + 1]; j++) reference.addDirectedEdge(String(u), String(graph.outTargets[j]));
  }
  const scores = referencePagerank(reference, {
    alpha: damping,
    getEdgeWeight: null,
    tolerance: tolerance / graph.nodeCount,
    maxIterations: 1000,
  });
  return Float64Array.from({ length: graph.nodeCount }, (_, u) => scores[String(u)]);
}

describe('computeStationaryScore against graphology-metrics pagerank', () => {
  const cases = [
    { seed: 1, n: 200, edgesPerNode: 3, parts: 3, deadEndShare: 0.1, damping: 0.85 },
    { seed: 7, n: 1000, edgesPerNode: 5, parts: 5, deadEndShare: 0.05, damping: 0.85 },
    { seed: 42, n: 500, edgesPerNode: 2, parts: 4, deadEndShare: 0.2, damping: 0.5 },
    { seed: 2024, n: 300, edgesPerNode: 4, parts: 2, deadEndShare: 0.05, damping: 0.95 },
  ];
  for (const c of cases) {
    it(`agrees within 1e-9 per page (seed ${c.seed}, ${c.n} pages, d = ${c.damping})`, () => {
      const { graph } = randomSplitGraph(c.seed, c.n, c.edgesPerNode, c.parts, c.deadEndShare);
      const ours = computeStationaryScore(graph, { damping: c.damping, tolerance: 1e-12 });
      const theirs = graphologyScores(graph, c.damping, 1e-12);
      expect(ours.converged).toBe(true);
      let worst = 0;
      for (let u = 0; u < graph.nodeCount; u++) worst = Math.max(worst, Math.abs(ours.scores[u] - theirs[u]));
      expect(worst).toBeLessThan(1e-9);
    });
  }

  it('draws test graphs that really have dead ends and several components', async () => {
    const { weakComponents } = await import('./components.js');
    const { graph } = randomSplitGraph(7, 1000, 5, 5, 0.05);
    let deadEnds = 0;
    for (let u = 0; u < graph.nodeCount; u++) if (graph.outOffsets[u + 1] === graph.outOffsets[u]) deadEnds++;
    expect(deadEnds).toBeGreaterThan(20);
    expect(weakComponents(graph).count).toBeGreaterThanOrEqual(5);
  });
});
