import { describe, expect, it } from 'vitest';
import { buildGraph, clickDepths, expectedFindings, weakComponents } from './expected-findings.js';
import type { PagePlan, RenderedLink } from './types.js';

const page = (path: string): PagePlan => ({ path, title: path, section: '', kind: 'page', tags: [], reviewed: '2026-01-01', headings: [] });
const link = (source: string, target: string, status: RenderedLink['status'] = 'page'): RenderedLink => ({
  source,
  target,
  status,
  form: 'relative',
  label: '',
  href: target,
  line: 1,
});

// Hand-drawn graph, answers worked out on paper:
//   index -> a -> b -> c -> d   (d is 4 clicks deep; d is a dead end)
//   index -> e, e -> e (self link only: e is a dead end)
//   o -> a                      (o: orphan, unreachable, but weakly joined to the main component)
//   x <-> y                     (island; neither is an orphan nor a dead end)
//   index -> a#missing (broken anchor) and a broken link from b: neither adds an edge
const PAGES = ['index', 'a', 'b', 'c', 'd', 'e', 'o', 'x', 'y'].map(page);
const LINKS = [
  link('index', 'a'),
  link('a', 'b'),
  link('b', 'c'),
  link('c', 'd'),
  link('index', 'e'),
  link('e', 'e'),
  link('o', 'a'),
  link('x', 'y'),
  link('y', 'x'),
  link('index', 'a', 'broken-anchor'),
  { ...link('b', 'nowhere', 'broken'), target: undefined },
];

describe('expectedFindings on a hand-drawn graph', () => {
  const graph = buildGraph(
    PAGES.map((p) => p.path),
    LINKS,
  );

  it('counts one edge per linked pair and ignores self links and broken links', () => {
    expect([...graph.edges.get('index')!].sort()).toEqual(['a', 'e']);
    expect(graph.edges.get('e')!.size).toBe(0);
    expect(graph.edges.get('b')!.size).toBe(1);
  });

  it('measures click depth by breadth-first search from the entry page', () => {
    const depth = clickDepths(graph, ['index']);
    expect(Object.fromEntries(depth)).toEqual({ index: 0, a: 1, e: 1, b: 2, c: 3, d: 4 });
  });

  it('splits the graph into weakly connected components', () => {
    expect(
      weakComponents(graph)
        .map((c) => c.join(','))
        .sort(),
    ).toEqual(['a,b,c,d,e,index,o', 'x,y']);
  });

  it('derives orphans, dead ends, unreachable, deep pages and islands', () => {
    const f = expectedFindings(PAGES, LINKS, ['index']);
    expect(f.orphans).toEqual(['o']);
    expect(f.deadEnds).toEqual(['d', 'e']);
    expect(f.unreachable).toEqual(['o', 'x', 'y']);
    // "More than 3 clicks deep" (docs/metrics.md; a rule of thumb, common practice, no source).
    expect(f.deepPages).toEqual(['d']);
    expect(f.islands).toEqual([['x', 'y']]);
    expect(f.brokenLinks).toEqual([{ sourcePath: 'b', href: 'nowhere', line: 1 }]);
    expect(f.brokenAnchors).toEqual([{ sourcePath: 'index', href: 'a', line: 1 }]);
  });

  it('a lower depth threshold makes more pages deep', () => {
    expect(expectedFindings(PAGES, LINKS, ['index'], 2).deepPages).toEqual(['c', 'd']);
  });
});
