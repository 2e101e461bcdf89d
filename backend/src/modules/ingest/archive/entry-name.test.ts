import { describe, expect, it } from 'vitest';
import { formatBytes } from './archive-error.js';
import { decodeEntryName, normaliseEntryPath } from './entry-name.js';

const UTF8 = 0x800;

describe('decodeEntryName', () => {
  it('decodes bit-11-clear names as IBM code page 437', () => {
    // Unicode Consortium, VENDORS/MICSFT/PC/CP437.TXT (values from memory): 0x80 U+00C7, 0x81 U+00FC,
    // 0x9B U+00A2, 0xE1 U+00DF, 0xFF U+00A0.
    const cases: Array<[number, string]> = [
      [0x80, '\u00c7'],
      [0x81, '\u00fc'],
      [0x9b, '\u00a2'],
      [0xe1, '\u00df'],
      [0xff, '\u00a0'],
    ];
    for (const [byte, expected] of cases) {
      expect(decodeEntryName(Buffer.from([0x61, byte]), 0)).toEqual({ ok: true, name: `a${expected}` });
    }
  });

  it('decodes bit-11-set names as strict UTF-8 (APPNOTE 6.3.10 appendix D)', () => {
    expect(decodeEntryName(Buffer.from('docs/\u00fcber.md'), UTF8)).toEqual({ ok: true, name: 'docs/\u00fcber.md' });
    // 0xC3 0x28 is the classic invalid two-byte sequence (Markus Kuhn, UTF-8 decoder stress test, 3.1 area;
    // from memory): a lenient decoder would yield U+FFFD.
    expect(decodeEntryName(Buffer.from([0xc3, 0x28]), UTF8)).toEqual({ ok: false, problem: 'invalid UTF-8' });
    // Overlong "/" (0xC0 0xAF) must not decode to a separator (RFC 3629 section 10).
    expect(decodeEntryName(Buffer.from([0x61, 0xc0, 0xaf, 0x62]), UTF8).ok).toBe(false);
  });

  it('refuses controls, DEL, C1 and bidi controls (Unicode UAX #9; Trojan Source, Boucher & Anderson 2021)', () => {
    for (const bad of ['a\u0000', 'a\u001b', 'a\u007f', 'a\u0085', 'evil\u202edm.exe', 'x\u2066y', 'x\u200fy']) {
      expect(decodeEntryName(Buffer.from(bad), UTF8).ok, JSON.stringify(bad)).toBe(false);
    }
    expect(decodeEntryName(Buffer.from([0x61, 0x09]), 0)).toEqual({ ok: false, problem: 'control character' });
  });
});

describe('normaliseEntryPath', () => {
  it('refuses every zip slip form (Snyk "Zip Slip" 2018; OWASP File Upload Cheat Sheet)', () => {
    const unsafe = [
      '../x.md',
      '../../outside/escape.md',
      '/abs.md',
      'C:/x.md',
      'c:x.md',
      'a\\..\\..\\x.md',
      'a/./../../x.md',
      '\\\\server\\share\\x.md',
      'a/b/..',
    ];
    for (const name of unsafe) expect(normaliseEntryPath(name).ok, name).toBe(false);
  });

  it('drops "." and empty segments, reads backslashes as separators, applies NFC', () => {
    expect(normaliseEntryPath('./docs//a.md')).toEqual({ ok: true, segments: ['docs', 'a.md'], isDirectory: false });
    expect(normaliseEntryPath('docs\\guide\\a.md')).toEqual({ ok: true, segments: ['docs', 'guide', 'a.md'], isDirectory: false });
    expect(normaliseEntryPath('docs/')).toEqual({ ok: true, segments: ['docs'], isDirectory: true });
    // UAX #15: "e" + U+0301 composes to U+00E9 under NFC.
    expect(normaliseEntryPath('cafe\u0301.md')).toEqual({ ok: true, segments: ['caf\u00e9.md'], isDirectory: false });
    expect(normaliseEntryPath('a..b.md').ok).toBe(true);
  });
});

describe('formatBytes', () => {
  it('prints limits in binary units and odd sizes in decimal units', () => {
    expect(formatBytes(200_000_000)).toBe('200 MB');
    expect(formatBytes(5 * 1024 * 1024)).toBe('5 MiB');
    expect(formatBytes(2 ** 40)).toBe('1 TiB');
    expect(formatBytes(1024)).toBe('1 KiB');
    expect(formatBytes(1500)).toBe('1.5 kB');
    expect(formatBytes(12)).toBe('12 bytes');
  });
});
