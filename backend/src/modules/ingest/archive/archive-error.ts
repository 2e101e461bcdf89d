/**
 * The one error type of the archive readers. Codes and sentences follow docs/threats.md checks 5-24; the
 * HTTP layer maps it to `{ statusCode, code, message, details }`. Details name entries, never server paths.
 */

export const MAX_DETAILS = 20;

export type ArchiveErrorCode =
  | 'ARCHIVE_NOT_ZIP'
  | 'ARCHIVE_CORRUPT'
  | 'ARCHIVE_TOO_MANY_ENTRIES'
  | 'ARCHIVE_UNSAFE_PATH'
  | 'ARCHIVE_SYMLINK'
  | 'ARCHIVE_ENCRYPTED'
  | 'ARCHIVE_UNSUPPORTED_COMPRESSION'
  | 'ARCHIVE_ENTRY_TOO_LARGE'
  | 'ARCHIVE_UNCOMPRESSED_TOO_LARGE'
  | 'ARCHIVE_RATIO_EXCEEDED'
  | 'ARCHIVE_OVERLAPPING_ENTRIES'
  | 'ARCHIVE_BAD_NAME'
  | 'ARCHIVE_DUPLICATE_PATH'
  | 'ARCHIVE_PATH_TOO_LONG'
  | 'ARCHIVE_PATH_TOO_DEEP'
  | 'ARCHIVE_EMPTY';

export class ArchiveError extends Error {
  constructor(
    readonly code: string,
    readonly status: 415 | 422,
    message: string,
    readonly details: string[] = [],
  ) {
    super(message);
    this.name = 'ArchiveError';
  }
}

const SENTENCES: Record<ArchiveErrorCode, string> = {
  ARCHIVE_NOT_ZIP: 'Only .zip archives are accepted.',
  ARCHIVE_CORRUPT: 'The archive is damaged or incomplete.',
  ARCHIVE_TOO_MANY_ENTRIES: 'The archive has too many entries.',
  ARCHIVE_UNSAFE_PATH: 'The archive contains paths that point outside its folder.',
  ARCHIVE_SYMLINK: 'The archive contains symbolic links, which are not accepted.',
  ARCHIVE_ENCRYPTED: 'The archive contains encrypted entries; upload an archive without a password.',
  ARCHIVE_UNSUPPORTED_COMPRESSION: 'The archive uses a compression method other than deflate or store.',
  ARCHIVE_ENTRY_TOO_LARGE: 'A file in the archive is larger than the limit.',
  ARCHIVE_UNCOMPRESSED_TOO_LARGE: 'The archive unpacks to more than the total size limit.',
  ARCHIVE_RATIO_EXCEEDED: 'The archive compresses suspiciously well and was refused as a possible zip bomb.',
  ARCHIVE_OVERLAPPING_ENTRIES: 'Entries of the archive overlap each other, which only zip bombs do.',
  ARCHIVE_BAD_NAME: 'The archive contains file names that are not valid text.',
  ARCHIVE_DUPLICATE_PATH: 'The archive contains the same path more than once.',
  ARCHIVE_PATH_TOO_LONG: 'The archive contains paths or names that are too long.',
  ARCHIVE_PATH_TOO_DEEP: 'The archive contains folders nested too deeply.',
  ARCHIVE_EMPTY: 'No Markdown files found.',
};

export function archiveError(code: ArchiveErrorCode, details: string[] = [], message?: string): ArchiveError {
  const status = code === 'ARCHIVE_NOT_ZIP' ? 415 : 422;
  return new ArchiveError(code, status, message ?? SENTENCES[code], details.slice(0, MAX_DETAILS));
}

const MIB = 1024 * 1024;

/**
 * Exact binary multiples read as MiB/KiB (limits are set that way); anything else reads in decimal units,
 * so a 200,000,000-byte file is "200 MB" next to "the limit is 5 MiB" (the wording of check 16).
 */
export function formatBytes(bytes: number): string {
  const binary: Array<[number, string]> = [
    [1024 * 1024 * MIB, 'TiB'],
    [1024 * MIB, 'GiB'],
    [MIB, 'MiB'],
    [1024, 'KiB'],
  ];
  for (const [size, unit] of binary) {
    if (bytes >= size && bytes % size === 0) return `${bytes / size} ${unit}`;
  }
  const units: Array<[number, string]> = [
    [1e12, 'TB'],
    [1e9, 'GB'],
    [1e6, 'MB'],
    [1e3, 'kB'],
  ];
  for (const [size, unit] of units) {
    if (bytes >= size) return `${Number((bytes / size).toFixed(1))} ${unit}`;
  }
  return `${bytes} bytes`;
}
