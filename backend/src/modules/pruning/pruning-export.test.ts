import { describe, expect, it } from 'vitest';
import { contentDisposition, csvCell, exportFileName, toCsv } from './pruning-export.js';

describe('csvCell', () => {
  it('prefixes cells that a spreadsheet would run as formulas', () => {
    // OWASP "CSV Injection" page and ASVS 5.0 1.2.10: leading = + - @ tab are neutralised with an apostrophe.
    expect(csvCell('=HYPERLINK("http://x")')).toBe(`"'=HYPERLINK(""http://x"")"`);
    expect(csvCell('+1')).toBe("'+1");
    expect(csvCell('-2')).toBe("'-2");
    expect(csvCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvCell('\tcmd')).toBe("'\tcmd");
    expect(csvCell('guide/a-b.md')).toBe('guide/a-b.md');
  });

  it('quotes per RFC 4180 section 2 (rules 6 and 7)', () => {
    // RFC 4180 section 2: fields with commas, double quotes or line breaks are enclosed in double quotes,
    // and a double quote inside is escaped by another double quote.
    expect(csvCell('a,b')).toBe('"a,b"');
    expect(csvCell('say "hi"')).toBe('"say ""hi"""');
    expect(csvCell('two\nlines')).toBe('"two\nlines"');
    expect(csvCell(null)).toBe('');
  });

  it('ends every record with CRLF (RFC 4180 section 2, rule 1)', () => {
    expect(toCsv(['path', 'note'], [['a.md', 'x']])).toBe('path,note\r\na.md,x\r\n');
  });
});

describe('contentDisposition', () => {
  it('gives an ASCII fallback and an RFC 8187 UTF-8 name (RFC 6266 section 4.3)', () => {
    // RFC 6266 appendix D / section 5 example shape: attachment; filename="EURO rates"; filename*=utf-8''%e2%82%ac%20rates
    const header = contentDisposition('pruning-Zoë "x"\r\n.csv');
    expect(header).not.toMatch(/[\r\n]/);
    expect(header).toContain(`filename="pruning-Zoe _x___.csv"`);
    expect(header).toContain("filename*=UTF-8''pruning-Zo%C3%AB%20%22x%22%0D%0A.csv");
  });

  it('names exports after the doc set without path characters', () => {
    expect(exportFileName('Ops / Runbooks', 'txt')).toBe('pruning-approved-Ops-Runbooks.txt');
  });
});
