/**
 * Links and anchors inside raw HTML, read with parse5 (a WHATWG-conformant HTML tokenizer/tree builder),
 * so quoting, entities and attribute order are handled the way browsers handle them.
 */
import { parseFragment } from 'parse5';

export interface HtmlFinding {
  tag: 'a' | 'img';
  href: string;
  text: string;
  /** 1-based, relative to the HTML snippet. */
  line: number;
  column: number;
}

export interface HtmlFacts {
  links: HtmlFinding[];
  anchors: string[];
}

interface Parse5Node {
  nodeName: string;
  value?: string;
  attrs?: { name: string; value: string }[];
  childNodes?: Parse5Node[];
  content?: Parse5Node;
  sourceCodeLocation?: { startLine: number; startCol: number } | null;
}

function textOf(node: Parse5Node): string {
  let text = '';
  const stack: Parse5Node[] = [node];
  while (stack.length > 0) {
    const current = stack.pop()!;
    if (current.nodeName === '#text') text += current.value ?? '';
    if (current.childNodes) for (let i = current.childNodes.length - 1; i >= 0; i--) stack.push(current.childNodes[i]!);
  }
  return text.trim();
}

function attribute(node: Parse5Node, name: string): string | undefined {
  return node.attrs?.find((a) => a.name === name)?.value;
}

export function readHtml(html: string): HtmlFacts {
  const facts: HtmlFacts = { links: [], anchors: [] };
  const root = parseFragment(html, { sourceCodeLocationInfo: true }) as unknown as Parse5Node;
  const stack: Parse5Node[] = [root];
  while (stack.length > 0) {
    const node = stack.pop()!;
    const id = attribute(node, 'id');
    const name = node.nodeName === 'a' ? attribute(node, 'name') : undefined;
    if (id) facts.anchors.push(id);
    if (name) facts.anchors.push(name);
    const href = node.nodeName === 'a' ? attribute(node, 'href') : node.nodeName === 'img' ? attribute(node, 'src') : undefined;
    if (href !== undefined) {
      const at = node.sourceCodeLocation ?? { startLine: 1, startCol: 1 };
      const tag = node.nodeName === 'a' ? 'a' : 'img';
      facts.links.push({
        tag,
        href,
        text: tag === 'a' ? textOf(node) : (attribute(node, 'alt') ?? ''),
        line: at.startLine,
        column: at.startCol,
      });
    }
    const children = [...(node.childNodes ?? []), ...(node.content ? [node.content] : [])];
    for (let i = children.length - 1; i >= 0; i--) stack.push(children[i]!);
  }
  return facts;
}
