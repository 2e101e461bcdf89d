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

/** Subjects are one line: CR, LF and other controls (e.g. from a page title) become spaces. */
export function singleLineSubject(subject: string): string {
  return subject
    .replace(/[\u0000-\u001f\u007f\u2028\u2029]+/g, ' ')
    .replace(/\s+/g, ' ')
    .trim()
    .slice(0, 200);
}

export function escapeHtml(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}
