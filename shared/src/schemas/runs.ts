/** Counts of every finding of one run (the `counts` of a run in the HTTP contract). */
export interface RunCounts {
  pages: number;
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
  orphans: number;
  deadEnds: number;
  unreachable: number;
  deepPages: number;
  islands: number;
}

/** A page of a run as the page list and the page detail return it. */
export interface RunPageItem {
  path: string;
  title: string;
  stationaryScore: number;
  timesAverage: number;
  rank: number;
  inboundCount: number;
  outboundCount: number;
  depth: number | null;
  reachable: boolean;
  orphan: boolean;
  deadEnd: boolean;
  deep: boolean;
  island: boolean;
  brokenLinkCount: number;
  wordCount: number;
}
