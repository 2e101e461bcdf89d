import { describe, expect, it } from 'vitest';
import { parsePage } from './parse-page.js';
import { createPageParser } from './parse-pool.js';
import { findWorkerSource } from './worker-source.js';

const options = { wikiLinks: true, pageExtensions: ['.md'] };
const page = (path: string, text: string) => ({ path, bytes: Buffer.from(text) });

describe('parse pool', () => {
  it('runs the real worker code under vitest (through the TypeScript loader) and matches in-process parsing', async () => {
    const source = findWorkerSource();
    expect(source.kind).toBe('eval');
    const pool = createPageParser({ size: 2, pageTimeoutMs: 2_000, heapMb: 512 }, source);
    try {
      const pages = Array.from({ length: 10 }, (_, i) => page(`p${i}.md`, `# Page ${i}\n\n[next](p${i + 1}.md) [[Wiki ${i}]]\n`));
      const [a, b] = await Promise.all([pool.parse(pages.slice(0, 5), options), pool.parse(pages.slice(5), options)]);
      expect([...a, ...b]).toEqual(pages.map((p) => parsePage(p.path, p.bytes, options)));
      expect(a[0]).toMatchObject({ ok: true, facts: { title: 'Page 0', headingText: 'Page 0' } });
    } finally {
      await pool.close();
    }
  });

  it('gives up a page that runs past the time limit (PARSE_TIMEOUT), keeps the rest of its batch, and carries on', async () => {
    const pool = createPageParser({ size: 1, pageTimeoutMs: 400, heapMb: 512 });
    try {
      // 50,000 headings take seconds in remark on this machine, far past 400 ms; the small pages take milliseconds.
      const slow = page('slow.md', Array.from({ length: 50_000 }, (_, i) => `## Heading ${i}`).join('\n\n'));
      const outcomes = await pool.parse([page('a.md', '# A\n'), slow, page('b.md', '# B\n')], options);
      expect(outcomes.map((o) => [o.path, o.ok ? 'ok' : o.warning.code])).toEqual([
        ['a.md', 'ok'],
        ['slow.md', 'PARSE_TIMEOUT'],
        ['b.md', 'ok'],
      ]);
      const again = await pool.parse([page('c.md', '# C\n')], options);
      expect(again[0]).toMatchObject({ ok: true, facts: { title: 'C' } });
      expect(pool.failed).toBe(false);
    } finally {
      await pool.close();
    }
  });

  it('decodes strictly: UTF-16 BOM, NUL bytes and invalid UTF-8 are refused with their codes', async () => {
    const { decodePage } = await import('./parse-page.js');
    // Byte sequences from RFC 3629 section 3 (0xC3 0x28 is an invalid two-byte sequence) and the Unicode BOMs.
    expect(decodePage(Buffer.from([0xff, 0xfe, 0x23, 0x00]))).toMatchObject({ ok: false, warning: { code: 'UNSUPPORTED_ENCODING' } });
    expect(decodePage(Buffer.from([0x23, 0x00, 0x41]))).toMatchObject({ ok: false, warning: { code: 'BINARY_CONTENT' } });
    expect(decodePage(Buffer.from([0x23, 0xc3, 0x28]))).toMatchObject({ ok: false, warning: { code: 'INVALID_UTF8' } });
    expect(decodePage(Buffer.from('\uFEFF# T\r\nx\ry\n'))).toEqual({ ok: true, markdown: '# T\nx\ny\n' });
  });
});
