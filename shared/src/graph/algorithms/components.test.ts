import { describe, expect, it } from 'vitest';
import { buildGraphFromEdgePairs } from '../build-graph.js';
import { graphOf } from '../testing/graph-fixtures.js';
import { strongComponents, weakComponents } from './components.js';

describe('components on a hand-drawn graph', () => {
  // a <-> b -> c <-> d  (two cycles joined one way), e -> f (separate), g alone
  const graph = graphOf(['a', 'b', 'c', 'd', 'e', 'f', 'g'], ['a->b', 'b->a', 'b->c', 'c->d', 'd->c', 'e->f']);

  it('finds weak components numbered by their lowest page', () => {
    const { componentOf, count } = weakComponents(graph);
    expect(count).toBe(3);
    expect(Array.from(componentOf)).toEqual([0, 0, 0, 0, 1, 1, 2]);
  });

  it('finds strong components: each cycle is one, other pages stand alone', () => {
    const { componentOf, count } = strongComponents(graph);
    expect(count).toBe(5);
    expect(Array.from(componentOf)).toEqual([0, 0, 1, 1, 2, 3, 4]);
  });
});

describe('components on large graphs', () => {
  it('handles a 1,000,000-page chain and ring without recursion', () => {
    const n = 1_000_000;
    const pairs = new Int32Array(2 * n);
    for (let u = 0; u < n; u++) {
      pairs[2 * u] = u;
      pairs[2 * u + 1] = (u + 1) % n;
    }
    const ring = buildGraphFromEdgePairs(n, pairs);
    expect(strongComponents(ring).count).toBe(1);
    expect(weakComponents(ring).count).toBe(1);
    const chain = buildGraphFromEdgePairs(n, pairs.subarray(0, 2 * (n - 1)));
    expect(strongComponents(chain).count).toBe(n);
    expect(weakComponents(chain).count).toBe(1);
  });
});

describe('islandNumbers', () => {
  it('numbers the components without entry pages from 1, keeping every entry component as mainland', async () => {
    const { islandNumbers } = await import('./islands.js');
    const componentOf = Int32Array.from([0, 0, 1, 2, 2, 3]);
    expect(Array.from(islandNumbers(componentOf, [0, 5]))).toEqual([0, 0, 1, 2, 2, 0]);
    // no entry page: the largest component (2 pages, lowest number on a tie) is the main site
    expect(Array.from(islandNumbers(componentOf, []))).toEqual([0, 0, 1, 2, 2, 3]);
  });
});
