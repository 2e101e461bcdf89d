/**
 * yauzl access shared by inspection and reading. Options, decided against docs/threats.md, "Import pipeline" step 3:
 * - lazyEntries: true      one record at a time, so a 50,000-entry directory is never held as events;
 * - decodeStrings: false   raw name bytes, so bit 11 / CP437 / invalid UTF-8 are decided in entry-name.ts
 *                          (with `true`, yauzl replaces invalid UTF-8 by U+FFFD and honours 0x7075 fields);
 * - validateEntrySizes: true  yauzl refuses stored entries whose two sizes differ and counts inflated bytes;
 * - strictFileNames: false    names are judged by us (with decodeStrings false yauzl does not check them);
 * - autoClose: false       the file stays open across the metadata pass and is closed in `finally`.
 */
import { open as openFile } from 'node:fs/promises';
import yauzl from 'yauzl';
import { archiveError } from './archive-error.js';
import { decodeEntryName, nameLabel } from './entry-name.js';
import type { EntryRecord } from './build-plan.js';

const OPEN_OPTIONS: yauzl.Options = {
  lazyEntries: true,
  decodeStrings: false,
  validateEntrySizes: true,
  strictFileNames: false,
  autoClose: false,
};

const LOCAL_HEADER_BYTES = 30;
const S_IFMT = 0o170000;
const S_IFLNK = 0o120000;
const ENCRYPTED_FLAG = 0x1;

/** `PK\x03\x04` (local header) or `PK\x05\x06` (an empty archive's end record); anything else is not a ZIP. */
export async function assertZipMagic(file: string): Promise<void> {
  const handle = await openFile(file, 'r');
  try {
    const head = Buffer.alloc(4);
    const { bytesRead } = await handle.read(head, 0, 4, 0);
    const magic = head.subarray(0, bytesRead).toString('latin1');
    if (magic !== 'PK\x03\x04' && magic !== 'PK\x05\x06') throw archiveError('ARCHIVE_NOT_ZIP');
  } finally {
    await handle.close();
  }
}

export async function openZip(file: string): Promise<yauzl.ZipFile> {
  try {
    return await yauzl.openPromise(file, OPEN_OPTIONS);
  } catch {
    throw archiveError('ARCHIVE_CORRUPT');
  }
}

/** Iterates central-directory records; a damaged directory becomes ARCHIVE_CORRUPT (or _ENCRYPTED). */
export async function* centralDirectory(zip: yauzl.ZipFile): AsyncGenerator<yauzl.Entry> {
  const iterator = zip.eachEntry()[Symbol.asyncIterator]();
  for (;;) {
    let step: IteratorResult<yauzl.Entry>;
    try {
      step = await iterator.next();
    } catch (error) {
      // yauzl refuses general-purpose bit 6 (PKWARE strong encryption) before emitting the entry.
      if (/strong encryption/.test(String(error))) throw archiveError('ARCHIVE_ENCRYPTED', ['(entry with strong encryption)']);
      throw archiveError('ARCHIVE_CORRUPT', [`central directory: ${String((error as Error).message ?? error).slice(0, 120)}`]);
    }
    if (step.done) return;
    yield step.value;
  }
}

export function toEntryRecord(entry: yauzl.Entry): EntryRecord {
  const raw = entry.fileNameRaw;
  const name = decodeEntryName(raw, entry.generalPurposeBitFlag);
  const mode = (entry.externalFileAttributes >>> 16) & S_IFMT;
  const start = entry.relativeOffsetOfLocalHeader;
  return {
    label: nameLabel(name, raw),
    name,
    // Checked whatever host wrote the entry: a Unix mode in the high 16 bits is honoured by unzip tools.
    isSymlink: mode === S_IFLNK,
    isEncrypted: (entry.generalPurposeBitFlag & ENCRYPTED_FLAG) !== 0,
    method: entry.compressionMethod,
    size: entry.uncompressedSize,
    compressedSize: entry.compressedSize,
    span: { start, end: start + LOCAL_HEADER_BYTES + entry.fileNameLength + entry.compressedSize },
  };
}
