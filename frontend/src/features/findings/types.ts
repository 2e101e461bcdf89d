// Shapes of the per-run links and islands routes (API.md "Runs", extended by the findings brief).
export const LINK_STATUSES = ['broken', 'broken-anchor', 'unsafe', 'ambiguous', 'redirected', 'out-of-scope', 'external', 'ok'] as const;
export type LinkStatus = (typeof LINK_STATUSES)[number];

export interface LinkRow {
  sourcePath: string;
  line: number;
  column: number;
  /** Null for unsafe links: the server withholds the raw text. */
  href: string | null;
  hrefText?: string | null;
  targetPath: string | null;
  anchor: string | null;
  kind: string;
  status: LinkStatus | string;
  reason?: string | null;
}

/** A source of a grouped row; servers may send the full link or just the page path. */
export type GroupSource = string | { sourcePath: string; line?: number; column?: number; title?: string };

export interface LinkTargetGroup {
  targetPath?: string | null;
  href?: string | null;
  count: number;
  sources: GroupSource[];
}

export interface Island {
  islandId: string | number;
  size: number;
  pages: Array<{ path: string; title: string }>;
}
