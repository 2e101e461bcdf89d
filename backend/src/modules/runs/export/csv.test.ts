import { describe, expect, it } from 'vitest';
import { attachmentDisposition, csvCell, csvLine } from './csv.js';

describe('csv', () => {
  // RFC 4180 section 2 (rules 5-7): quoted fields for comma, quote and line breaks, quotes doubled.
  it('quotes and doubles as RFC 4180 requires', () => {
    expect(csvLine(['a', 'b,c', 'say "hi"', 'two\nlines', null, 3])).toBe('a,"b,c","say ""hi""","two\nlines",,3\r\n');
  });

  // OWASP ASVS 5.0 requirement 1.2.10 (CSV and formula injection) / docs/threats.md check 39.
  it('defuses cells a spreadsheet would read as formulas, but not numbers', () => {
    expect(csvCell('=HYPERLINK("http://x")')).toBe(`"'=HYPERLINK(""http://x"")"`);
    for (const start of ['+', '-', '@', '\t', '\r']) expect(csvCell(`${start}1`).replace(/^"/, '')).toMatch(/^'/);
    expect(csvCell(-0.5)).toBe('-0.5');
    expect(csvCell('plain')).toBe('plain');
  });

  // RFC 6266 section 4.3 and appendix D (filename plus filename*), RFC 8187 section 3.2 (encoding).
  it('builds a Content-Disposition that quotes, CR/LF and non-ASCII cannot break', () => {
    const header = attachmentDisposition('Guide "β"\r\nSet-Cookie: x=1.csv');
    expect(header).not.toMatch(/[\r\n]/);
    expect(header).toBe(
      `attachment; filename="Guide_Set-Cookie_x_1.csv"; filename*=UTF-8''Guide%20%22%CE%B2%22%0D%0ASet-Cookie%3A%20x%3D1.csv`,
    );
  });
});
