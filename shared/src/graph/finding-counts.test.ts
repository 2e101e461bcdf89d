// Each count's definition (docs/metrics.md) on small graphs drawn by hand. The definitions are the product's
// own; where they follow the trade they say so: an orphan page has no inbound links and a dead end no
// outbound ones (common practice in site audits, no single source); islands are weakly connected
// components (Tarjan 1972 / any graph text: a weak component ignores edge direction).
import { describe, expect, it } from 'vitest';
import { analyzeLinkGraph, type AnalyzeLinkGraphInput } from './analyze.js';
import { isBrokenAnchor, isBrokenPageLink, isIsolated, linkFindingCounts, needsLinks, pageFindingCounts } from './finding-counts.js';

const settings = { damping: 0.85, teleport: 'uniform', depthThreshold: 1 } as const;
const analyse = (pageIds: string[], edges: Array<[string, string]>, entryPages: string[]) =>
  analyzeLinkGraph({ pageIds, edges, entryPages, ...settings } satisfies AnalyzeLinkGraphInput);
const flagged = (analysis: ReturnType<typeof analyse>, pick: (p: (typeof analysis.pages)[number]) => boolean) =>
  analysis.pages.filter(pick).map((p) => p.pageId);

describe('pages that need links count distinct pages', () => {
  // home -> a -> b -> c (c is 3 clicks deep, threshold 1: b and c are deep); lost has no links at all, so
  // it is an orphan and unreachable at once; stray -> home links out only (an orphan, unreachable).
  const analysis = analyse(
    ['home', 'a', 'b', 'c', 'lost', 'stray'],
    [
      ['home', 'a'],
      ['a', 'b'],
      ['b', 'c'],
      ['stray', 'home'],
    ],
    ['home'],
  );

  it('counts a page that is both orphan and unreachable once', () => {
    expect(flagged(analysis, (p) => p.orphan)).toEqual(['lost', 'stray']);
    expect(flagged(analysis, (p) => !p.reachable)).toEqual(['lost', 'stray']);
    expect(flagged(analysis, (p) => p.deep)).toEqual(['b', 'c']);
    expect(flagged(analysis, needsLinks)).toEqual(['b', 'c', 'lost', 'stray']);
    // orphans + unreachable + deep would say 6: the sum counts lost and stray twice
    expect(analysis.summary.counts.pagesNeedingLinks).toBe(4);
  });
});

describe('islands and isolated pages', () => {
  it('a single page with no links in or out is isolated, not an island', () => {
    const analysis = analyse(['home', 'a', 'alone'], [['home', 'a']], ['home']);
    expect(analysis.summary.counts).toMatchObject({ islands: 0, isolatedPages: 1 });
    expect(flagged(analysis, (p) => p.isolated)).toEqual(['alone']);
    expect(analysis.pages.every((p) => p.islandId === null)).toBe(true);
  });

  it('two pages linked one way are an island; three pages in a chain are one island, not three', () => {
    const analysis = analyse(
      ['home', 'x1', 'x2', 'y1', 'y2', 'y3'],
      [
        ['x1', 'x2'],
        ['y1', 'y2'],
        ['y3', 'y2'],
      ],
      ['home'],
    );
    expect(analysis.summary.counts.islands).toBe(2);
    const island = new Map(analysis.pages.map((p) => [p.pageId, p.islandId]));
    expect(island.get('x1')).toBe(island.get('x2'));
    expect(new Set([island.get('y1'), island.get('y2'), island.get('y3')]).size).toBe(1);
    expect(island.get('x1')).not.toBe(island.get('y1'));
    // the entry page has no link in or out: isolated by the definition, and still the main site
    expect(island.get('home')).toBeNull();
    expect(flagged(analysis, (p) => p.isolated)).toEqual(['home']);
  });

  it('a group that links into the main site is not cut off, so it is no island even though unreachable', () => {
    const analysis = analyse(
      ['home', 'a', 'p', 'q'],
      [
        ['home', 'a'],
        ['p', 'q'],
        ['q', 'a'],
      ],
      ['home'],
    );
    expect(analysis.summary.counts).toMatchObject({ islands: 0, unreachable: 2 });
  });

  it('isIsolated reads links in both directions', () => {
    expect(isIsolated({ inboundCount: 0, outboundCount: 0 })).toBe(true);
    expect(isIsolated({ inboundCount: 0, outboundCount: 1 })).toBe(false);
    expect(isIsolated({ inboundCount: 2, outboundCount: 0 })).toBe(false);
  });
});

describe('pageFindingCounts over stored findings', () => {
  it('counts islands as distinct groups, not pages', () => {
    const page = { orphan: false, reachable: false, deep: false, deadEnd: false, inboundCount: 1, outboundCount: 1 };
    const counts = pageFindingCounts([
      { ...page, islandId: 1 },
      { ...page, islandId: 1 },
      { ...page, islandId: 2 },
      { ...page, islandId: 2 },
      { ...page, islandId: null, reachable: true },
    ]);
    expect(counts).toMatchObject({ islands: 2, unreachable: 4, pagesNeedingLinks: 4, isolatedPages: 0 });
  });
});

describe('broken links and broken anchors stay apart', () => {
  const links = [
    { status: 'ok', targetIsAsset: false, count: 7 },
    { status: 'broken', targetIsAsset: false, count: 3 },
    { status: 'broken', targetIsAsset: true, count: 2 },
    { status: 'broken-anchor', targetIsAsset: false, count: 5 },
    { status: 'redirected', targetIsAsset: false, count: 1 },
    { status: 'external', targetIsAsset: false, count: 4 },
  ];

  it('a missing page is a broken link, a missing heading a broken anchor, a missing image a broken asset', () => {
    expect(linkFindingCounts(links)).toMatchObject({ brokenLinks: 3, brokenAnchors: 5, brokenAssets: 2, links: 22, externalLinks: 4 });
    expect(isBrokenPageLink({ status: 'broken-anchor', targetIsAsset: false })).toBe(false);
    expect(isBrokenAnchor({ status: 'broken' })).toBe(false);
  });
});
