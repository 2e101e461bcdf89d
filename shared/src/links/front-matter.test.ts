import { describe, expect, test } from 'vitest';
import { extractPage } from './extract-page.js';

// docs/threats.md checks 29-33 (bad input in front matter and encodings). Times are printed, not asserted.
const codes = (markdown: string) => extractPage('p.md', markdown).warnings.map((w) => w.code);

describe('line endings and BOM (check 29)', () => {
  const lf = '---\ntitle: Pump maintenance\n---\n# Heading\n\nSee [valves](valves.md).\n';
  test.each([
    ['CRLF', lf.replaceAll('\n', '\r\n')],
    ['lone CR', lf.replaceAll('\n', '\r')],
    ['BOM + CRLF', '\uFEFF' + lf.replaceAll('\n', '\r\n')],
  ])('%s gives the same facts as LF', (_name, variant) => {
    const a = extractPage('p.md', lf);
    const b = extractPage('p.md', variant);
    expect(b.title).toBe('Pump maintenance');
    expect(b).toEqual(a);
  });
  test('a BOM before a heading does not leak into the title', () => {
    expect(extractPage('p.md', '\uFEFF# Valves\r\n').title).toBe('Valves');
  });
});

describe('bad YAML keeps the page without metadata (check 30)', () => {
  test.each([
    ['unclosed quote', '---\ntitle: "Pumps\nowner: ana\n---\n# Body\n', [2, 4]],
    ['tab indentation', '---\nteam:\n\tname: x\n---\n# Body\n', [3, 3]],
    ['duplicate keys', '---\ntitle: A\ntitle: B\n---\n# Body\n', [3, 3]],
    ['non-object root', '---\n- one\n- two\n---\n# Body\n', [2, 2]],
  ] as const)('%s', (_name, markdown, [low, high]) => {
    const facts = extractPage('p.md', markdown);
    const warning = facts.warnings.find((w) => w.code === 'FRONT_MATTER_INVALID')!;
    expect(warning.line).toBeGreaterThanOrEqual(low);
    expect(warning.line).toBeLessThanOrEqual(high);
    expect(facts.title).toBe('Body');
    expect(facts.frontMatter.raw).toEqual({});
  });
  test('bad TOML reports its line', () => {
    const facts = extractPage('p.md', '+++\ntitle = "ok"\nbroken = \n+++\n# Body\n');
    expect(facts.warnings[0]).toMatchObject({ code: 'FRONT_MATTER_INVALID', line: 3 });
  });
});

describe('hostile front matter (checks 31-33)', () => {
  test('YAML alias bomb (about 300 bytes, 20 levels) is rejected', () => {
    // The classic "billion laughs" shape: each level refers to the previous one several times.
    const levels = ['l0: &l0 [lol, lol, lol]'];
    for (let i = 1; i < 20; i++) levels.push(`l${i}: &l${i} [*l${i - 1}, *l${i - 1}]`);
    const yaml = levels.join('\n');
    const started = performance.now();
    const facts = extractPage('p.md', `---\n${yaml}\n---\n# Body\n`);
    console.log(`[timing] alias bomb (${yaml.length} bytes): ${(performance.now() - started).toFixed(1)} ms`);
    expect(facts.warnings.map((w) => w.code)).toEqual(['FRONT_MATTER_INVALID']);
    expect(facts.warnings[0]?.message).toMatch(/alias/i);
    expect(facts.frontMatter.raw).toEqual({});
  });

  test('5,000-deep [[[...]]] is rejected before parsing', () => {
    const started = performance.now();
    const facts = extractPage('p.md', `---\na: ${'['.repeat(5000)}${']'.repeat(5000)}\n---\n# Body\n`);
    console.log(`[timing] 5,000-deep flow sequence: ${(performance.now() - started).toFixed(1)} ms`);
    expect(facts.warnings[0]?.message).toContain('nested deeper than 20');
  });

  test('block nesting deeper than 20 is rejected', () => {
    const yaml = Array.from({ length: 25 }, (_, i) => `${'  '.repeat(i)}k${i}:`).join('\n') + ' end';
    expect(codes(`---\n${yaml}\n---\n`)).toEqual(['FRONT_MATTER_INVALID']);
    expect(extractPage('p.md', `---\n${yaml}\n---\n`).warnings[0]?.message).toContain('nested deeper than 20');
  });

  test.each(['---js', '---javascript', '--- coffee'])('%s front matter is never executed', (fence) => {
    const markdown = `${fence}\nglobalThis.__pwned = 1; module.exports = { title: 'x' }\n---\n# Body\n`;
    const facts = extractPage('p.md', markdown);
    expect((globalThis as Record<string, unknown>).__pwned).toBeUndefined();
    expect(facts.warnings.map((w) => w.code)).toEqual(['FRONT_MATTER_INVALID']);
    expect(facts.title).toBe('Body');
    expect(facts.headings).toHaveLength(1);
  });

  test('front matter over 64 KiB is ignored', () => {
    const facts = extractPage('p.md', `---\ntitle: Big\nfiller: "${'x'.repeat(65 * 1024)}"\n---\n`);
    expect(facts.warnings[0]?.message).toContain('64 KiB');
    expect(facts.title).toBe('p');
  });

  test('__proto__ / constructor.prototype keys cannot pollute prototypes', () => {
    const yaml = '__proto__:\n  polluted: yes\nconstructor:\n  prototype:\n    polluted: yes\ntitle: Safe';
    const toml = 'title = "Safe"\n[__proto__]\npolluted = "yes"\n[constructor.prototype]\npolluted = "yes"';
    for (const markdown of [`---\n${yaml}\n---\n`, `+++\n${toml}\n+++\n`]) {
      const facts = extractPage('p.md', markdown);
      expect(facts.title).toBe('Safe');
      expect(Object.keys(facts.frontMatter.raw)).toEqual(['title']);
    }
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });
});

describe('front-matter fields', () => {
  test('YAML fields are read', () => {
    const facts = extractPage(
      'p.md',
      [
        '---',
        'title: Irrigation',
        'aliases: [Watering, Drip lines]',
        'owner: ana',
        'tags: [garden, "water"]',
        'last_reviewed: 2026-03-04',
        'redirect_from: /old/irrigation/',
        'linkloom:',
        '  protect: true',
        '---',
        '',
      ].join('\n'),
    );
    expect(facts.frontMatter).toMatchObject({
      title: 'Irrigation',
      aliases: ['Watering', 'Drip lines'],
      owner: 'ana',
      tags: ['garden', 'water'],
      reviewed: '2026-03-04',
      redirectFrom: ['/old/irrigation/'],
      protected: true,
    });
  });
  test('TOML dates become ISO dates; prune = false protects', () => {
    const facts = extractPage('p.md', '+++\ntitle = "Soil"\nupdated = 2025-11-30\nprune = false\n+++\n');
    expect(facts.frontMatter).toMatchObject({ title: 'Soil', reviewed: '2025-11-30', protected: true });
  });
  test('more than 50 aliases: the first 50 are kept and the page is flagged', () => {
    const aliases = Array.from({ length: 60 }, (_, i) => `a${i}`).join(', ');
    const facts = extractPage('p.md', `---\naliases: [${aliases}]\n---\n`);
    expect(facts.frontMatter.aliases).toHaveLength(50);
    expect(facts.warnings.map((w) => w.code)).toEqual(['FRONT_MATTER_INVALID']);
  });
});
