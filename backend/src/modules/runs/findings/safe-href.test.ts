import { describe, expect, it } from 'vitest';
import { hrefFields, isSafeHref } from './safe-href.js';

describe('isSafeHref', () => {
  // docs/threats.md check 36 (OWASP ASVS 5.0 1.2.2): the WHATWG URL parser strips tab and newline anywhere and
  // leading C0 controls and spaces before reading the scheme, so the same is done here.
  it('refuses script and data schemes however they are disguised', () => {
    for (const href of [
      'javascript:alert(1)',
      'JaVaScRiPt:alert(1)',
      'java\tscript:alert(1)',
      'java\nscript:alert(1)',
      '\x01javascript:alert(1)',
      '  javascript:alert(1)',
      '&#106;avascript:alert(1)',
      'data:text/html,<b>x</b>',
      'vbscript:msgbox(1)',
      'file:///outside/secret',
    ]) {
      expect(isSafeHref(href), JSON.stringify(href)).toBe(false);
    }
  });

  it('allows http, https, mailto and relative references', () => {
    for (const href of [
      'https://example.org/a',
      'http://x.test',
      'mailto:team@example.org',
      '../guide/setup.md#install',
      'setup.md',
      '/docs/a',
      '#top',
      '?q=1',
    ]) {
      expect(isSafeHref(href), href).toBe(true);
    }
  });

  it('returns links flagged unsafe by the importer as text only', () => {
    expect(hrefFields('https://example.org', 'unsafe')).toEqual({ href: null, hrefText: 'https://example.org' });
    expect(hrefFields('a.md', 'ok')).toEqual({ href: 'a.md', hrefText: 'a.md' });
  });
});
