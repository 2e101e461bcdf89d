/**
 * Collects every violation of one metadata pass, grouped by code, and throws the most severe kind with up
 * to 20 offending entries. Order: names that cannot be handled at all, then escape attempts, then content
 * we cannot read safely, then bombs (overlap before size so an overlap bomb is named as one, per-entry size
 * before ratio so the honest 200 MiB bomb reads as "too large"), then the tidy-up rules.
 */
import { archiveError, MAX_DETAILS, type ArchiveErrorCode } from './archive-error.js';

const SEVERITY: ArchiveErrorCode[] = [
  'ARCHIVE_BAD_NAME',
  'ARCHIVE_UNSAFE_PATH',
  'ARCHIVE_SYMLINK',
  'ARCHIVE_ENCRYPTED',
  'ARCHIVE_UNSUPPORTED_COMPRESSION',
  'ARCHIVE_OVERLAPPING_ENTRIES',
  'ARCHIVE_ENTRY_TOO_LARGE',
  'ARCHIVE_RATIO_EXCEEDED',
  'ARCHIVE_UNCOMPRESSED_TOO_LARGE',
  'ARCHIVE_PATH_TOO_DEEP',
  'ARCHIVE_PATH_TOO_LONG',
  'ARCHIVE_DUPLICATE_PATH',
];

export class Violations {
  private readonly byCode = new Map<ArchiveErrorCode, string[]>();
  private readonly counts = new Map<ArchiveErrorCode, number>();

  add(code: ArchiveErrorCode, detail: string): void {
    const list = this.byCode.get(code) ?? [];
    if (list.length < MAX_DETAILS) list.push(detail);
    this.byCode.set(code, list);
    this.counts.set(code, (this.counts.get(code) ?? 0) + 1);
  }

  has(code: ArchiveErrorCode): boolean {
    return this.byCode.has(code);
  }

  /** Throws the most severe kind found; the message says how many entries were affected in all. */
  throwIfAny(): void {
    for (const code of SEVERITY) {
      const details = this.byCode.get(code);
      if (!details) continue;
      const total = this.counts.get(code) ?? details.length;
      const error = archiveError(code, details);
      if (total <= details.length) throw error;
      throw archiveError(code, details, `${error.message} ${total} entries are affected; the first ${details.length} are listed.`);
    }
  }
}
