/**
 * Entry-name decoding and path normalisation.
 * Method: APPNOTE.TXT (PKWARE, .ZIP File Format Specification 6.3.10) section 4.4.4 general purpose bit 11
 * and Appendix D: names are UTF-8 when bit 11 is set, otherwise IBM code page 437. We decode ourselves
 * (yauzl `decodeStrings: false`) so that invalid UTF-8 is an error, not silently replaced with U+FFFD,
 * and the Info-ZIP Unicode Path extra field (0x7075) is deliberately ignored: one name source, one answer.
 * CP437 goes through yauzl's exported `getFileNameLowLevel` table (strict mode, no extra fields).
 */
import yauzl from 'yauzl';

const UTF8_FLAG = 0x800;
const strictUtf8 = new TextDecoder('utf-8', { fatal: true });

/** C0 controls, DEL, C1 controls. */
const CONTROL = /[\u0000-\u001f\u007f-\u009f]/u;
/** Bidirectional overrides, embeddings, isolates and marks: they make `evil\u202Edm.exe` read as `exe.md`. */
const BIDI = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/u;

/** `text` keeps a decodable but refused name so error details can show it (escaped). */
export type DecodedName = { ok: true; name: string } | { ok: false; problem: string; text?: string };

export function decodeEntryName(raw: Buffer, generalPurposeBitFlag: number): DecodedName {
  if ((generalPurposeBitFlag & UTF8_FLAG) === 0) {
    // Raw control bytes are refused before the CP437 table turns them into glyphs such as U+263A.
    if (raw.some((b) => b < 0x20 || b === 0x7f)) return { ok: false, problem: 'control character' };
    return checkText(yauzl.getFileNameLowLevel(0, raw, [], true));
  }
  try {
    return checkText(strictUtf8.decode(raw));
  } catch {
    return { ok: false, problem: 'invalid UTF-8' };
  }
}

export function checkText(name: string): DecodedName {
  if (name.length === 0) return { ok: false, problem: 'empty name' };
  if (CONTROL.test(name)) return { ok: false, problem: 'control character', text: name };
  if (BIDI.test(name)) return { ok: false, problem: 'bidirectional control character', text: name };
  return { ok: true, name };
}

export type NormalisedPath = { ok: true; segments: string[]; isDirectory: boolean } | { ok: false; problem: string };

/**
 * Backslashes are read as separators (old Windows tools write them), then any absolute form, drive letter
 * or `..` segment is refused outright, even `a/../b` that would stay inside: no resolver, no ambiguity.
 */
export function normaliseEntryPath(name: string): NormalisedPath {
  const slashed = name.replace(/\\/g, '/');
  if (slashed.startsWith('/')) return { ok: false, problem: 'absolute path' };
  if (/^[a-zA-Z]:/.test(slashed)) return { ok: false, problem: 'drive letter' };
  const parts = slashed.normalize('NFC').split('/');
  if (parts.includes('..')) return { ok: false, problem: 'parent-folder segment' };
  const segments = parts.filter((part) => part !== '' && part !== '.');
  if (segments.length === 0) return { ok: false, problem: 'empty path' };
  return { ok: true, segments, isDirectory: slashed.endsWith('/') };
}

/** Printable form of a raw name for error details: never the server path, never raw control bytes. */
export function describeRawName(raw: Buffer): string {
  return [...raw].map((b) => (b >= 0x20 && b < 0x7f ? String.fromCharCode(b) : `\\x${b.toString(16).padStart(2, '0')}`)).join('');
}

/** Label for details: the decoded name when there is one, else the raw bytes, both escaped. */
export function nameLabel(name: DecodedName, raw: Buffer): string {
  if (name.ok) return describeName(name.name);
  return name.text !== undefined ? describeName(name.text) : describeRawName(raw);
}

/** As above for decoded names: shows bidi and control characters as escapes so the detail cannot mislead. */
export function describeName(name: string): string {
  return name.replace(
    /[\u0000-\u001f\u007f-\u009f\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069]/gu,
    (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`,
  );
}
