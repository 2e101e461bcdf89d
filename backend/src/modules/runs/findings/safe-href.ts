/**
 * Which stored hrefs the API may hand to a browser as a link (docs/threats.md check 36, OWASP ASVS 1.2.2): an
 * allowlist of schemes (http, https, mailto) and scheme-less relative references. Browsers drop tabs,
 * newlines and leading control characters or spaces before reading the scheme, so the check does too;
 * anything else (javascript:, data:, vbscript:, file:, entity-encoded tricks) is shown only as text.
 */
const ALLOWED_SCHEMES = new Set(['http', 'https', 'mailto']);

export function isSafeHref(href: string): boolean {
  // eslint-disable-next-line no-control-regex
  const cleaned = href.replace(/[\u0000-\u0020\u007f]/g, '');
  // A character reference before the path (`&#106;avascript:`) turns into a scheme once decoded as HTML.
  if (/&#|&[a-z]+;/i.test(cleaned.split(/[/?]/)[0])) return false;
  const scheme = /^([a-z][a-z0-9+.-]*):/i.exec(cleaned);
  return scheme ? ALLOWED_SCHEMES.has(scheme[1].toLowerCase()) : true;
}

/** The API shape of an href: the link itself only when safe, the raw text always shown as text. */
export function hrefFields(href: string, status: string): { href: string | null; hrefText: string } {
  return { href: status !== 'unsafe' && isSafeHref(href) ? href : null, hrefText: href };
}
