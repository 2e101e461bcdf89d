import { describe, expect, test } from 'vitest';
import { extractPage } from './extract-page.js';
import { MAX_LINKS_PER_PAGE } from './link-collector.js';

// docs/threats.md check 34 (pathological Markdown). Wall time is measured and printed, never asserted:
// the machine is shared. What is asserted is that each input finishes with the expected facts.
function timed<T>(label: string, run: () => T): T {
  const started = performance.now();
  const result = run();
  console.log(`[timing] ${label}: ${(performance.now() - started).toFixed(0)} ms`);
  return result;
}

describe('pathological Markdown finishes (docs/threats.md check 34)', () => {
  test('1 MB of "["', () => {
    const facts = timed('1 MB of [', () => extractPage('brackets.md', '['.repeat(1024 * 1024)));
    expect(facts.links).toEqual([]);
    expect(facts.warnings.map((w) => w.code)).toContain('PARSE_LIMIT');
  });

  test('1 MB of "]" and a real link after it still counts', () => {
    const facts = timed('1 MB of ] + link', () => extractPage('close.md', ']'.repeat(1024 * 1024) + '\n\n[ok](next.md)'));
    expect(facts.links.map((l) => l.href)).toEqual(['next.md']);
  });

  test('10,000 nested emphasis', () => {
    const markdown = '*a '.repeat(10_000) + '[deep](target.md)' + ' a*'.repeat(10_000);
    const facts = timed('10k nested emphasis', () => extractPage('emphasis.md', markdown));
    expect(facts.links.map((l) => l.href)).toEqual(['target.md']);
    expect(facts.warnings.map((w) => w.code)).toContain('PARSE_LIMIT');
  });

  test('10,000 headings keep github-slugger numbering', () => {
    const markdown = Array.from({ length: 10_000 }, () => '# Same title').join('\n\n');
    const facts = timed('10k headings', () => extractPage('headings.md', markdown));
    expect(facts.headings).toHaveLength(10_000);
    expect(facts.headings[9_999]!.slug).toBe('same-title-9999');
  });

  test(`more than ${MAX_LINKS_PER_PAGE} links: capped with LINK_LIMIT`, () => {
    const paragraph = Array.from({ length: 500 }, (_, i) => `[p${i}](page-${i}.md)`).join(' ');
    const markdown = Array.from({ length: 41 }, () => paragraph).join('\n\n');
    const facts = timed('20,500 links', () => extractPage('many.md', markdown));
    expect(facts.links).toHaveLength(MAX_LINKS_PER_PAGE);
    expect(facts.warnings.find((w) => w.code === 'LINK_LIMIT')?.message).toContain('500 were dropped');
  });

  test('a URL over 2,048 characters is dropped with LINK_LIMIT', () => {
    const facts = extractPage('long.md', `[long](https://example.com/${'a'.repeat(2_100)})\n\n[short](b.md)`);
    expect(facts.links.map((l) => l.href)).toEqual(['b.md']);
    expect(facts.warnings[0]).toMatchObject({ code: 'LINK_LIMIT', line: 1 });
  });

  test('5,000 nested block quotes fall back instead of overflowing the stack', () => {
    const facts = timed('5k nested quotes', () => extractPage('quotes.md', '>'.repeat(5_000) + ' [in](x.md)'));
    expect(facts.links.map((l) => l.href)).toEqual(['x.md']);
  });
});
