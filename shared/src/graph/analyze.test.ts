import { describe, expect, it } from 'vitest';
import { analyzeLinkGraph, type AnalyzeLinkGraphInput } from './analyze.js';

// Hand-drawn doc set, entry page "index", threshold 2 clicks:
//   index -> guide -> api -> ref -> ref2 -> ref3 (dead end), index -> api, lonely -> index,
//   iso-a <-> iso-b (an island), solo (no links at all), plus a broken link to a missing page.
const pageIds = ['index', 'guide', 'api', 'ref', 'ref2', 'ref3', 'lonely', 'iso-a', 'iso-b', 'solo'];
const edges: Array<[string, string]> = [
  ['index', 'guide'],
  ['index', 'api'],
  ['guide', 'api'],
  ['api', 'ref'],
  ['ref', 'ref2'],
  ['ref2', 'ref3'],
  ['lonely', 'index'],
  ['iso-a', 'iso-b'],
  ['iso-b', 'iso-a'],
  ['guide', 'api'],
  ['api', 'api'],
  ['ref3', 'gone'],
];
const base: AnalyzeLinkGraphInput = { pageIds, edges, entryPages: ['index'], damping: 0.85, teleport: 'uniform', depthThreshold: 2 };
const byId = (analysis: ReturnType<typeof analyzeLinkGraph>) => new Map(analysis.pages.map((p) => [p.pageId, p]));

describe('analyzeLinkGraph on a hand-drawn doc set', () => {
  const analysis = analyzeLinkGraph(base);
  const page = byId(analysis);

  it('counts distinct inbound and outbound links, ignoring self-links, duplicates and broken links', () => {
    expect(page.get('api')).toMatchObject({ inboundCount: 2, outboundCount: 1 });
    expect(page.get('ref3')).toMatchObject({ inboundCount: 1, outboundCount: 0, deadEnd: true });
    expect(analysis.summary).toMatchObject({ pageCount: 10, edgeCount: 9, skippedLinks: 1 });
  });

  it('measures click depth and flags deep and unreachable pages', () => {
    expect(pageIds.map((id) => page.get(id)!.depth)).toEqual([0, 1, 1, 2, 3, 4, null, null, null, null]);
    expect(pageIds.filter((id) => page.get(id)!.deep)).toEqual(['ref2', 'ref3']);
    expect(pageIds.filter((id) => !page.get(id)!.reachable)).toEqual(['lonely', 'iso-a', 'iso-b', 'solo']);
  });

  it('flags orphans and islands', () => {
    expect(pageIds.filter((id) => page.get(id)!.orphan)).toEqual(['lonely', 'solo']);
    // lonely is unreachable but linked to the main site, so it is no island
    expect(pageIds.map((id) => page.get(id)!.islandId)).toEqual([null, null, null, null, null, null, null, 1, 1, 2]);
  });

  it('summarises the counts, including strong components', () => {
    expect(analysis.summary.counts).toEqual({ orphans: 2, deadEnds: 2, unreachable: 4, deepPages: 2, islands: 2, sccCount: 9 });
    expect(analysis.summary.converged).toBe(true);
    expect(analysis.summary.residual).toBeLessThan(1e-10);
  });

  it('ranks by score, equal scores by page id, and scales times-the-average to N', () => {
    const ranks = analysis.pages.map((p) => p.rank).sort((a, b) => a - b);
    expect(ranks).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    const sorted = [...analysis.pages].sort((a, b) => a.rank - b.rank);
    for (let i = 1; i < sorted.length; i++) expect(sorted[i - 1].stationaryScore).toBeGreaterThanOrEqual(sorted[i].stationaryScore);
    // iso-a/iso-b and lonely/solo are symmetric pairs: equal scores, so the id decides
    expect(page.get('iso-a')!.stationaryScore).toBeCloseTo(page.get('iso-b')!.stationaryScore, 14);
    expect(page.get('iso-a')!.rank).toBe(page.get('iso-b')!.rank - 1);
    expect(page.get('lonely')!.rank).toBe(page.get('solo')!.rank - 1);
    expect(analysis.pages.reduce((s, p) => s + p.timesAverage, 0)).toBeCloseTo(10, 10);
  });
});

describe('analyzeLinkGraph settings', () => {
  it('exempts entry pages from being orphans', () => {
    const analysis = analyzeLinkGraph({ ...base, pageIds: ['home', 'a'], edges: [['home', 'a']], entryPages: ['home'] });
    expect(analysis.pages.map((p) => p.orphan)).toEqual([false, false]);
  });

  it('concentrates the teleport on entry pages when asked', () => {
    const analysis = analyzeLinkGraph({ ...base, teleport: 'entry-pages' });
    expect(analysis.summary.teleportUsed).toBe('entry-pages');
    const page = byId(analysis);
    for (const id of ['lonely', 'iso-a', 'solo']) expect(page.get(id)!.stationaryScore).toBe(0);
    expect(page.get('index')!.rank).toBe(1);
  });

  it('without a known entry page: no reachability alarms, largest component is the main site, uniform teleport', () => {
    const analysis = analyzeLinkGraph({ ...base, entryPages: ['not-a-page'], teleport: 'entry-pages' });
    expect(analysis.summary).toMatchObject({ entryPagesFound: 0, teleportUsed: 'uniform' });
    expect(analysis.pages.every((p) => p.reachable && p.depth === null && !p.deep)).toBe(true);
    expect(analysis.summary.counts).toMatchObject({ unreachable: 0, deepPages: 0, islands: 2, orphans: 2 });
    expect(byId(analysis).get('index')!.islandId).toBeNull();
  });

  it('reaches the same vector from a warm start; an unchanged graph needs one iteration', () => {
    const cold = analyzeLinkGraph(base);
    const previous = new Map(cold.pages.map((p) => [p.pageId, p.stationaryScore]));
    expect(analyzeLinkGraph({ ...base, warmStart: previous }).summary.iterations).toBe(1);
    const changedEdges: Array<[string, string]> = [...edges, ['ref3', 'index']];
    const warm = analyzeLinkGraph({ ...base, edges: changedEdges, warmStart: previous });
    const coldChanged = analyzeLinkGraph({ ...base, edges: changedEdges });
    warm.pages.forEach((p, i) => expect(Math.abs(p.stationaryScore - coldChanged.pages[i].stationaryScore)).toBeLessThan(1e-9));
  });

  it('handles an empty doc set and rejects a bad threshold', () => {
    const empty = analyzeLinkGraph({ ...base, pageIds: [], edges: [], entryPages: [] });
    expect(empty.pages).toEqual([]);
    expect(empty.summary.counts.islands).toBe(0);
    expect(() => analyzeLinkGraph({ ...base, depthThreshold: -1 })).toThrow(RangeError);
  });
});
