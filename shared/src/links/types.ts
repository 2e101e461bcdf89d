/** Facts read from one Markdown page; the resolver and the importer work only from these. */
export type LinkKind = 'inline' | 'reference' | 'autolink' | 'html' | 'image' | 'wiki' | 'wiki-embed';

export interface RawLink {
  kind: LinkKind;
  /** The destination as written (after CommonMark unescaping); for wiki links `Target#Heading` without the label. */
  href: string;
  line: number;
  column: number;
  text: string;
  asset: boolean;
}

export interface Heading {
  depth: number;
  text: string;
  slug: string;
  line: number;
}

export type PageWarningCode = 'FRONT_MATTER_INVALID' | 'LINK_LIMIT' | 'BACKSLASH_PATH' | 'PARSE_LIMIT' | 'PARSE_DEPTH';

export interface PageWarning {
  code: PageWarningCode;
  message: string;
  line?: number;
}

export interface FrontMatter {
  title?: string;
  aliases: string[];
  owner?: string;
  tags: string[];
  /** ISO date (YYYY-MM-DD) from `reviewed`, `last_reviewed`, `updated`, `last_updated` or `date`, first found. */
  reviewed?: string;
  redirectFrom: string[];
  /** True for `linkloom: { protect: true }`, `protect: true` or `prune: false`. */
  protected?: boolean;
  raw: Record<string, unknown>;
}

export interface PageFacts {
  path: string;
  title: string;
  headings: Heading[];
  anchors: string[];
  blockIds: string[];
  wordCount: number;
  text: string;
  frontMatter: FrontMatter;
  warnings: PageWarning[];
  links: RawLink[];
}

export type LinkStatus = 'ok' | 'broken' | 'broken-anchor' | 'unsafe' | 'external' | 'ambiguous' | 'redirected' | 'out-of-scope';

export interface ResolvedLink {
  sourcePath: string;
  line: number;
  column: number;
  href: string;
  kind: LinkKind;
  status: LinkStatus;
  targetPath: string | null;
  targetIsAsset: boolean;
  anchor: string | null;
  flags: string[];
  reason: string | null;
  candidates?: string[];
}

/** What the resolver needs to know about each page of the snapshot. */
export interface PageTargetInfo {
  title: string;
  aliases: string[];
  anchors: string[];
  headings: Pick<Heading, 'text' | 'slug'>[];
  blockIds: string[];
  redirectFrom: string[];
}
