import { describe, expect, it } from 'vitest';
import { buildGraphFromEdgePairs, buildLinkGraph, hasEdge } from './build-graph.js';

const row = (offsets: Int32Array, values: Int32Array, u: number) => Array.from(values.subarray(offsets[u], offsets[u + 1]));

describe('buildLinkGraph', () => {
  it('numbers pages in the given order, merges duplicate links and drops self-links', () => {
    const { graph, indexOf, skippedLinks } = buildLinkGraph(
      ['x', 'y', 'z'],
      [['x', 'z'], ['x', 'y'], ['x', 'z'], ['y', 'y'], { source: 'z', target: 'x' }, ['x', 'missing']],
    );
    expect(indexOf.get('z')).toBe(2);
    expect(skippedLinks).toBe(1);
    expect(graph.edgeCount).toBe(3);
    expect(row(graph.outOffsets, graph.outTargets, 0)).toEqual([1, 2]);
    expect(row(graph.outOffsets, graph.outTargets, 1)).toEqual([]);
    expect(row(graph.inOffsets, graph.inSources, 0)).toEqual([2]);
    expect(row(graph.inOffsets, graph.inSources, 2)).toEqual([0]);
    expect(hasEdge(graph, 0, 2)).toBe(true);
    expect(hasEdge(graph, 1, 1)).toBe(false);
  });

  it('rejects duplicate page ids', () => {
    expect(() => buildLinkGraph(['a', 'a'], [])).toThrow(/duplicate/);
  });
});

describe('buildGraphFromEdgePairs', () => {
  it('matches a naive set-of-edges construction on a random multigraph', () => {
    const n = 50;
    const pairs = new Int32Array(2000);
    let seed = 12345;
    for (let i = 0; i < pairs.length; i++) {
      seed = (seed * 1103515245 + 12345) & 0x7fffffff;
      pairs[i] = seed % n;
    }
    const graph = buildGraphFromEdgePairs(n, pairs);
    const expected = new Map<number, Set<number>>();
    for (let e = 0; e < pairs.length; e += 2) {
      if (pairs[e] === pairs[e + 1]) continue;
      if (!expected.has(pairs[e])) expected.set(pairs[e], new Set());
      expected.get(pairs[e])!.add(pairs[e + 1]);
    }
    let total = 0;
    for (let u = 0; u < n; u++) {
      const targets = [...(expected.get(u) ?? [])].sort((a, b) => a - b);
      total += targets.length;
      expect(row(graph.outOffsets, graph.outTargets, u)).toEqual(targets);
      const sources = [...expected.entries()]
        .filter(([, set]) => set.has(u))
        .map(([s]) => s)
        .sort((a, b) => a - b);
      expect(row(graph.inOffsets, graph.inSources, u)).toEqual(sources);
    }
    expect(graph.edgeCount).toBe(total);
  });

  it('sorts and merges a long row (a navigation page linking to every page, twice, in reverse order)', () => {
    const n = 200;
    const pairs: number[] = [];
    for (let round = 0; round < 2; round++) for (let t = n - 1; t >= 0; t--) pairs.push(0, t);
    const graph = buildGraphFromEdgePairs(n, Int32Array.from(pairs));
    expect(row(graph.outOffsets, graph.outTargets, 0)).toEqual(Array.from({ length: n - 1 }, (_, i) => i + 1));
    expect(graph.edgeCount).toBe(n - 1);
    expect(row(graph.inOffsets, graph.inSources, 150)).toEqual([0]);
  });

  it('rejects out-of-range nodes and odd-length input', () => {
    expect(() => buildGraphFromEdgePairs(2, Int32Array.from([0, 2]))).toThrow(RangeError);
    expect(() => buildGraphFromEdgePairs(2, Int32Array.from([0]))).toThrow(RangeError);
  });
});
