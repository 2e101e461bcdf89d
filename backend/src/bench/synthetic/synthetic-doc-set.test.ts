/**
 * Small-size checks of the benchmark doc set. Link counts are taken by an outside CommonMark + GFM parser
 * (remark, as docs/link-rules.md prescribes) rather than by the generator's own tally, and the zip is read back with
 * yauzl, an independent zip reader.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Root } from 'mdast';
import remarkFrontmatter from 'remark-frontmatter';
import remarkGfm from 'remark-gfm';
import remarkParse from 'remark-parse';
import { unified } from 'unified';
import { visit } from 'unist-util-visit';
import yauzl from 'yauzl';
import { describe, expect, it } from 'vitest';
import { generateSyntheticDocSet, isChangedPage } from './synthetic-doc-set.js';
import { writeSyntheticZip } from './write-synthetic-zip.js';

const parser = unified().use(remarkParse).use(remarkFrontmatter, ['yaml']).use(remarkGfm);
const SMALL = { seed: 42, pages: 200, targetBytes: 200 * 5_400, linksPerPage: 30 };
const collect = (o: Parameters<typeof generateSyntheticDocSet>[0]) => [...generateSyntheticDocSet(o)];
const pagesOnly = (files: ReturnType<typeof collect>) => files.filter((f) => f.path.endsWith('.md'));

/** Links remark sees (inline, reference, autolink, bare URL, image), plus <a href> in HTML and [[wiki]] text. */
function parsedLinks(markdown: string): string[] {
  const hrefs: string[] = [];
  visit(parser.parse(markdown) as Root, (node: any) => {
    if (node.type === 'link' || node.type === 'image' || node.type === 'linkReference') hrefs.push(node.url ?? node.identifier);
    if (node.type === 'html' && /^<a\s/i.test(node.value)) hrefs.push(node.value);
    if (node.type === 'text') for (const m of (node.value as string).matchAll(/\[\[([^\]|]+)/g)) hrefs.push(m[1]!);
  });
  return hrefs;
}

describe('generateSyntheticDocSet (200 pages)', () => {
  const files = collect(SMALL);
  const pages = pagesOnly(files);

  it('is deterministic, and another seed gives another set', () => {
    expect(collect(SMALL)).toEqual(files);
    expect(pagesOnly(collect({ ...SMALL, seed: 43 }))[5]!.content).not.toBe(pages[5]!.content);
  });

  it('has the asked number of pages in nested folders, with unique paths', () => {
    expect(pages).toHaveLength(200);
    expect(new Set(files.map((f) => f.path)).size).toBe(files.length);
    expect(pages.some((p) => p.path.split('/').length === 4)).toBe(true);
  });

  it('writes about linksPerPage links per page, as a CommonMark parser counts them', () => {
    const counts = pages.map((p) => parsedLinks(p.content).length);
    const mean = counts.reduce((a, b) => a + b, 0) / counts.length;
    expect(mean).toBeGreaterThan(27);
    expect(mean).toBeLessThan(33);
    // The generator's tally agrees with the parser on every page (no link hides in code blocks).
    pages.forEach((p, k) => expect(counts[k], p.path).toBe(p.linkCount));
  });

  it('uses every kind of link', () => {
    const all = pages.map((p) => p.content).join('\n');
    for (const pattern of [
      /\]\(\.\.\/[^)]+\.md\)/,
      /\]\(\/docs\//,
      /\[\[[\w-]+\]\]/,
      /\[\[[\w-]+\|/,
      /\]\[ref-\d+\]/,
      /<a href="/,
      /!\[Diagram \d+\]/,
      /\.md#[\w-]+\)/,
      /<https:\/\//,
      /\]\(https:\/\//,
      /missing-\d+\.md/,
      /\]\(#[\w-]+\)/,
    ])
      expect(all, String(pattern)).toMatch(pattern);
  });

  it('scales bytes with targetBytes', () => {
    const bytes = (fs: ReturnType<typeof collect>) => pagesOnly(fs).reduce((a, f) => a + Buffer.byteLength(f.content), 0);
    const base = bytes(files);
    expect(base / SMALL.targetBytes).toBeGreaterThan(0.9);
    expect(base / SMALL.targetBytes).toBeLessThan(1.1);
    const doubled = bytes(collect({ ...SMALL, targetBytes: SMALL.targetBytes * 2 }));
    expect(doubled / base).toBeGreaterThan(1.8);
    expect(doubled / base).toBeLessThan(2.2);
  });

  it('has a power-law-like in-degree: a few pages draw many links, most draw few', () => {
    const inDegree = new Map<string, number>();
    for (const p of pages)
      for (const m of p.content.matchAll(/\[\[([\w-]+)(?:\|[^\]]*)?\]\]/g)) inDegree.set(m[1]!, (inDegree.get(m[1]!) ?? 0) + 1);
    const sorted = [...inDegree.values()].sort((a, b) => b - a);
    // Heavy tail (Broder et al., WWW 2000, section 2; common practice for synthetic web graphs):
    // the top page gets many times the median.
    expect(sorted[0]!).toBeGreaterThan(8 * sorted[Math.floor(sorted.length / 2)]!);
  });

  it('changes exactly the requested share of pages, same paths, other content', () => {
    const changed = pagesOnly(collect({ ...SMALL, pages: 1000, changedFraction: 0.01, changeSeed: 7 }));
    const base = pagesOnly(collect({ ...SMALL, pages: 1000 }));
    const differing = changed.filter((p, k) => p.content !== base[k]!.content);
    expect(changed.map((p) => p.path)).toEqual(base.map((p) => p.path));
    expect(differing).toHaveLength(10);
    expect(Array.from({ length: 1000 }, (_, i) => isChangedPage(i, 1000, 0.01, 7)).filter(Boolean)).toHaveLength(10);
  });
});

describe('writeSyntheticZip', () => {
  it('streams a zip that an independent reader opens with every file intact', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'synthetic-zip-'));
    try {
      const summary = await writeSyntheticZip({ ...SMALL, pages: 50, targetBytes: 50 * 5_400 }, join(dir, 'set.zip'));
      expect(summary.pages).toBe(50);
      const names = await new Promise<string[]>((resolve, reject) => {
        yauzl.open(join(dir, 'set.zip'), { lazyEntries: false }, (err, zip) => {
          if (err || !zip) return reject(err);
          const seen: string[] = [];
          zip.on('entry', (e: yauzl.Entry) => seen.push(e.fileName));
          zip.on('end', () => resolve(seen));
        });
      });
      expect(names).toEqual(collect({ ...SMALL, pages: 50, targetBytes: 50 * 5_400 }).map((f) => f.path));
      expect(summary.zipBytes).toBeLessThan(summary.uncompressedBytes);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
