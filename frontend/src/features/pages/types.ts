// Shapes of the per-run page routes (API.md "Runs", extended by the page-explorer brief).
import type { ListResult, RunPageItem } from '@linkloom/shared';

export type { ListResult };

/** Finding flags a page can carry, in the words the API uses in `flags=`. */
export const PAGE_FLAGS = ['orphan', 'dead-end', 'unreachable', 'deep', 'island'] as const;
export type PageFlag = (typeof PAGE_FLAGS)[number];

export type PageRow = RunPageItem;

export interface LinkedPage {
  path: string;
  title: string;
  line?: number | null;
}

export interface PageBrokenLink {
  href: string | null;
  line: number;
  column: number;
  status: string;
  reason?: string | null;
  targetPath?: string | null;
  anchor?: string | null;
}

export interface SuggestedSource {
  path: string;
  title: string;
  scoreGain: number;
  reason?: string | null;
}

export interface ScorePoint {
  runId: string;
  finishedAt: string;
  stationaryScore: number;
}

export interface NeighbourNode {
  path: string;
  title: string;
  stationaryScore: number;
  flags: string[];
  /** Link steps from the page in the centre: 0, 1 or 2. */
  distance: number;
}

export interface Neighbourhood {
  nodes: NeighbourNode[];
  edges: Array<{ source: string; target: string }>;
}

export interface PageDetail extends PageRow {
  inbound: LinkedPage[];
  outbound: LinkedPage[];
  brokenLinks: PageBrokenLink[];
  anchors: string[];
  unlinkedMentions: Array<{ path: string; title: string }>;
  suggestedSources: SuggestedSource[];
  scoreHistory: ScorePoint[];
  frontMatter?: Record<string, unknown> | null;
  headings?: Array<{ depth?: number; text?: string; slug?: string } | string> | null;
  neighbourhood?: Neighbourhood | null;
}

/** Flags of a row, in `PAGE_FLAGS` words, for chips and colours. */
export function pageFlags(row: Pick<PageRow, 'orphan' | 'deadEnd' | 'reachable' | 'deep' | 'island'>): PageFlag[] {
  const flags: PageFlag[] = [];
  if (row.orphan) flags.push('orphan');
  if (row.deadEnd) flags.push('dead-end');
  if (!row.reachable) flags.push('unreachable');
  if (row.deep) flags.push('deep');
  if (row.island) flags.push('island');
  return flags;
}
