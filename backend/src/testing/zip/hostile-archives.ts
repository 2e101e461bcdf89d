/**
 * Builders for the archives of docs/threats.md checks 5-24 (bombs live in zip-bombs.ts). Each returns the
 * bytes and the code the archive reader must answer with; `code: null` means the archive must be accepted.
 * Reused later by the HTTP-level tests, so every builder is deterministic.
 */
import { deflatedEntry, storedEntry, writeRawZip, type RawEntry } from './raw-zip-writer.js';
import { wellFormedZip } from './well-formed-zip.js';

export interface HostileArchive {
  check: number;
  label: string;
  bytes: Buffer;
  code: string | null;
  /** Passes inspection; the error appears while pages are read (checks 7 and 12). */
  failsOnRead?: boolean;
}

export { wellFormedZip } from './well-formed-zip.js';
export * from './zip-bombs.js';
export * from './hostile-names.js';

const index = deflatedEntry('docs/index.md', '# Welcome\n\nSee [guide](guide.md).\n');
// PNG signature, ISO/IEC 15948 (PNG) section 5.2; PDF header, ISO 32000-1 section 7.5.2.
const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13, 0x49, 0x48, 0x44, 0x52]);
const UNIX_SYMLINK = (0o120777 << 16) >>> 0;

export async function notZip(): Promise<HostileArchive[]> {
  const zip = await wellFormedZip({ 'docs/index.md': '# Hi\n' });
  return [
    { check: 5, label: 'PNG renamed .zip', bytes: PNG_SIGNATURE, code: 'ARCHIVE_NOT_ZIP' },
    { check: 5, label: 'PDF renamed .zip', bytes: Buffer.from('%PDF-1.7\n%\xe2\xe3\xcf\xd3\n1 0 obj\n'), code: 'ARCHIVE_NOT_ZIP' },
    { check: 5, label: 'text renamed .zip', bytes: Buffer.from('# Just Markdown\n'), code: 'ARCHIVE_NOT_ZIP' },
    { check: 5, label: 'ZIP appended to a PNG', bytes: Buffer.concat([PNG_SIGNATURE, zip]), code: 'ARCHIVE_NOT_ZIP' },
    { check: 5, label: 'zero-byte file', bytes: Buffer.alloc(0), code: 'ARCHIVE_NOT_ZIP' },
  ];
}

export async function truncated(): Promise<HostileArchive[]> {
  const zip = await wellFormedZip({ 'docs/index.md': '# Hi\n'.repeat(200), 'docs/guide.md': '# Guide\n'.repeat(200) });
  return [
    { check: 6, label: 'first 60% of a valid archive', bytes: zip.subarray(0, Math.floor(zip.length * 0.6)), code: 'ARCHIVE_CORRUPT' },
    { check: 6, label: 'end of central directory cut', bytes: zip.subarray(0, zip.length - 10), code: 'ARCHIVE_CORRUPT' },
  ];
}

export function badDeflate(): HostileArchive {
  // 0x07: BFINAL=1 with block type 3, which RFC 1951 section 3.2.3 reserves as an error.
  const broken = deflatedEntry('docs/guide.md', '# Guide\n'.repeat(50));
  broken.data = Buffer.concat([Buffer.from([0x07]), broken.data!.subarray(1)]);
  return { check: 7, label: 'corrupted deflate bytes', bytes: writeRawZip([index, broken]), code: 'ARCHIVE_CORRUPT', failsOnRead: true };
}

export function badCrc(): HostileArchive {
  const wrong = deflatedEntry('docs/guide.md', '# Guide\n', { crc32: 0xdeadbeef });
  return {
    check: 7,
    label: 'wrong CRC-32 in the central directory',
    bytes: writeRawZip([index, wrong]),
    code: 'ARCHIVE_CORRUPT',
    failsOnRead: true,
  };
}

export const ZIP_SLIP_NAMES = ['../x.md', '../../outside/escape.md', '/abs.md', 'C:/x.md', 'a\\..\\..\\x.md', 'a/./../../x.md'];

export function zipSlip(): HostileArchive {
  const entries = [index, ...ZIP_SLIP_NAMES.map((name) => deflatedEntry(name, '# escaped\n'))];
  return { check: 8, label: 'zip slip names', bytes: writeRawZip(entries), code: 'ARCHIVE_UNSAFE_PATH' };
}

export function symlinks(): HostileArchive {
  const link = (name: string, target: string): RawEntry =>
    storedEntry(name, target, { externalAttributes: UNIX_SYMLINK, versionMadeBy: 0x031e });
  const entries = [index, link('docs/secret.md', '/outside/secret'), link('docs/up.md', '../../..')];
  return { check: 9, label: 'symlink entries', bytes: writeRawZip(entries), code: 'ARCHIVE_SYMLINK' };
}

export function encrypted(): HostileArchive[] {
  const zipCrypto = deflatedEntry('docs/secret.md', Buffer.alloc(64, 7), { flags: 0x1 });
  // AES extra field 0x9901 (WinZip AE-x specification): version 2, vendor "AE", strength 3, real method 8.
  const aesField = Buffer.from([0x01, 0x99, 7, 0, 2, 0, 0x41, 0x45, 3, 8, 0]);
  const aes = deflatedEntry('docs/aes.md', Buffer.alloc(64, 9), { flags: 0x1, method: 99, extraField: aesField });
  return [
    { check: 17, label: 'ZipCrypto (flag bit 0)', bytes: writeRawZip([index, zipCrypto]), code: 'ARCHIVE_ENCRYPTED' },
    { check: 17, label: 'AES (method 99)', bytes: writeRawZip([index, aes]), code: 'ARCHIVE_ENCRYPTED' },
  ];
}

export function unsupportedMethods(): HostileArchive[] {
  return [12, 14, 93].map((method) => ({
    check: 18,
    label: `compression method ${method}`,
    bytes: writeRawZip([index, storedEntry('docs/packed.md', Buffer.alloc(40, 1), { method, uncompressedSize: 400 })]),
    code: 'ARCHIVE_UNSUPPORTED_COMPRESSION',
  }));
}

export async function zip64Small(): Promise<HostileArchive[]> {
  const raw = writeRawZip([{ ...index, zip64: true }, deflatedEntry('docs/guide.md', '# Guide\n', { zip64: true })], {
    zip64EndRecord: true,
  });
  const yazlMade = await wellFormedZip({ 'docs/index.md': '# Welcome\n', 'docs/guide.md': '# Guide\n' }, { zip64: true });
  return [
    { check: 19, label: 'small ZIP64 archive (raw writer)', bytes: raw, code: null },
    { check: 19, label: 'small ZIP64 archive (yazl forceZip64Format)', bytes: yazlMade, code: null },
  ];
}
