import { describe, expect, it } from 'vitest';
import { computeStationaryScore } from './stationary-score.js';
import { graphOf } from '../testing/graph-fixtures.js';

const sum = (v: Float64Array) => v.reduce((a, b) => a + b, 0);

describe('computeStationaryScore against published examples', () => {
  it('reproduces the six-page example of Langville and Meyer', () => {
    // Source: Langville and Meyer, "Deeper Inside PageRank", Internet Mathematics 1(3), 2004, section 4:
    // six pages, d = 0.9, page 2 a dead end (its row replaced by the uniform vector), uniform teleport.
    // The expected values are recalled from memory and were reproduced by an independent computation.
    const graph = graphOf(['1', '2', '3', '4', '5', '6'], ['1->2', '1->3', '3->1', '3->2', '3->5', '4->5', '4->6', '5->4', '5->6', '6->4']);
    const { scores, converged } = computeStationaryScore(graph, { damping: 0.9 });
    expect(converged).toBe(true);
    const published: Array<[number, number]> = [
      [0.03721, 5],
      [0.05396, 5],
      [0.04151, 5],
      [0.3751, 4],
      [0.206, 4],
      [0.2862, 4],
    ];
    published.forEach(([value, decimals], i) => {
      // "to the published precision": within half a unit of the last printed decimal
      expect(Math.abs(scores[i] - value)).toBeLessThanOrEqual(0.5 * 10 ** -decimals + 1e-12);
    });
  });

  it("reproduces the eleven-page illustration of Wikipedia's PageRank article", () => {
    // Source: Wikipedia, "PageRank", the eleven-page illustration (d = 0.85, A a dead end), percentages to
    // one decimal. Values from memory, reproduced by an independent computation.
    const ids = 'ABCDEFGHIJK'.split('');
    const edges = [
      'B->C',
      'C->B',
      'D->A',
      'D->B',
      'E->B',
      'E->D',
      'E->F',
      'F->B',
      'F->E',
      'G->B',
      'G->E',
      'H->B',
      'H->E',
      'I->B',
      'I->E',
      'J->E',
      'K->E',
    ];
    const { scores } = computeStationaryScore(graphOf(ids, edges), { damping: 0.85 });
    const percent = [3.3, 38.4, 34.3, 3.9, 8.1, 3.9, 1.6, 1.6, 1.6, 1.6, 1.6];
    percent.forEach((value, i) => expect(Math.abs(100 * scores[i] - value)).toBeLessThanOrEqual(0.05 + 1e-9));
  });
});

describe('computeStationaryScore properties', () => {
  it('returns scores summing to 1, also with dead ends and a custom teleport', () => {
    const graph = graphOf(['a', 'b', 'c', 'd'], ['a->b', 'b->c', 'c->a', 'a->d']);
    expect(sum(computeStationaryScore(graph).scores)).toBeCloseTo(1, 12);
    expect(sum(computeStationaryScore(graph, { teleport: [3, 0, 1, 0] }).scores)).toBeCloseTo(1, 12);
  });

  it('gives the same vector under any relabelling of the pages', () => {
    const ids = ['a', 'b', 'c', 'd', 'e', 'f'];
    const edges = ['a->b', 'a->c', 'b->c', 'c->a', 'd->c', 'e->f', 'f->e', 'e->a'];
    const base = computeStationaryScore(graphOf(ids, edges)).scores;
    const permuted = ['f', 'd', 'b', 'e', 'a', 'c'];
    const other = computeStationaryScore(graphOf(permuted, edges)).scores;
    permuted.forEach((id, i) => expect(other[i]).toBeCloseTo(base[ids.indexOf(id)], 12));
  });

  it('puts first the page that two others link to exclusively', () => {
    const { scores } = computeStationaryScore(graphOf(['a', 'b', 'c'], ['a->c', 'b->c']));
    expect(scores[2]).toBeGreaterThan(scores[0]);
    expect(scores[2]).toBeGreaterThan(scores[1]);
    expect(scores[0]).toBe(scores[1]);
  });

  it('finds one vector on a split graph whatever the start vector', () => {
    // Teleport makes the chain irreducible even when the link graph is not, so the limit is unique.
    const graph = graphOf(['a', 'b', 'c', 'd', 'e'], ['a->b', 'b->a', 'c->d', 'd->e', 'e->c']);
    const fromUniform = computeStationaryScore(graph).scores;
    const fromSkewed = computeStationaryScore(graph, { start: [1, 0, 0, 0, 0] }).scores;
    fromUniform.forEach((value, i) => expect(Math.abs(value - fromSkewed[i])).toBeLessThan(1e-9));
    // two cycles split the weight by size: 2/5 and 3/5
    expect(fromUniform[0] + fromUniform[1]).toBeCloseTo(0.4, 9);
  });

  it('raises a page that gains a link from a high-score page', () => {
    const ids = ['hub', 'x', 'y', 'target', 'other'];
    const edges = ['x->hub', 'y->hub', 'target->hub', 'other->hub', 'hub->other'];
    const before = computeStationaryScore(graphOf(ids, edges)).scores;
    const after = computeStationaryScore(graphOf(ids, [...edges, 'hub->target'])).scores;
    expect(after[3]).toBeGreaterThan(before[3] + 0.05);
  });

  it('concentrates the teleport on entry pages and leaves pages they cannot reach at 0', () => {
    const graph = graphOf(['home', 'guide', 'island'], ['home->guide', 'guide->home', 'island->home']);
    const { scores } = computeStationaryScore(graph, { teleport: [1, 0, 0] });
    expect(scores[2]).toBe(0);
    // home and guide swap all weight: x_home = d*x_guide + (1-d), x_guide = d*x_home, so x_home = 1/(1+d)
    expect(scores[0]).toBeCloseTo(1 / 1.85, 10);
  });

  it('stops at maxIterations and reports the residual', () => {
    const graph = graphOf(['a', 'b', 'c'], ['a->b', 'b->c', 'c->a', 'a->c']);
    const result = computeStationaryScore(graph, { maxIterations: 2 });
    expect(result.iterations).toBe(2);
    expect(result.converged).toBe(false);
    expect(result.residual).toBeGreaterThan(1e-10);
  });

  it('handles the empty graph and rejects bad settings', () => {
    expect(computeStationaryScore(graphOf([], [])).scores.length).toBe(0);
    const graph = graphOf(['a'], []);
    expect(Array.from(computeStationaryScore(graph).scores)).toEqual([1]);
    expect(() => computeStationaryScore(graph, { damping: 1 })).toThrow(RangeError);
    expect(() => computeStationaryScore(graph, { tolerance: 0 })).toThrow(RangeError);
    expect(() => computeStationaryScore(graph, { teleport: [0] })).toThrow(RangeError);
  });
});
