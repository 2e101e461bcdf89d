import type { DocSetSettings } from '@linkloom/shared';

/** One seeded finding: where it is, exactly as the writer typed it. */
export interface LinkFinding {
  sourcePath: string;
  href: string;
  line: number;
  /** For redirected links: the page the old path now maps to. */
  target?: string;
}

export interface ExpectedFindings {
  entryPages: string[];
  brokenLinks: LinkFinding[];
  brokenAnchors: LinkFinding[];
  brokenAssets: LinkFinding[];
  unsafe: LinkFinding[];
  ambiguous: LinkFinding[];
  redirected: LinkFinding[];
  outOfScope: LinkFinding[];
  orphans: string[];
  deadEnds: string[];
  unreachable: string[];
  /** Reachable pages whose click depth from the entry pages exceeds the depth threshold (3). */
  deepPages: string[];
  /** Weakly connected components other than the one holding the entry pages, each sorted. */
  islands: string[][];
}

export interface DemoDocSet {
  files: Record<string, string | Uint8Array>;
  settings: Partial<DocSetSettings>;
  expected: ExpectedFindings;
}

/** How a link is written in Markdown. */
export type LinkForm =
  | 'relative'
  | 'root-absolute'
  | 'site-url'
  | 'site-autolink'
  | 'wiki'
  | 'wiki-label'
  | 'wiki-heading'
  | 'wiki-title'
  | 'embed'
  | 'reference-full'
  | 'reference-collapsed'
  | 'reference-shortcut'
  | 'html'
  | 'image'
  | 'wiki-image'
  | 'autolink'
  | 'bare-url'
  | 'inline-raw'
  | 'empty';

/** What the link resolves to under docs/link-rules.md, decided by the generator when it plans the link. */
export type LinkStatus =
  | 'page'
  | 'self'
  | 'asset'
  | 'broken'
  | 'broken-anchor'
  | 'broken-asset'
  | 'external'
  | 'unsafe'
  | 'ambiguous'
  | 'redirected'
  | 'out-of-scope';

export interface PlannedLink {
  source: string;
  form: LinkForm;
  status: LinkStatus;
  /** Target page or asset path for resolved links; absent for external, broken and the like. */
  target?: string;
  /** Anchor slug (page links) or heading text (wiki-heading). */
  fragment?: string;
  /** Written as is for raw forms (broken, external, unsafe ...). */
  rawHref?: string;
  label: string;
}

export interface PagePlan {
  path: string;
  title: string;
  section: string;
  kind: 'entry' | 'index' | 'page' | 'notes' | 'policy' | 'how-to' | 'runbook' | 'reference' | 'archive';
  aliases?: string[];
  owner?: string;
  tags: string[];
  reviewed: string;
  redirectFrom?: string[];
  thin?: boolean;
  headings: string[];
}

/** A link after rendering: the exact href text and the 1-based line of the file it sits on. */
export interface RenderedLink extends PlannedLink {
  href: string;
  line: number;
}
