/**
 * Bomb-shaped archives for docs/threats.md checks 10-16 and 19. Zeros are deflated in 1 MiB chunks through
 * a streaming deflater, so building the 200 MiB bomb never holds 200 MiB in memory. Deflate's best case is
 * about 1032:1 (D. Fifield, "A better zip bomb", WOOT 2019; figure from memory), so 200 MiB of zeros is
 * roughly 200 KB compressed.
 */
import { once } from 'node:events';
import zlib from 'node:zlib';
import { deflatedEntry, writeRawZip, type RawEntry } from './raw-zip-writer.js';
import type { HostileArchive } from './hostile-archives.js';

const MIB = 1024 * 1024;
const zeroCache = new Map<number, Promise<{ data: Buffer; crc32: number }>>();

/** Raw-deflated zeros of `size` bytes and their CRC-32, computed chunk by chunk (memoised per size). */
export function deflatedZeros(size: number): Promise<{ data: Buffer; crc32: number }> {
  let cached = zeroCache.get(size);
  if (!cached) {
    cached = deflateZerosInChunks(size);
    zeroCache.set(size, cached);
  }
  return cached;
}

async function deflateZerosInChunks(size: number): Promise<{ data: Buffer; crc32: number }> {
  const deflater = zlib.createDeflateRaw({ level: 9 });
  const output: Buffer[] = [];
  deflater.on('data', (chunk: Buffer) => output.push(chunk));
  const zeros = Buffer.alloc(MIB);
  let crc = 0;
  for (let written = 0; written < size; written += MIB) {
    const part = zeros.subarray(0, Math.min(MIB, size - written));
    crc = zlib.crc32(part, crc);
    if (!deflater.write(part)) await once(deflater, 'drain');
  }
  deflater.end();
  await once(deflater, 'end');
  return { data: Buffer.concat(output), crc32: crc };
}

async function zeroEntry(name: string, size: number, extra: Partial<RawEntry> = {}): Promise<RawEntry> {
  const { data, crc32 } = await deflatedZeros(size);
  return { name, data, method: 8, crc32, compressedSize: data.length, uncompressedSize: size, ...extra };
}

const page = deflatedEntry('docs/index.md', '# Welcome\n\nSee [guide](guide.md).\n');

export async function honestBomb(): Promise<HostileArchive> {
  const bytes = writeRawZip([page, await zeroEntry('docs/zeros.md', 200 * MIB)]);
  return { check: 10, label: 'honest bomb: 200 MiB of zeros declared correctly', bytes, code: 'ARCHIVE_ENTRY_TOO_LARGE' };
}

export async function ratioBomb(): Promise<HostileArchive> {
  const bytes = writeRawZip([page, await zeroEntry('docs/flat.md', 4 * MIB)]);
  return { check: 11, label: 'ratio bomb: 4 MiB to ~4 KiB, under the size cap', bytes, code: 'ARCHIVE_RATIO_EXCEEDED' };
}

/** Passes inspection (declares 1 KiB); only the reader's byte counter can stop it. */
export async function lyingSizes(): Promise<HostileArchive> {
  const liar = await zeroEntry('docs/liar.md', 100 * MIB, { uncompressedSize: 1024 });
  return {
    check: 12,
    label: 'lying sizes: declares 1 KiB, inflates to 100 MiB',
    bytes: writeRawZip([page, liar]),
    code: 'ARCHIVE_CORRUPT',
    failsOnRead: true,
  };
}

/** 500 central records all pointing at one local entry (the overlap of Fifield's construction, unquoted). */
export async function overlapBomb(): Promise<HostileArchive> {
  const shared = await zeroEntry('docs/shared.md', 10 * MIB);
  const copies = Array.from({ length: 499 }, (_, i) => ({ ...shared, name: `docs/copy-${i}.md`, writeLocal: false, localHeaderOffset: 0 }));
  return {
    check: 13,
    label: 'overlap bomb: 500 records on one local entry',
    bytes: writeRawZip([shared, ...copies, page]),
    code: 'ARCHIVE_OVERLAPPING_ENTRIES',
  };
}

/**
 * 60 honest 4 MiB pages that each compress only ~40:1 (100 KiB of incompressible bytes then zeros), so
 * neither ratio rule fires and the total (240 MiB) is the only violation. The file is about 6 MiB.
 */
export async function totalCap(): Promise<HostileArchive> {
  const noise = xorshiftBytes(100 * 1024);
  const content = Buffer.concat([noise, Buffer.alloc(4 * MIB - noise.length)]);
  const template = deflatedEntry('x', content);
  const entries = Array.from({ length: 60 }, (_, i) => ({ ...template, name: `docs/part-${String(i).padStart(2, '0')}.md` }));
  return { check: 14, label: 'total cap: 60 honest 4 MiB entries', bytes: writeRawZip(entries), code: 'ARCHIVE_UNCOMPRESSED_TOO_LARGE' };
}

/** Deterministic incompressible bytes: Marsaglia's xorshift32 (J. Stat. Software 8(14), 2003), shifts 13/17/5. */
function xorshiftBytes(length: number): Buffer {
  const out = Buffer.alloc(length);
  let state = 0x9e3779b9;
  for (let i = 0; i < length; i += 1) {
    state ^= state << 13;
    state ^= state >>> 17;
    state ^= state << 5;
    out[i] = state & 0xff;
  }
  return out;
}

export function manyEntries(count = 50_000): HostileArchive {
  const entries: RawEntry[] = [];
  for (let i = 0; i < count; i += 1) entries.push({ name: `p/${i}.md`, data: Buffer.from('x'), method: 0 });
  return { check: 15, label: `${count} one-byte entries`, bytes: writeRawZip(entries), code: 'ARCHIVE_TOO_MANY_ENTRIES' };
}

/** 200 MB (decimal) of Markdown, deflated: fits a 50 MiB upload, refused by declared size. */
export async function hugeMarkdown(): Promise<HostileArchive> {
  const bytes = writeRawZip([page, await zeroEntry('docs/huge.md', 200_000_000)]);
  return { check: 16, label: 'one 200 MB Markdown file, deflated', bytes, code: 'ARCHIVE_ENTRY_TOO_LARGE' };
}

/** A ZIP64 entry declaring 2^40 bytes (1 TiB) over 100 KiB of real data. */
export async function zip64Huge(): Promise<HostileArchive> {
  const big = await zeroEntry('docs/tera.md', 100 * 1024, { uncompressedSize: 2 ** 40, zip64: true });
  return {
    check: 19,
    label: 'ZIP64 entry declaring 2^40 bytes',
    bytes: writeRawZip([page, big], { zip64EndRecord: true }),
    code: 'ARCHIVE_ENTRY_TOO_LARGE',
  };
}
