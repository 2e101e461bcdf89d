/** Builders for the name and content-mix archives of docs/threats.md checks 20-24. */
import { deflatedEntry, writeRawZip } from './raw-zip-writer.js';
import type { HostileArchive } from './hostile-archives.js';
import { wellFormedZip } from './well-formed-zip.js';

const UTF8 = 0x800;
const index = deflatedEntry('docs/index.md', '# Welcome\n');

/** Bit 11 clear and byte 0x81, which code page 437 maps to U+00FC "ü" (IBM CP437 table). */
export function cp437Name(): HostileArchive {
  const name = Buffer.concat([Buffer.from('docs/'), Buffer.from([0x81]), Buffer.from('ber.md')]);
  return { check: 20, label: 'CP437 name docs/\\x81ber.md', bytes: writeRawZip([index, deflatedEntry(name, '# Über\n')]), code: null };
}

export function badNames(): HostileArchive[] {
  const named = (label: string, name: Buffer | string, flags = UTF8): HostileArchive => ({
    check: 20,
    label,
    bytes: writeRawZip([index, deflatedEntry(typeof name === 'string' ? Buffer.from(name) : name, '# x\n', { flags })]),
    code: 'ARCHIVE_BAD_NAME',
  });
  return [
    named('bit 11 set, invalid UTF-8', Buffer.from([0x64, 0x2f, 0xc3, 0x28, 0x2e, 0x6d, 0x64])),
    named('NUL in a name', 'docs/a\u0000b.md'),
    named('C0 control in a name', 'docs/a\u0001.md'),
    named('DEL in a name', 'docs/a\u007f.md'),
    named('U+202E right-to-left override', 'docs/evil\u202edm.exe.md'),
    named('C0 control in a CP437 name', Buffer.from('docs/tab\tname.md'), 0),
  ];
}

export function duplicates(): HostileArchive {
  const entries = [
    index,
    deflatedEntry('docs/same.md', '# one\n'),
    deflatedEntry('docs/same.md', '# two\n'),
    deflatedEntry('docs/Guide.md', '# Guide\n'),
    deflatedEntry('docs/guide.md', '# guide\n'),
    deflatedEntry('docs/caf\u00e9.md', '# NFC\n', { flags: UTF8 }),
    deflatedEntry('docs/cafe\u0301.md', '# NFD\n', { flags: UTF8 }),
  ];
  return { check: 21, label: 'duplicates: exact, case, NFC/NFD', bytes: writeRawZip(entries), code: 'ARCHIVE_DUPLICATE_PATH' };
}

export function deepAndLong(): HostileArchive[] {
  const deep = `${'d/'.repeat(199)}page.md`;
  const longPath = `${Array.from({ length: 20 }, () => 'x'.repeat(200)).join('/')}/page.md`;
  const longSegment = `docs/${'s'.repeat(300)}.md`;
  const one = (label: string, name: string, code: string): HostileArchive => ({
    check: 22,
    label,
    bytes: writeRawZip([index, deflatedEntry(name, '# x\n')]),
    code,
  });
  return [
    one('depth 200', deep, 'ARCHIVE_PATH_TOO_DEEP'),
    one('4 KiB path', longPath, 'ARCHIVE_PATH_TOO_LONG'),
    one('300-byte segment', longSegment, 'ARCHIVE_PATH_TOO_LONG'),
  ];
}

/** Accepted: the page is imported, the rest listed as assets or ignored, nothing opened or run. */
export async function mixedContent(): Promise<HostileArchive> {
  const inner = await wellFormedZip({ 'inner/page.md': '# inside\n' });
  const bytes = await wellFormedZip({
    'site/index.md': '# Home\n',
    'site/inner.zip': inner,
    'site/img/logo.png': Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    'site/tools/setup.exe': Buffer.from('MZ\x90\x00'),
    '__MACOSX/site/._index.md': Buffer.from([0, 5, 22, 7]),
    'site/.DS_Store': Buffer.from([0, 0, 0, 1]),
  });
  return { check: 23, label: 'inner zip, image, exe', bytes, code: null };
}

export async function emptyArchives(): Promise<HostileArchive[]> {
  return [
    { check: 24, label: 'empty archive (end record only)', bytes: writeRawZip([]), code: 'ARCHIVE_EMPTY' },
    { check: 24, label: 'no Markdown files', bytes: await wellFormedZip({ 'a.txt': 'text', 'b.png': 'png' }), code: 'ARCHIVE_EMPTY' },
  ];
}
