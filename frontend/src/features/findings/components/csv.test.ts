import { describe, expect, it } from 'vitest';
import { csvField, toCsv } from './csv.js';

describe('csv', () => {
  // RFC 4180 section 2, rules 6 and 7 (Shafranovich 2005): fields with commas, quotes or line breaks are
  // enclosed in double quotes, and a double quote inside is escaped by another double quote.
  it('quotes fields the way RFC 4180 section 2 says', () => {
    expect(csvField('plain')).toBe('plain');
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('two\nlines')).toBe('"two\nlines"');
    expect(csvField(null)).toBe('');
  });

  // RFC 4180 section 2, rules 1 and 3: records end with CRLF, the header has the same format as records.
  it('ends every record with CRLF', () => {
    expect(
      toCsv(
        ['path', 'line'],
        [
          ['a.md', 3],
          ['b,c.md', 4],
        ],
      ),
    ).toBe('path,line\r\na.md,3\r\n"b,c.md",4\r\n');
  });
});
