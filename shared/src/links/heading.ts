/**
 * Heading anchors the way GitHub makes them (github-slugger: one slugger per page, so repeats get -1, -2),
 * plus explicit `{#id}` attributes, which are removed from the text before slugging.
 */
import type { Heading as MdHeading } from 'mdast';
import type GithubSlugger from 'github-slugger';
import { plainText } from './markdown-tree.js';
import type { Heading } from './types.js';

interface HeadingSink {
  headings: Heading[];
  anchors: string[];
  slugger: GithubSlugger;
}

/** `Install {#setup}` -> text `Install`, id `setup`. */
export function splitExplicitId(text: string): { text: string; id: string | null } {
  const trimmed = text.trimEnd();
  if (!trimmed.endsWith('}')) return { text, id: null };
  const open = trimmed.lastIndexOf('{#');
  if (open < 0) return { text, id: null };
  const id = trimmed.slice(open + 2, -1);
  if (id === '' || id.includes(' ') || id.includes('}')) return { text, id: null };
  return { text: trimmed.slice(0, open).trimEnd(), id };
}

export function readHeading(sink: HeadingSink, node: MdHeading, line: number): void {
  const { text, id } = splitExplicitId(plainText(node));
  const slug = sink.slugger.slug(text);
  sink.headings.push({ depth: node.depth, text, slug, line });
  sink.anchors.push(slug);
  if (id) sink.anchors.push(id);
}
