/**
 * A raw ZIP writer for hostile test archives: every field is settable, nothing is validated, because normal
 * writers refuse `../` names, lying sizes, symlink modes or overlapping entries. Layout per PKWARE
 * APPNOTE.TXT 6.3.10: local file header 4.3.7, central directory header 4.3.12, end of central directory
 * 4.3.16, ZIP64 end record and locator 4.3.14-4.3.15, ZIP64 extended information extra field 4.5.3.
 */
import zlib from 'node:zlib';

export interface RawEntry {
  /** A string is written as UTF-8 bytes; pass a Buffer for exact bytes (CP437, invalid UTF-8). */
  name: string | Buffer;
  /** Bytes written after the local header, already compressed when `method` is 8. */
  data?: Buffer;
  flags?: number;
  method?: number;
  crc32?: number;
  compressedSize?: number;
  uncompressedSize?: number;
  versionMadeBy?: number;
  externalAttributes?: number;
  /** Point the central record at this offset instead of the entry's own local header. */
  localHeaderOffset?: number;
  /** false: central-directory record only, no local header or data (for overlap bombs). */
  writeLocal?: boolean;
  /** Write sizes and offset as 0xFFFFFFFF with a ZIP64 extended information extra field. */
  zip64?: boolean;
  /** Further extra-field bytes (for example the AES 0x9901 field). */
  extraField?: Buffer;
}

export interface RawZipOptions {
  /** Add the ZIP64 end of central directory record and locator. */
  zip64EndRecord?: boolean;
  /** Bytes written before the first local header (a PNG for "ZIP appended to a PNG"). */
  prefix?: Buffer;
}

const MAX32 = 0xffffffff;
const DOS_TIME = 0; // 00:00:00
const DOS_DATE = ((2024 - 1980) << 9) | (1 << 5) | 1; // 2024-01-01

export function storedEntry(name: string | Buffer, content: string | Buffer, extra: Partial<RawEntry> = {}): RawEntry {
  const data = Buffer.from(content);
  return { name, data, method: 0, crc32: zlib.crc32(data), compressedSize: data.length, uncompressedSize: data.length, ...extra };
}

export function deflatedEntry(name: string | Buffer, content: string | Buffer, extra: Partial<RawEntry> = {}): RawEntry {
  const plain = Buffer.from(content);
  const data = zlib.deflateRawSync(plain);
  return { name, data, method: 8, crc32: zlib.crc32(plain), compressedSize: data.length, uncompressedSize: plain.length, ...extra };
}

export function writeRawZip(entries: RawEntry[], options: RawZipOptions = {}): Buffer {
  const parts: Buffer[] = options.prefix ? [options.prefix] : [];
  let offset = options.prefix?.length ?? 0;
  const central: Buffer[] = [];
  for (const entry of entries) {
    const name = typeof entry.name === 'string' ? Buffer.from(entry.name, 'utf8') : entry.name;
    const ownOffset = offset;
    if (entry.writeLocal !== false) {
      const local = localHeader(entry, name);
      parts.push(local, entry.data ?? Buffer.alloc(0));
      offset += local.length + (entry.data?.length ?? 0);
    }
    central.push(centralHeader(entry, name, entry.localHeaderOffset ?? ownOffset));
  }
  const directory = Buffer.concat(central);
  parts.push(directory);
  parts.push(...endRecords(entries.length, directory.length, offset, options.zip64EndRecord === true));
  return Buffer.concat(parts);
}

function sizesOf(entry: RawEntry): { crc: number; compressed: number; uncompressed: number } {
  const length = entry.data?.length ?? 0;
  return {
    crc: entry.crc32 ?? zlib.crc32(entry.data ?? Buffer.alloc(0)),
    compressed: entry.compressedSize ?? length,
    uncompressed: entry.uncompressedSize ?? length,
  };
}

function localHeader(entry: RawEntry, name: Buffer): Buffer {
  const { crc, compressed, uncompressed } = sizesOf(entry);
  const zip64 = entry.zip64 ? zip64Extra([uncompressed, compressed]) : Buffer.alloc(0);
  const extra = Buffer.concat([zip64, entry.extraField ?? Buffer.alloc(0)]);
  const header = Buffer.alloc(30);
  header.writeUInt32LE(0x04034b50, 0);
  header.writeUInt16LE(entry.zip64 ? 45 : 20, 4);
  header.writeUInt16LE(entry.flags ?? 0, 6);
  header.writeUInt16LE(entry.method ?? 0, 8);
  header.writeUInt16LE(DOS_TIME, 10);
  header.writeUInt16LE(DOS_DATE, 12);
  header.writeUInt32LE(crc >>> 0, 14);
  header.writeUInt32LE(entry.zip64 ? MAX32 : compressed, 18);
  header.writeUInt32LE(entry.zip64 ? MAX32 : uncompressed, 22);
  header.writeUInt16LE(name.length, 26);
  header.writeUInt16LE(extra.length, 28);
  return Buffer.concat([header, name, extra]);
}

function centralHeader(entry: RawEntry, name: Buffer, localOffset: number): Buffer {
  const { crc, compressed, uncompressed } = sizesOf(entry);
  const zip64 = entry.zip64 ? zip64Extra([uncompressed, compressed, localOffset]) : Buffer.alloc(0);
  const extra = Buffer.concat([zip64, entry.extraField ?? Buffer.alloc(0)]);
  const header = Buffer.alloc(46);
  header.writeUInt32LE(0x02014b50, 0);
  header.writeUInt16LE(entry.versionMadeBy ?? 0x0314, 4); // Unix host, spec 2.0
  header.writeUInt16LE(entry.zip64 ? 45 : 20, 6);
  header.writeUInt16LE(entry.flags ?? 0, 8);
  header.writeUInt16LE(entry.method ?? 0, 10);
  header.writeUInt16LE(DOS_TIME, 12);
  header.writeUInt16LE(DOS_DATE, 14);
  header.writeUInt32LE(crc >>> 0, 16);
  header.writeUInt32LE(entry.zip64 ? MAX32 : compressed, 20);
  header.writeUInt32LE(entry.zip64 ? MAX32 : uncompressed, 24);
  header.writeUInt16LE(name.length, 28);
  header.writeUInt16LE(extra.length, 30);
  header.writeUInt32LE(entry.externalAttributes ?? (0o100644 << 16) >>> 0, 38);
  header.writeUInt32LE(entry.zip64 ? MAX32 : localOffset, 42);
  return Buffer.concat([header, name, extra]);
}

/** ZIP64 extended information (header id 0x0001), 64-bit values in APPNOTE order. */
function zip64Extra(values: number[]): Buffer {
  const field = Buffer.alloc(4 + 8 * values.length);
  field.writeUInt16LE(0x0001, 0);
  field.writeUInt16LE(8 * values.length, 2);
  values.forEach((value, i) => field.writeBigUInt64LE(BigInt(value), 4 + 8 * i));
  return field;
}

function endRecords(count: number, directorySize: number, directoryOffset: number, zip64: boolean): Buffer[] {
  const records: Buffer[] = [];
  if (zip64) {
    const record = Buffer.alloc(56);
    record.writeUInt32LE(0x06064b50, 0);
    record.writeBigUInt64LE(44n, 4);
    record.writeUInt16LE(45, 12);
    record.writeUInt16LE(45, 14);
    record.writeBigUInt64LE(BigInt(count), 24);
    record.writeBigUInt64LE(BigInt(count), 32);
    record.writeBigUInt64LE(BigInt(directorySize), 40);
    record.writeBigUInt64LE(BigInt(directoryOffset), 48);
    const locator = Buffer.alloc(20);
    locator.writeUInt32LE(0x07064b50, 0);
    locator.writeBigUInt64LE(BigInt(directoryOffset + directorySize), 8);
    locator.writeUInt32LE(1, 16);
    records.push(record, locator);
  }
  const end = Buffer.alloc(22);
  end.writeUInt32LE(0x06054b50, 0);
  end.writeUInt16LE(zip64 ? 0xffff : count, 8);
  end.writeUInt16LE(zip64 ? 0xffff : count, 10);
  end.writeUInt32LE(zip64 ? MAX32 : directorySize, 12);
  end.writeUInt32LE(zip64 ? MAX32 : directoryOffset, 16);
  records.push(end);
  return records;
}
