import { describe, expect, it } from 'vitest';
import { buildGraphFromEdgePairs } from '../build-graph.js';
import { randomSplitGraph } from '../testing/graph-fixtures.js';
import { computeScoreGain, computeScoreGainsForTarget } from './score-gain.js';
import { computeStationaryScore } from './stationary-score.js';

describe('score gain of a proposed link', () => {
  const { graph, pairs } = randomSplitGraph(3, 400, 3, 2, 0.1);
  const current = computeStationaryScore(graph, { tolerance: 1e-13 }).scores;

  /** Independent check: rebuild the graph with the link and recompute from a cold start. */
  function rebuiltGain(source: number, target: number): number {
    const withLink = buildGraphFromEdgePairs(graph.nodeCount, Int32Array.from([...pairs, source, target]));
    return computeStationaryScore(withLink, { tolerance: 1e-13 }).scores[target] - current[target];
  }

  it('equals the gain from a full rebuild, for ordinary and dead-end sources', () => {
    const deadEnd = Array.from({ length: 400 }, (_, u) => u).find((u) => graph.outOffsets[u + 1] === graph.outOffsets[u])!;
    for (const [source, target] of [
      [5, 17],
      [deadEnd, 17],
      [300, 17],
    ]) {
      const gain = computeScoreGain(graph, current, source, target, { tolerance: 1e-13 });
      expect(Math.abs(gain.gain - rebuiltGain(source, target))).toBeLessThan(1e-11);
      expect(gain.iterations).toBeGreaterThan(0);
    }
  });

  it('warm start needs fewer iterations than a cold start', () => {
    const gain = computeScoreGain(graph, current, 5, 17, { tolerance: 1e-10 });
    const cold = computeStationaryScore(graph, { tolerance: 1e-10 });
    expect(gain.iterations).toBeLessThan(cold.iterations);
  });

  it('evaluates many sources for one target, matching single calls', () => {
    const sources = [1, 2, 3, 250, 17];
    const batch = computeScoreGainsForTarget(graph, current, 17, sources, { tolerance: 1e-13 });
    expect(batch.map((g) => g.source)).toEqual(sources);
    batch.forEach((g) => expect(g.gain).toBeCloseTo(computeScoreGain(graph, current, g.source, 17, { tolerance: 1e-13 }).gain, 14));
    expect(batch[4]).toMatchObject({ gain: 0, iterations: 0 }); // a self-link is no edge
  });

  it('reports no gain for a link that already exists', () => {
    const source = 0;
    const existing = graph.outTargets[graph.outOffsets[source]];
    expect(computeScoreGain(graph, current, source, existing)).toMatchObject({ gain: 0, iterations: 0 });
  });
});
