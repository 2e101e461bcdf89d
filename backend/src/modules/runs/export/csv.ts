/**
 * CSV as RFC 4180 writes it (fields with comma, quote or line break quoted, quotes doubled, CRLF line
 * ends), with formula-injection defence for spreadsheets (OWASP ASVS 5.0 1.2.10 / docs/threats.md check 39):
 * a text cell starting with =, +, -, @, tab or carriage return is prefixed with a single quote.
 */
const FORMULA_START = /^[=+\-@\t\r]/;

export function csvCell(value: unknown): string {
  if (value === null || value === undefined) return '';
  let text = typeof value === 'string' ? value : String(value);
  if (typeof value === 'string' && FORMULA_START.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function csvLine(values: readonly unknown[]): string {
  return `${values.map(csvCell).join(',')}\r\n`;
}

/**
 * Content-Disposition for a download (RFC 6266 with the RFC 8187 `filename*` form): an ASCII fallback
 * with anything outside [A-Za-z0-9._-] replaced, and the full UTF-8 name percent-encoded, so quotes,
 * CR/LF or non-ASCII in a doc-set name can never end or inject a header.
 */
export function attachmentDisposition(fileName: string): string {
  const ascii = fileName.replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^_+|_+$/g, '') || 'export.csv';
  const encoded = encodeURIComponent(fileName).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encoded}`;
}
