import { describe, expect, test } from 'vitest';
import { defaultDocSetSettings } from '../schemas/doc-set-settings.js';
import { extractPage } from './extract-page.js';
import { createLinkResolver } from './resolve-link.js';
import type { RawLink } from './types.js';

// docs/threats.md check 36 (OWASP ASVS 5.0 V1.2.2: only safe URL schemes may become links). The browser
// behaviours the obfuscations rely on are from the WHATWG URL Standard, "basic URL parser": leading and
// trailing C0 controls and spaces are stripped, ASCII tab and newline are removed anywhere, and schemes
// are case-insensitive.
const resolver = createLinkResolver({ pagePaths: ['a.md'], assetPaths: [], pages: new Map(), settings: defaultDocSetSettings() });
const raw = (href: string): RawLink => ({ kind: 'inline', href, line: 1, column: 1, text: 'x', asset: false });

const unsafeHrefs = [
  'javascript:alert(1)',
  'JaVaScRiPt:alert(1)',
  'java\tscript:alert(1)',
  'java\nscript:alert(1)',
  '\x01javascript:alert(1)',
  '   javascript:alert(1)',
  'data:text/html,<script>alert(1)</script>',
  'vbscript:msgbox(1)',
  'file:///outside/secret',
];

describe('unsafe links (docs/threats.md check 36)', () => {
  test.each(unsafeHrefs)('%j is unsafe', (href) => {
    const link = resolver.resolve('a.md', raw(href));
    expect(link.status).toBe('unsafe');
    expect(link.targetPath).toBeNull();
  });

  test('the same forms written in Markdown and raw HTML reach the resolver decoded and are blocked', () => {
    const markdown = [
      '[a](javascript:alert(1)) [b](JaVaScRiPt:alert(1)) [c](<java\tscript:alert(1)>)',
      '[d](&#106;avascript:alert(1)) [e](data:text/html,x) [f](vbscript:msgbox) [g](file:///outside/secret)',
      '',
      '<a href="java\nscript:alert(1)">h</a> <a href="&#x01;javascript:alert(1)">i</a> <a href="  javascript:alert(1)">j</a>',
    ].join('\n');
    const facts = extractPage('a.md', markdown);
    expect(facts.links).toHaveLength(10);
    expect(facts.links.map((l) => resolver.resolve('a.md', l).status)).toEqual(Array(10).fill('unsafe'));
  });

  test('safe look-alikes are not blocked (the check can fail)', () => {
    expect(resolver.resolve('a.md', raw('https://example.com/javascript:x')).status).toBe('external');
    expect(resolver.resolve('a.md', raw('mailto:javascript@example.com')).status).toBe('external');
    expect(resolver.resolve('a.md', raw('./javascript:x')).status).toBe('broken');
  });
});
