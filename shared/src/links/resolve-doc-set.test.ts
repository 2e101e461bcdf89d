import { describe, expect, test } from 'vitest';
import { linkFixtures } from './fixtures/index.js';
import { resolveDocSet } from './resolve-doc-set.js';

// Hand-drawn cases with known answers: each fixture's expected pages, edges and problems were written by
// hand from docs/link-rules.md "How links resolve", not produced by running this code.
describe.each(linkFixtures)('fixture doc set: $name', (fixture) => {
  const result = resolveDocSet(fixture.files, fixture.settings);

  test('pages', () => {
    expect(result.pages.map((p) => p.path).sort()).toEqual(fixture.expected.pages);
  });

  test('edges', () => {
    const edges = new Set<string>();
    for (const l of result.links) {
      const isPage = l.targetPath !== null && !l.targetIsAsset;
      if (isPage && (l.status === 'ok' || l.status === 'redirected') && l.targetPath !== l.sourcePath)
        edges.add(`${l.sourcePath} -> ${l.targetPath}`);
    }
    expect([...edges].sort()).toEqual(fixture.expected.edges.map(([a, b]) => `${a} -> ${b}`).sort());
  });

  test('broken, broken-anchor and ambiguous links, each with a reason', () => {
    const problems = result.links.filter((l) => l.status === 'broken' || l.status === 'broken-anchor' || l.status === 'ambiguous');
    const seen = problems.map((l) => ({ source: l.sourcePath, href: l.href, status: l.status }));
    const key = (p: { source: string; href: string }) => p.source + ' ' + p.href;
    expect(seen.sort((a, b) => key(a).localeCompare(key(b)))).toEqual(
      [...fixture.expected.problems].sort((a, b) => key(a).localeCompare(key(b))),
    );
    for (const p of problems) expect(p.reason).toMatch(/\S/);
  });
});
