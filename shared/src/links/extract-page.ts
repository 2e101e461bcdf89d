/**
 * Extraction of a page's facts (title, headings, anchors, links, front matter) from its CommonMark tree
 * (remark/micromark), following docs/link-rules.md "What counts". Links are read from parser nodes only.
 */
import type { Definition, Nodes, Root } from 'mdast';
import { blankTaggedFence, readFrontMatter } from './front-matter.js';
import { readHeading } from './heading.js';
import { readHtml } from './html-attributes.js';
import { LinkCollector } from './link-collector.js';
import { lineIndex, parseMarkdown, plainText, walk } from './markdown-tree.js';
import { applyParseBudgets, normaliseLineEndings } from './normalise-input.js';
import { countWords, titleFrom } from './page-text.js';
import type { Heading, PageFacts, PageWarning, RawLink } from './types.js';
import { fileExtension, scanBlockIds, scanWikiLinks } from './wiki-syntax.js';
import GithubSlugger from 'github-slugger';

export const MAX_TEXT_LENGTH = 200_000;
export const DEFAULT_PAGE_EXTENSIONS = ['.md', '.mdx', '.markdown'];

export interface ExtractOptions {
  wikiLinks?: boolean;
  /** Extensions that make a wiki target a page rather than an asset. */
  pageExtensions?: string[];
}

interface Pending {
  link: RawLink;
  identifier: string;
}

interface PageState {
  source: string;
  at: (offset: number) => { line: number; column: number };
  options: Required<ExtractOptions>;
  links: LinkCollector;
  references: Pending[];
  definitions: Map<string, Definition>;
  headings: Heading[];
  anchors: string[];
  blockIds: string[];
  textParts: string[];
  slugger: GithubSlugger;
}

function start(node: Nodes): { line: number; column: number; offset: number } {
  const p = node.position?.start;
  return { line: p?.line ?? 1, column: p?.column ?? 1, offset: p?.offset ?? 0 };
}

/** `<https://x>` and GFM bare URLs are autolinks; `[t](x)` starts with a bracket. */
function linkKind(state: PageState, node: Nodes): RawLink['kind'] {
  return state.source[start(node).offset] === '[' ? 'inline' : 'autolink';
}

function addHtml(state: PageState, node: Nodes & { value: string }): void {
  const at = start(node);
  const facts = readHtml(node.value);
  state.anchors.push(...facts.anchors);
  for (const f of facts.links) {
    const line = at.line + f.line - 1;
    const column = f.line === 1 ? at.column + f.column - 1 : f.column;
    state.links.add({ kind: 'html', href: f.href, line, column, text: f.text, asset: f.tag === 'img' });
  }
}

function addText(state: PageState, node: Nodes & { value: string }): void {
  state.textParts.push(node.value);
  const at = start(node);
  const end = node.position?.end.offset ?? at.offset + node.value.length;
  const source = state.source.slice(at.offset, end);
  state.blockIds.push(...scanBlockIds(source));
  if (!state.options.wikiLinks) return;
  for (const w of scanWikiLinks(source)) {
    const pos = state.at(at.offset + w.offset);
    const ext = fileExtension(w.target.split('#')[0]!);
    const asset = ext !== null && !state.options.pageExtensions.includes(ext);
    const kind = w.embed ? 'wiki-embed' : 'wiki';
    state.links.add({ kind, href: w.target, line: pos.line, column: pos.column, text: w.label ?? w.target, asset });
  }
}

function visitNode(state: PageState, node: Nodes): boolean | void {
  const at = start(node);
  switch (node.type) {
    case 'yaml':
    case 'code':
    case 'definition':
      if (node.type === 'definition' && !state.definitions.has(node.identifier)) state.definitions.set(node.identifier, node);
      return false;
    case 'heading':
      readHeading(state, node, at.line);
      return;
    case 'link':
      state.links.add({
        kind: linkKind(state, node),
        href: node.url,
        line: at.line,
        column: at.column,
        text: plainText(node),
        asset: false,
      });
      return;
    case 'image':
      state.links.add({ kind: 'image', href: node.url, line: at.line, column: at.column, text: node.alt ?? '', asset: true });
      return;
    case 'linkReference':
    case 'imageReference': {
      const image = node.type === 'imageReference';
      const text = image ? (node.alt ?? '') : plainText(node);
      const link: RawLink = { kind: image ? 'image' : 'reference', href: '', line: at.line, column: at.column, text, asset: image };
      state.references.push({ link, identifier: node.identifier });
      state.links.add(link);
      return;
    }
    case 'html':
      addHtml(state, node);
      return false;
    case 'text':
      addText(state, node);
      return;
    case 'inlineCode':
      state.textParts.push(node.value);
      return;
    default:
      if ((node.type as string) === 'toml') return false;
  }
}

export function extractPage(path: string, markdown: string, options: ExtractOptions = {}): PageFacts {
  const warnings: PageWarning[] = [];
  const normalised = normaliseLineEndings(markdown);
  const prepared = applyParseBudgets(blankTaggedFence(normalised, warnings), warnings);
  const source = prepared.text;
  const tree: Root = parseMarkdown(source, prepared.emphasisOff, warnings);
  const frontMatter = readFrontMatter(tree, warnings);
  const state: PageState = {
    source,
    at: lineIndex(source),
    options: { wikiLinks: options.wikiLinks ?? true, pageExtensions: options.pageExtensions ?? DEFAULT_PAGE_EXTENSIONS },
    links: new LinkCollector(),
    references: [],
    definitions: new Map(),
    headings: [],
    anchors: [],
    blockIds: [],
    textParts: [],
    slugger: new GithubSlugger(),
  };
  walk(tree, (node) => {
    const result = visitNode(state, node);
    if (node.type === 'paragraph' || node.type === 'heading' || node.type === 'tableCell') state.textParts.push('\n');
    return result;
  });
  for (const ref of state.references) ref.link.href = state.definitions.get(ref.identifier)?.url ?? '';
  const text = state.textParts.join('');
  return {
    path,
    title: titleFrom(path, frontMatter.title, state.headings),
    headings: state.headings,
    anchors: [...new Set(state.anchors)],
    blockIds: [...new Set(state.blockIds)],
    wordCount: countWords(text),
    text: text.slice(0, MAX_TEXT_LENGTH),
    frontMatter,
    warnings: [...warnings, ...state.links.warnings()],
    links: state.links.links,
  };
}
