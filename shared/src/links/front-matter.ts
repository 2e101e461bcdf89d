/** Finds the front matter of a page, reads it as data and turns failures into page warnings. */
import type { Root } from 'mdast';
import { emptyFrontMatter, frontMatterFields } from './front-matter-fields.js';
import { parseFrontMatter } from './front-matter-parse.js';
import type { FrontMatter, PageWarning } from './types.js';

/**
 * `---js`, `---javascript` or any `---<tag>` opening: some loaders evaluate such blocks as code. We never
 * do; the block is blanked (line count kept, so positions stay exact) and reported.
 */
export function blankTaggedFence(text: string, warnings: PageWarning[]): string {
  const firstEnd = text.indexOf('\n');
  const first = (firstEnd < 0 ? text : text.slice(0, firstEnd)).trimEnd();
  if (!first.startsWith('---') || first.slice(3).replaceAll('-', '').trim() === '') return text;
  const lines = text.split('\n');
  const close = lines.findIndex((line, i) => i > 0 && line.trimEnd() === '---');
  if (close < 0) return text;
  warnings.push({
    code: 'FRONT_MATTER_INVALID',
    line: 1,
    message: `Front matter tagged "${first.slice(3).trim()}" is not supported; it was ignored and never run.`,
  });
  for (let i = 0; i <= close; i++) lines[i] = '';
  return lines.join('\n');
}

export function readFrontMatter(tree: Root, warnings: PageWarning[]): FrontMatter {
  const node = tree.children[0];
  if (!node || (node.type !== 'yaml' && node.type !== ('toml' as string))) return emptyFrontMatter();
  const kind = node.type === 'yaml' ? 'yaml' : 'toml';
  const fenceLine = node.position?.start.line ?? 1;
  const result = parseFrontMatter(kind, (node as { value: string }).value);
  if (result.ok) return frontMatterFields(result.data, warnings);
  const line = result.lineInBody === undefined ? fenceLine : fenceLine + result.lineInBody;
  warnings.push({ code: 'FRONT_MATTER_INVALID', line, message: `Front matter ignored: ${result.message}.` });
  return emptyFrontMatter();
}
