// Exports of the approved list. CSV per RFC 4180 (Shafranovich, "Common Format and MIME Type for CSV Files",
// section 2: quote fields holding comma, quote or line breaks; double inner quotes), with formula-injection
// guarding per OWASP ASVS 5.0 1.2.10 (as in docs/threats.md check 39) and the OWASP "CSV Injection" page: cells starting with = + - @ or tab get a
// leading apostrophe. Content-Disposition per RFC 6266 section 4.3 with an RFC 8187 `filename*` for non-ASCII.

const FORMULA_START = /^[=+\-@\t\r]/;

export function csvCell(value: string | number | boolean | null | undefined): string {
  let text = value === null || value === undefined ? '' : String(value);
  if (FORMULA_START.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function toCsv(header: string[], rows: (string | number | boolean | null | undefined)[][]): string {
  return [header, ...rows].map((row) => row.map(csvCell).join(',')).join('\r\n') + '\r\n';
}

/** `attachment` with an ASCII fallback name (no quotes, backslashes or control characters) and the UTF-8 name. */
export function contentDisposition(fileName: string): string {
  const ascii = fileName
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .replace(/[^\x20-\x7e]/g, '_')
    .replace(/["\\]/g, '_')
    .replace(/[\r\n]/g, '_');
  const encoded = encodeURIComponent(fileName).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encoded}`;
}

/** A file-name-safe slug of the doc set name for export file names. */
export function exportFileName(docSetName: string, extension: 'csv' | 'txt'): string {
  const slug =
    docSetName
      .trim()
      .replace(/[\s/\\:*?"<>|]+/g, '-')
      .replace(/-+/g, '-')
      .slice(0, 80) || 'doc-set';
  return `pruning-approved-${slug}.${extension}`;
}
