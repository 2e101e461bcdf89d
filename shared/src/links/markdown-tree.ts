/**
 * One CommonMark + GFM + front-matter processor per process (building it is the costly part), and tree
 * helpers that use an explicit stack: unist-util-visit and mdast-util-to-string recurse, and overflow the
 * call stack on deeply nested input (measured: 10,000 nested emphasis).
 */
import type { Nodes, Root } from 'mdast';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import { unified, type Processor } from 'unified';
import type { PageWarning } from './types.js';

/** Turns off emphasis and strikethrough, whose delimiter matching is super-linear (see normalise-input.ts). */
function withoutEmphasis(this: Processor): void {
  const data = this.data();
  (data.micromarkExtensions ??= []).push({ disable: { null: ['attention', 'strikethrough'] } });
}

const gfmProcessor = unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter, ['yaml', 'toml']);
const gfmNoEmphasis = unified().use(remarkParse).use(remarkGfm).use(remarkFrontmatter, ['yaml', 'toml']).use(withoutEmphasis);
const plainProcessor = unified().use(remarkParse).use(remarkFrontmatter, ['yaml', 'toml']).use(withoutEmphasis);

/** GFM's bare-URL pass walks the tree recursively; on overflow the page is parsed again without GFM. */
export function parseMarkdown(text: string, emphasisOff: boolean, warnings: PageWarning[]): Root {
  try {
    const processor = emphasisOff ? gfmNoEmphasis : gfmProcessor;
    return processor.runSync(processor.parse(text)) as Root;
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
  }
  warnings.push({ code: 'PARSE_DEPTH', message: 'The page is nested too deeply for GFM extensions; bare URLs and tables were not read.' });
  try {
    return plainProcessor.runSync(plainProcessor.parse(text)) as Root;
  } catch (e) {
    if (!(e instanceof RangeError)) throw e;
    warnings.push({ code: 'PARSE_DEPTH', message: 'The page is nested too deeply to be read; no links were taken from it.' });
    return { type: 'root', children: [] };
  }
}

/** Pre-order, document order, no recursion. `enter` returns false to skip a node's children. */
export function walk(root: Nodes, enter: (node: Nodes) => boolean | void): void {
  const stack: Nodes[] = [root];
  while (stack.length > 0) {
    const node = stack.pop()!;
    if (enter(node) === false || !('children' in node)) continue;
    const children = node.children as Nodes[];
    for (let i = children.length - 1; i >= 0; i--) stack.push(children[i]!);
  }
}

/** Plain text of a subtree, like mdast-util-to-string (alt text of images included). */
export function plainText(root: Nodes): string {
  let text = '';
  walk(root, (node) => {
    if (node.type === 'text' || node.type === 'inlineCode') text += node.value;
    else if (node.type === 'image') text += node.alt ?? '';
  });
  return text;
}

/** 1-based line and column of an offset, for findings inside a node's source. */
export function lineIndex(text: string): (offset: number) => { line: number; column: number } {
  const starts = [0];
  for (let i = 0; i < text.length; i++) if (text.charCodeAt(i) === 10) starts.push(i + 1);
  return (offset) => {
    let lo = 0;
    let hi = starts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if (starts[mid]! <= offset) lo = mid;
      else hi = mid - 1;
    }
    return { line: lo + 1, column: offset - starts[lo]! + 1 };
  };
}
