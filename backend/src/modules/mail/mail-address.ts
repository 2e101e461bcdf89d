/**
 * A deliberately plain address rule: one local part and one domain, no quotes, spaces, commas, angle brackets
 * or line breaks. Outbox rows hold exactly one such address, so crafted addresses such as `"a@b x"@evil.test`
 * can never add recipients (nodemailer advisory GHSA-mm7p-fcc7-pg87).
 */
const PLAIN_ADDRESS =
  /^[A-Za-z0-9.!#$%&'*+/=?^_`{|}~-]+@[A-Za-z0-9](?:[A-Za-z0-9-]{0,62}[A-Za-z0-9])?(?:\.[A-Za-z0-9](?:[A-Za-z0-9-]{0,62}[A-Za-z0-9])?)+$/;

export function isPlainAddress(address: string): boolean {
  return address.length <= 254 && PLAIN_ADDRESS.test(address);
}

/** CR, LF and other controls (e.g. from a page title) become spaces, so a value can never start a new header. */
function oneLine(value: string, max: number): string {
  return (
    value
      // eslint-disable-next-line no-control-regex -- control characters are exactly what must go
      .replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, ' ')
      .replace(/\s+/g, ' ')
      .trim()
      .slice(0, max)
  );
}

/** Names (doc sets, pages) inside a mail's text, on one line. */
export function singleLineText(value: string): string {
  return oneLine(value, 500);
}

/** Subjects are one line of at most 200 characters. */
export function singleLineSubject(subject: string): string {
  return oneLine(subject, 200);
}

/** Extra header lines: only printable names, and values kept on one line like subjects, so none can add a header. */
export function singleLineHeaders(headers: Record<string, string> | undefined): Record<string, string> {
  const kept = Object.entries(headers ?? {}).filter(([name]) => /^[A-Za-z][A-Za-z0-9-]{0,60}$/.test(name));
  return Object.fromEntries(kept.map(([name, value]) => [name, oneLine(value, 2000)]));
}

/** The one HTML escaper of every mail: titles and paths come from imported documents. */
export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}
