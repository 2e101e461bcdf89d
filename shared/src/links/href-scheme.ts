/**
 * Scheme classification of a link destination, the way browsers read it (WHATWG URL Standard, "basic URL
 * parser": leading/trailing C0 controls and spaces are stripped and ASCII tab/newline removed anywhere,
 * schemes are case-insensitive). Entity forms like `&#106;avascript:` arrive decoded from the parsers.
 * Allowlist per OWASP ASVS 5.0 V1.2.2 as applied in docs/threats.md check 36: `javascript:`, `data:`,
 * `vbscript:` and `file:` are unsafe.
 */
export const UNSAFE_SCHEMES = new Set(['javascript', 'data', 'vbscript', 'file']);

export type HrefClass =
  | { type: 'unsafe'; scheme: string }
  | { type: 'web'; url: string }
  | { type: 'other-scheme'; scheme: string }
  | { type: 'reference'; reference: string };

export function browserView(href: string): string {
  let start = 0;
  let end = href.length;
  while (start < end && href.charCodeAt(start) <= 32) start++;
  while (end > start && href.charCodeAt(end - 1) <= 32) end--;
  let out = '';
  for (let i = start; i < end; i++) {
    const c = href.charCodeAt(i);
    if (c !== 9 && c !== 10 && c !== 13) out += href[i];
  }
  return out;
}

function schemeOf(href: string): string | null {
  const colon = href.indexOf(':');
  if (colon < 1) return null;
  const scheme = href.slice(0, colon);
  for (let i = 0; i < scheme.length; i++) {
    const c = scheme.charCodeAt(i) | 0x20;
    const letter = c >= 97 && c <= 122;
    const other = i > 0 && ((scheme.charCodeAt(i) >= 48 && scheme.charCodeAt(i) <= 57) || '+-.'.includes(scheme[i]!));
    if (!letter && !other) return null;
  }
  return scheme.toLowerCase();
}

export function classifyHref(href: string): HrefClass {
  const seen = browserView(href);
  const scheme = schemeOf(seen);
  if (scheme !== null && UNSAFE_SCHEMES.has(scheme)) return { type: 'unsafe', scheme };
  // A Windows drive letter (`C:\docs\a.md`) is a local path, not a scheme; it is read as a reference.
  if (scheme !== null && scheme.length === 1) return { type: 'reference', reference: seen };
  if (scheme === 'http' || scheme === 'https') return { type: 'web', url: seen };
  if (scheme !== null) return { type: 'other-scheme', scheme };
  if (seen.startsWith('//') || seen.startsWith('\\\\')) return { type: 'web', url: 'https:' + seen.replaceAll('\\', '/') };
  return { type: 'reference', reference: seen };
}
