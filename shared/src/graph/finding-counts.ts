/**
 * One definition per count of a run, over the run's stored findings (docs/metrics.md). The run summary, the
 * lists, the CSV and the digest all count through these predicates, so two screens can never disagree.
 * Lists count distinct pages: a page that is both an orphan and unreachable is one page that needs links.
 */

/** The per-page findings of a run, as the analysis produces and the database stores them. */
export interface PageFindingFlags {
  readonly orphan: boolean;
  readonly reachable: boolean;
  readonly deep: boolean;
  readonly deadEnd: boolean;
  /** null for the entry pages' part of the graph and for isolated pages. */
  readonly islandId: number | null;
  readonly inboundCount: number;
  readonly outboundCount: number;
}

/** docs/metrics.md "Pages that need links": orphan, unreachable or deep, each page once. */
export function needsLinks(page: PageFindingFlags): boolean {
  return page.orphan || !page.reachable || page.deep;
}

/** docs/metrics.md "Isolated pages": no link to or from another page of the doc set. */
export function isIsolated(page: Pick<PageFindingFlags, 'inboundCount' | 'outboundCount'>): boolean {
  return page.inboundCount === 0 && page.outboundCount === 0;
}

export interface PageFindingCounts {
  orphans: number;
  deadEnds: number;
  unreachable: number;
  deepPages: number;
  pagesNeedingLinks: number;
  isolatedPages: number;
  /** Groups of two or more pages (docs/metrics.md "Islands"), not the pages in them. */
  islands: number;
}

export function pageFindingCounts(pages: Iterable<PageFindingFlags>): PageFindingCounts {
  const counts = { orphans: 0, deadEnds: 0, unreachable: 0, deepPages: 0, pagesNeedingLinks: 0, isolatedPages: 0, islands: 0 };
  const islandIds = new Set<number>();
  for (const page of pages) {
    if (page.orphan) counts.orphans++;
    if (page.deadEnd) counts.deadEnds++;
    if (!page.reachable) counts.unreachable++;
    if (page.deep) counts.deepPages++;
    if (needsLinks(page)) counts.pagesNeedingLinks++;
    if (isIsolated(page)) counts.isolatedPages++;
    if (page.islandId !== null) islandIds.add(page.islandId);
  }
  counts.islands = islandIds.size;
  return counts;
}

/** Links of a snapshot counted by status, and whether the target is a file rather than a page. */
export interface LinkStatusCount {
  readonly status: string;
  readonly targetIsAsset: boolean;
  readonly count: number;
}

export interface LinkFindingCounts {
  links: number;
  internalLinks: number;
  externalLinks: number;
  brokenLinks: number;
  brokenAnchors: number;
  brokenAssets: number;
  unsafeLinks: number;
  ambiguousLinks: number;
  redirectedLinks: number;
  outOfScopeLinks: number;
}

/** docs/metrics.md "Broken links": a missing page; a missing image or PDF is a broken asset, counted apart. */
export function isBrokenPageLink(link: Pick<LinkStatusCount, 'status' | 'targetIsAsset'>): boolean {
  return link.status === 'broken' && !link.targetIsAsset;
}

/** docs/metrics.md "Broken anchors": the page exists, the heading or id does not. */
export function isBrokenAnchor(link: Pick<LinkStatusCount, 'status'>): boolean {
  return link.status === 'broken-anchor';
}

export function linkFindingCounts(links: readonly LinkStatusCount[]): LinkFindingCounts {
  const sum = (pick: (l: LinkStatusCount) => boolean) => links.filter(pick).reduce((total, l) => total + l.count, 0);
  return {
    links: sum(() => true),
    internalLinks: sum((l) => l.status !== 'external' && l.status !== 'out-of-scope' && l.status !== 'unsafe'),
    externalLinks: sum((l) => l.status === 'external'),
    brokenLinks: sum(isBrokenPageLink),
    brokenAnchors: sum(isBrokenAnchor),
    brokenAssets: sum((l) => l.status === 'broken' && l.targetIsAsset),
    unsafeLinks: sum((l) => l.status === 'unsafe'),
    ambiguousLinks: sum((l) => l.status === 'ambiguous'),
    redirectedLinks: sum((l) => l.status === 'redirected'),
    outOfScopeLinks: sum((l) => l.status === 'out-of-scope'),
  };
}
