/**
 * One page's bytes to stored facts: the decoding rules of docs/threats.md checks 27-29, then the shared link
 * core's `extractPage`. Pure and synchronous, so it runs the same in a worker thread and in-process.
 */
import { extractPage, type FrontMatter, type Heading, type RawLink } from '@linkloom/shared/links';

export interface ParseOptions {
  wikiLinks: boolean;
  /** Extensions that make a wiki target a page rather than an asset (the doc set's `extensions`). */
  pageExtensions: string[];
}

/** What the database keeps per page besides text and raw links (`headingText` feeds the search column). */
export interface StoredFacts {
  title: string;
  wordCount: number;
  headings: Heading[];
  headingText: string;
  anchors: string[];
  blockIds: string[];
  frontMatter: FrontMatter;
  warnings: PageWarning[];
  /** Parser options the facts were made with: a stored page is only reused under the same options. */
  parseOptions: ParseOptions;
}

export interface PageWarning {
  code: string;
  message: string;
  line?: number;
}

export type ParseOutcome =
  { path: string; ok: true; facts: StoredFacts; text: string; rawLinks: RawLink[] } | { path: string; ok: false; warning: PageWarning };

const UTF16_BOMS = [
  [0xff, 0xfe],
  [0xfe, 0xff],
];

/** Returns the page's Markdown as a string with LF line ends, or the reason it cannot be read as text. */
export function decodePage(bytes: Uint8Array): { ok: true; markdown: string } | { ok: false; warning: PageWarning } {
  if (UTF16_BOMS.some(([a, b]) => bytes[0] === a && bytes[1] === b)) {
    return skip('UNSUPPORTED_ENCODING', 'The file is UTF-16; save it as UTF-8.');
  }
  // NUL never appears in text (common practice: the heuristic of git and grep for "binary file").
  if (bytes.indexOf(0) !== -1) return skip('BINARY_CONTENT', 'The file contains binary data, not Markdown text.');
  let markdown: string;
  try {
    // `fatal: true` refuses invalid sequences instead of inserting U+FFFD; the UTF-8 BOM is dropped.
    markdown = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return skip('INVALID_UTF8', 'The file is not valid UTF-8 text.');
  }
  // CommonMark 0.31 section 2.1: a line ending is LF, CR LF or a lone CR; one form keeps line numbers stable.
  return { ok: true, markdown: markdown.replace(/\r\n?/g, '\n') };
}

export function parsePage(path: string, bytes: Uint8Array, options: ParseOptions): ParseOutcome {
  const decoded = decodePage(bytes);
  if (!decoded.ok) return { path, ok: false, warning: decoded.warning };
  const facts = extractPage(path, decoded.markdown, { wikiLinks: options.wikiLinks, pageExtensions: options.pageExtensions });
  return {
    path,
    ok: true,
    text: facts.text,
    rawLinks: facts.links,
    facts: {
      title: facts.title,
      wordCount: facts.wordCount,
      headings: facts.headings,
      headingText: facts.headings.map((heading) => heading.text).join(' '),
      anchors: facts.anchors,
      blockIds: facts.blockIds,
      frontMatter: facts.frontMatter,
      warnings: facts.warnings,
      parseOptions: { wikiLinks: options.wikiLinks, pageExtensions: options.pageExtensions },
    },
  };
}

/** A parser bug on one page must not fail the import: the page is skipped and reported instead. */
export function parsePageSafely(path: string, bytes: Uint8Array, options: ParseOptions): ParseOutcome {
  try {
    return parsePage(path, bytes, options);
  } catch (error) {
    const reason = String((error as Error)?.message ?? error).slice(0, 200);
    return { path, ok: false, warning: { code: 'PARSE_FAILED', message: `The page could not be parsed (${reason}).` } };
  }
}

function skip(code: string, message: string): { ok: false; warning: PageWarning } {
  return { ok: false, warning: { code, message } };
}
