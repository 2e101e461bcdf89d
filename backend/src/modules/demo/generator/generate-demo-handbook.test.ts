import { describe, expect, it } from 'vitest';
import { generateDemoHandbook, renderHandbook } from './generate-demo-handbook.js';
import { buildGraph, expectedFindings } from './expected-findings.js';
import { EDITOR, WRITER } from './scenario.js';

const VERSIONS = [1, 2, 3] as const;
const cache = new Map<number, ReturnType<typeof generateDemoHandbook>>();
const demo = (v: 1 | 2 | 3) => cache.get(v) ?? cache.set(v, generateDemoHandbook(v)).get(v)!;
const pagesOf = (files: Record<string, unknown>) => Object.keys(files).filter((p) => p.endsWith('.md'));
const text = (v: unknown) => (typeof v === 'string' ? v : '');

describe('generateDemoHandbook', () => {
  it.each(VERSIONS)('is deterministic: version %i twice gives identical files and findings', (v) => {
    expect(generateDemoHandbook(v)).toEqual(demo(v));
  });

  it.each(VERSIONS)('version %i has about 300 pages in nested folders plus assets', (v) => {
    const { files } = demo(v);
    const pages = pagesOf(files);
    expect(pages.length).toBeGreaterThanOrEqual(285);
    expect(pages.length).toBeLessThanOrEqual(315);
    for (const top of ['onboarding/', 'teams/', 'policies/', 'how-to/', 'reference/', 'runbooks/', 'archive/'])
      expect(pages.some((p) => p.startsWith(top))).toBe(true);
    expect(pages.some((p) => p.split('/').length >= 4)).toBe(true);
    expect(files['assets/depot-map.png']).toBeInstanceOf(Uint8Array);
    // PNG signature: W3C, "Portable Network Graphics (PNG) Specification", 2nd ed., section 5.2.
    expect([...(files['assets/depot-map.png'] as Uint8Array).slice(0, 8)]).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
  });

  it('returns the settings under which the findings hold', () => {
    const { settings } = demo(1);
    expect(settings).toMatchObject({ entryPages: ['index.md'], basePath: '/handbook', depthThreshold: 3 });
    expect(settings.siteBaseUrls).toEqual(['https://brackenridge-tools.example']);
  });

  it.each(VERSIONS)('version %i seeds exactly one of each single problem and a handful of broken links', (v) => {
    const { expected } = demo(v);
    for (const key of ['ambiguous', 'unsafe', 'brokenAssets', 'redirected', 'outOfScope'] as const)
      expect(expected[key], key).toHaveLength(1);
    expect(expected.unsafe[0]!.href.startsWith('javascript:')).toBe(true);
    expect(expected.brokenLinks.length).toBeGreaterThanOrEqual(4);
    expect(expected.brokenLinks.length).toBeLessThanOrEqual(8);
    expect(expected.brokenAnchors.length).toBeGreaterThanOrEqual(2);
    expect(expected.orphans.length).toBeGreaterThanOrEqual(3);
    expect(expected.deadEnds.length).toBeGreaterThanOrEqual(4);
    expect(expected.deepPages.length).toBeGreaterThanOrEqual(2);
    expect(expected.islands).toHaveLength(1);
    expect(expected.islands[0]!.length).toBeGreaterThanOrEqual(3);
  });

  it.each(VERSIONS)('version %i: unreachable = orphans + islands here, and every page in a finding exists', (v) => {
    const { files, expected } = demo(v);
    expect(expected.unreachable).toEqual([...expected.orphans, ...expected.islands.flat()].sort());
    for (const p of [...expected.orphans, ...expected.deadEnds, ...expected.deepPages, ...expected.unreachable])
      expect(files[p], p).toBeDefined();
    // The entry page is never an orphan (docs/metrics.md: entry pages are exempt).
    expect(expected.orphans).not.toContain('index.md');
  });

  it.each(VERSIONS)('version %i: the findings do not hinge on how redirected or bad-anchor links are counted', (v) => {
    const { pages, links } = renderHandbook(v);
    const paths = pages.map((p) => p.path);
    const strict = expectedFindings(pages, links, ['index.md']);
    const loose = expectedFindings(pages, links, ['index.md'], 3, buildGraph(paths, links, ['redirected', 'broken-anchor']));
    expect(loose).toEqual(strict);
  });

  it('stale thin orphans are pruning candidates: few words, reviewed years ago', () => {
    const { files, expected } = demo(1);
    const thin = expected.orphans.filter((p) => p.startsWith('archive/'));
    expect(thin.length).toBeGreaterThanOrEqual(2);
    for (const p of thin) {
      const body = text(files[p]).split('---')[2]!;
      expect(body.split(/\s+/).filter(Boolean).length).toBeLessThan(80);
      expect(Number(/reviewed: (\d{4})/.exec(text(files[p]))![1])).toBeLessThanOrEqual(2020);
    }
  });

  it('front matter carries demo owners, aliases, tags and exactly one redirect_from', () => {
    const { files } = demo(1);
    const all = pagesOf(files).map((p) => text(files[p]));
    expect(all.some((t) => t.includes(`owner: ${EDITOR}`))).toBe(true);
    expect(all.some((t) => t.includes(`owner: ${WRITER}`))).toBe(true);
    expect(all.filter((t) => t.includes('redirect_from:'))).toHaveLength(1);
    expect(all.some((t) => /^aliases: /m.test(t))).toBe(true);
    expect(all.every((t) => /^tags: \[/m.test(t) && /^reviewed: \d{4}-\d{2}-\d{2}$/m.test(t))).toBe(true);
  });

  it('later versions change pages and findings, so trends and diffs have something to show', () => {
    const [v1, v2, v3] = VERSIONS.map((v) => demo(v));
    const p1 = new Set(pagesOf(v1!.files));
    const p2 = new Set(pagesOf(v2!.files));
    expect([...p2].filter((p) => !p1.has(p))).toContain('how-to/catalogue/print-shelf-labels.md');
    expect([...p1].filter((p) => !p2.has(p))).toContain('how-to/catalogue/print-labels.md');
    const hrefs = (d: typeof v1) => d!.expected.brokenLinks.map((b) => `${b.sourcePath} ${b.href}`);
    expect(hrefs(v2).filter((h) => !hrefs(v1).includes(h)).length).toBeGreaterThan(0);
    expect(hrefs(v1).filter((h) => !hrefs(v2).includes(h)).length).toBeGreaterThan(0);
    expect(v3!.expected.islands).not.toEqual(v1!.expected.islands);
    expect(v3!.expected.deadEnds).not.toEqual(v2!.expected.deadEnds);
  });
});
