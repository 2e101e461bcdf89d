/**
 * Pass 2 of docs/threats.md, "Import pipeline": streams the page entries of an inspected archive. Assets are never read.
 * Each entry goes through a byte counter that stops at the declared size (lying sizes stop within one
 * inflate chunk of it) and a CRC-32 check, because yauzl 3.4 does not check CRCs (its README, "No CRC-32
 * Checking"). CRC-32 as in APPNOTE.TXT 4.4.7, computed with Node's zlib.crc32.
 */
import zlib from 'node:zlib';
import type { Readable } from 'node:stream';
import type yauzl from 'yauzl';
import { archiveError, ArchiveError } from './archive-error.js';
import type { ArchiveEntryInfo, ArchiveLimits, ArchivePlan, PageBytes, ReadMeter } from './archive-types.js';
import { normaliseEntryPath, decodeEntryName } from './entry-name.js';
import { centralDirectory, openZip } from './zip-file.js';

export async function* readPageEntries(
  file: string,
  plan: ArchivePlan,
  limits: ArchiveLimits,
  meter?: ReadMeter,
): AsyncGenerator<PageBytes> {
  const pending = new Map(plan.entries.filter((e) => e.kind === 'page').map((e) => [e.path, e] as const));
  const zip = await openZip(file);
  try {
    if (zip.entryCount > limits.maxEntries) throw archiveError('ARCHIVE_TOO_MANY_ENTRIES');
    for await (const entry of centralDirectory(zip)) {
      const paths = entryPaths(entry, plan.topFolderStripped);
      const info = paths === null ? undefined : pending.get(paths.planPath);
      if (!info || !paths) continue;
      pending.delete(info.path);
      const bytes = await readEntry(zip, entry, { ...info, path: paths.archivePath }, limits, meter);
      yield { path: info.path, bytes };
    }
    if (pending.size > 0) throw corrupt([...pending.keys()][0], 'is missing from the archive');
  } finally {
    zip.close();
  }
}

/**
 * Same decoding, normalisation and top-folder rule as inspection, so paths match the plan exactly; the
 * archive path (before stripping) names the entry in errors, as the uploader sees it.
 */
function entryPaths(entry: yauzl.Entry, top: string | null): { planPath: string; archivePath: string } | null {
  const name = decodeEntryName(entry.fileNameRaw, entry.generalPurposeBitFlag);
  if (!name.ok) return null;
  const normalised = normaliseEntryPath(name.name);
  if (!normalised.ok || normalised.isDirectory) return null;
  const { segments } = normalised;
  const planPath = (top !== null && segments[0] === top ? segments.slice(1) : segments).join('/');
  return { planPath, archivePath: segments.join('/') };
}

async function readEntry(
  zip: yauzl.ZipFile,
  entry: yauzl.Entry,
  info: ArchiveEntryInfo,
  limits: ArchiveLimits,
  meter?: ReadMeter,
): Promise<Buffer> {
  if (entry.uncompressedSize !== info.size || info.size > limits.maxEntryBytes) {
    throw corrupt(info.path, 'does not match the inspected archive');
  }
  let stream: Readable;
  try {
    stream = await zip.openReadStreamPromise(entry);
  } catch (error) {
    throw corrupt(info.path, describeReadError(error));
  }
  if (meter) meter.entriesOpened += 1;
  const chunks: Buffer[] = [];
  let count = 0;
  let crc = 0;
  try {
    for await (const chunk of stream as AsyncIterable<Buffer>) {
      count += chunk.length;
      if (meter) meter.bytesRead += chunk.length;
      if (count > info.size) throw corrupt(info.path, 'inflates past its declared size');
      crc = zlib.crc32(chunk, crc);
      chunks.push(chunk);
    }
  } catch (error) {
    throw error instanceof ArchiveError ? error : corrupt(info.path, describeReadError(error));
  } finally {
    stream.destroy();
  }
  if (count !== info.size) throw corrupt(info.path, 'is shorter than its declared size');
  if (crc >>> 0 !== entry.crc32 >>> 0) throw corrupt(info.path, 'fails its CRC-32 check');
  return Buffer.concat(chunks, count);
}

function corrupt(path: string, reason: string): ArchiveError {
  return archiveError('ARCHIVE_CORRUPT', [`${path} ${reason}`]);
}

function describeReadError(error: unknown): string {
  const message = String((error as Error)?.message ?? error);
  if ((error as { code?: string })?.code?.startsWith('Z_')) return `has invalid compressed data (${message})`;
  if (/too many bytes/.test(message)) return 'inflates past its declared size';
  if (/not enough bytes/.test(message)) return 'is shorter than its declared size';
  if (/local file header|overflows file bounds|EOF/.test(message)) return 'has a damaged local header or is cut off';
  return 'cannot be read';
}
