import GithubSlugger from 'github-slugger';
import { describe, expect, test } from 'vitest';
import { extractPage } from './extract-page.js';

describe('extractPage', () => {
  const markdown = [
    '# Feeding schedule {#schedule}',
    '',
    'Morning [feed](feed.md "Feed") and [[Water Plan|water]] then ![[pump.jpg]] and [[Pump#^valve]].',
    'Code is skipped: `[no](code.md)` and `[[No Wiki]]`.',
    '',
    '```md',
    '[no](block.md) [[Block Wiki]]',
    '```',
    '',
    '<div id="raw-anchor"><a name="old-anchor" href="legacy.html">legacy</a> <img src="cow.png" alt="cow"></div>',
    '',
    '## Feeding schedule',
    '## Feeding schedule',
    '',
    'Close the valve. ^valve',
  ].join('\n');
  const facts = extractPage('farm/feeding.md', markdown);

  test('links in document order with kinds, positions and asset flags', () => {
    expect(facts.links.map((l) => [l.kind, l.href, l.line, l.column, l.text, l.asset])).toEqual([
      ['inline', 'feed.md', 3, 9, 'feed', false],
      ['wiki', 'Water Plan', 3, 36, 'water', false],
      ['wiki-embed', 'pump.jpg', 3, 62, 'pump.jpg', true],
      ['wiki', 'Pump#^valve', 3, 80, 'Pump#^valve', false],
      ['html', 'legacy.html', 10, 22, 'legacy', false],
      ['html', 'cow.png', 10, 73, 'cow', true],
    ]);
  });

  test('heading slugs match github-slugger itself, explicit ids and raw HTML anchors are anchors', () => {
    // Reference: the github-slugger package (one instance per page, so repeats get -1, -2).
    const slugger = new GithubSlugger();
    const reference = ['Feeding schedule', 'Feeding schedule', 'Feeding schedule'].map((t) => slugger.slug(t));
    expect(facts.headings.map((h) => h.slug)).toEqual(reference);
    expect(facts.headings.map((h) => [h.depth, h.text, h.line])).toEqual([
      [1, 'Feeding schedule', 1],
      [2, 'Feeding schedule', 12],
      [2, 'Feeding schedule', 13],
    ]);
    expect([...facts.anchors].sort()).toEqual(
      ['feeding-schedule', 'feeding-schedule-1', 'feeding-schedule-2', 'old-anchor', 'raw-anchor', 'schedule'].sort(),
    );
  });

  test('block ids, title and text', () => {
    expect(facts.blockIds).toEqual(['valve']);
    expect(facts.title).toBe('Feeding schedule');
    expect(facts.text).toContain('Close the valve.');
    expect(facts.text).not.toContain('block.md');
    expect(facts.wordCount).toBeGreaterThan(10);
  });

  test('wiki links only when enabled', () => {
    const off = extractPage('a.md', '[[Water Plan]] and ![[pump.jpg]]', { wikiLinks: false });
    expect(off.links).toEqual([]);
  });

  test('title falls back to the file name without extension', () => {
    expect(extractPage('guides/no-heading.mdx', 'Just text.').title).toBe('no-heading');
  });

  test('a backslash path is kept as written and flagged on the page', () => {
    const page = extractPage('a.md', 'See [b](..\\b\\c.md).');
    expect(page.links[0]?.href).toBe('..\\b\\c.md');
    expect(page.warnings).toEqual([expect.objectContaining({ code: 'BACKSLASH_PATH', line: 1 })]);
  });

  test('text is capped at 200,000 characters', () => {
    expect(extractPage('a.md', 'word '.repeat(50_000)).text.length).toBe(200_000);
  });
});
