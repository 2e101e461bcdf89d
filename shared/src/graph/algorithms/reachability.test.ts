import { describe, expect, it } from 'vitest';
import { graphOf } from '../testing/graph-fixtures.js';
import { computeClickDepth } from './reachability.js';

describe('computeClickDepth', () => {
  // Hand-drawn: home -> a -> b -> c -> d, home -> c (shortcut), docs -> d, e unreachable (links in only).
  const graph = graphOf(['home', 'a', 'b', 'c', 'd', 'docs', 'e'], ['home->a', 'a->b', 'b->c', 'c->d', 'home->c', 'docs->d', 'e->home']);

  it('takes the shortest path from the entry page', () => {
    expect(Array.from(computeClickDepth(graph, [0]))).toEqual([0, 1, 2, 1, 2, -1, -1]);
  });

  it('measures from the nearest of several entry pages, ignoring repeats', () => {
    expect(Array.from(computeClickDepth(graph, [0, 5, 5]))).toEqual([0, 1, 2, 1, 1, 0, -1]);
  });

  it('marks everything unreachable without entry pages and rejects unknown nodes', () => {
    expect(Array.from(computeClickDepth(graph, []))).toEqual([-1, -1, -1, -1, -1, -1, -1]);
    expect(() => computeClickDepth(graph, [7])).toThrow(RangeError);
  });
});
