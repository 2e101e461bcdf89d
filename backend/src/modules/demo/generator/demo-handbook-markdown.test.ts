/**
 * Checks the generated handbook with an outside CommonMark + GFM parser (remark, the parser docs/link-rules.md names)
 * instead of trusting the generator's own bookkeeping: every link the generator recorded is found by the
 * parser on the same line with the same href, and the parser finds no other links (so the link-like text in
 * code blocks, code spans and the unused reference definition really is not a link). Heading anchors are
 * checked with `github-slugger` itself.
 */
import GithubSlugger from 'github-slugger';
import type { Heading, Root } from 'mdast';
import { toString } from 'mdast-util-to-string';
import { parseFragment } from 'parse5';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import { unified } from 'unified';
import { visit } from 'unist-util-visit';
import { describe, expect, it } from 'vitest';
import { generateDemoHandbook, renderHandbook } from './generate-demo-handbook.js';

const parser = unified().use(remarkParse).use(remarkFrontmatter, ['yaml']).use(remarkGfm);
const WIKI = /!?\[\[([^\]|]+)(?:\|[^\]]*)?\]\]/g;

interface Probe {
  links: string[];
  headings: Array<{ text: string; depth: number }>;
}

function htmlHrefs(html: string): string[] {
  const hrefs: string[] = [];
  const walk = (node: any): void => {
    if (node.tagName === 'a') hrefs.push(...node.attrs.filter((a: any) => a.name === 'href').map((a: any) => a.value));
    for (const child of node.childNodes ?? []) walk(child);
  };
  walk(parseFragment(html));
  return hrefs;
}

/** Links as `line|href`, in the parser's view of the page. */
function probe(markdown: string): Probe {
  const tree = parser.parse(markdown) as Root;
  const definitions = new Map<string, string>();
  visit(tree, 'definition', (d) => void definitions.set(d.identifier, d.url));
  const links: string[] = [];
  const headings: Probe['headings'] = [];
  visit(tree, (node: any) => {
    const line = node.position?.start.line as number;
    if (node.type === 'link' || node.type === 'image') links.push(`${line}|${node.url}`);
    if (node.type === 'linkReference' || node.type === 'imageReference') links.push(`${line}|${definitions.get(node.identifier)}`);
    if (node.type === 'html') for (const h of htmlHrefs(node.value)) links.push(`${line}|${h}`);
    if (node.type === 'text') {
      const value = node.value as string;
      for (const m of value.matchAll(WIKI)) links.push(`${line + value.slice(0, m.index).split('\n').length - 1}|${m[1]}`);
    }
    if (node.type === 'heading') headings.push({ text: toString(node as Heading), depth: node.depth });
  });
  return { links: links.sort(), headings };
}

/** Anchors a page offers: github-slugger slugs of its headings, `{#id}` attributes, raw HTML ids. */
function anchorsOf(markdown: string, probeResult: Probe): Set<string> {
  const slugger = new GithubSlugger();
  const anchors = new Set<string>();
  for (const { text } of probeResult.headings) {
    const custom = /\{#([\w-]+)\}\s*$/.exec(text);
    if (custom) anchors.add(custom[1]!);
    else anchors.add(slugger.slug(text));
  }
  for (const m of markdown.matchAll(/<div id="([\w-]+)"><\/div>/g)) anchors.add(m[1]!);
  return anchors;
}

describe.each([1, 2, 3] as const)('demo handbook version %i, read by remark', (version) => {
  const { files, links, pages } = renderHandbook(version);
  const probes = new Map(pages.map((p) => [p.path, probe(files[p.path] as string)]));

  it('finds exactly the links the generator recorded, on the recorded lines', () => {
    for (const page of pages) {
      const mine = links
        .filter((l) => l.source === page.path)
        .map((l) => `${l.line}|${l.href}`)
        .sort();
      expect(probes.get(page.path)!.links, page.path).toEqual(mine);
    }
  });

  it('finds every way of writing a link that docs/link-rules.md lists', () => {
    const all = [...probes.values()].flatMap((p) => p.links.map((l) => l.slice(l.indexOf('|') + 1)));
    const has = (pred: (h: string) => boolean) => all.some(pred);
    expect(has((h) => h.startsWith('../') && h.endsWith('.md'))).toBe(true);
    expect(has((h) => /^[\w-]+\.md$/.test(h))).toBe(true);
    expect(has((h) => h.startsWith('/handbook/') && !h.endsWith('.md'))).toBe(true);
    expect(has((h) => h.startsWith('https://brackenridge-tools.example/handbook/'))).toBe(true);
    expect(has((h) => h.startsWith('mailto:'))).toBe(true);
    expect(has((h) => /^https:\/\/(?!brackenridge-tools)/.test(h))).toBe(true);
    expect(has((h) => /\.md#[\w-]+$/.test(h))).toBe(true);
    const forms = new Set(links.map((l) => l.form));
    for (const f of [
      'relative',
      'root-absolute',
      'site-url',
      'site-autolink',
      'wiki',
      'wiki-label',
      'wiki-heading',
      'wiki-title',
      'embed',
      'reference-full',
      'reference-collapsed',
      'reference-shortcut',
      'html',
      'image',
      'wiki-image',
      'autolink',
      'bare-url',
      'inline-raw',
      'empty',
    ] as const)
      expect(forms, f).toContain(f);
  });

  it('has duplicate headings and {#custom-id} headings; the generator agrees with github-slugger', () => {
    const texts = [...probes.values()].flatMap((p) => p.headings.map((h) => h.text));
    expect(texts.filter((t) => t === 'Decisions').length).toBeGreaterThan(10);
    expect(texts.some((t) => /\{#[\w-]+\}$/.test(t))).toBe(true);
    for (const l of links.filter((x) => x.fragment && !x.form.startsWith('wiki') && x.target?.endsWith('.md'))) {
      const anchors = anchorsOf(files[l.target!] as string, probes.get(l.target!)!);
      // Valid fragments must be real anchors and seeded bad ones must not (docs/link-rules.md rule 7).
      expect(anchors.has(l.fragment!), `${l.source} -> ${l.href}`).toBe(l.status !== 'broken-anchor');
    }
    for (const l of links.filter((x) => x.form === 'wiki-heading')) {
      const texts2 = probes.get(l.target!)!.headings.map((h) => h.text.toLowerCase());
      expect(texts2.includes(l.fragment!.toLowerCase()), l.href).toBe(l.status !== 'broken-anchor');
    }
  });

  it('states each seeded finding at a line of its source file that holds the raw href', () => {
    const { expected } = generateDemoHandbook(version);
    const findings = [
      ...expected.brokenLinks,
      ...expected.brokenAnchors,
      ...expected.brokenAssets,
      ...expected.unsafe,
      ...expected.ambiguous,
      ...expected.redirected,
      ...expected.outOfScope,
    ];
    expect(findings.length).toBeGreaterThan(8);
    for (const f of findings) {
      const line = (files[f.sourcePath] as string).split('\n')[f.line - 1]!;
      expect(line, `${f.sourcePath}:${f.line}`).toContain(f.href);
      // The parser, not the generator, confirms a link with that href starts on that line.
      expect(probes.get(f.sourcePath)!.links, `${f.sourcePath}:${f.line}`).toContain(`${f.line}|${f.href}`);
    }
  });
});
