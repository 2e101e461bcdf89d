/**
 * Turns the metadata of every entry (central-directory records, or a folder walk) into an ArchivePlan, or
 * throws one ArchiveError naming all offenders of the most severe kind. Pure: no I/O, nothing inflated.
 * Checks follow docs/threats.md, "Limits" and checks 8-24; the overlap rule follows D. Fifield, "A better
 * zip bomb" (WOOT '19, bamsoftware.com/hacks/zipbomb): entries whose local data ranges overlap are refused.
 */
import { archiveError, formatBytes } from './archive-error.js';
import type { ArchiveEntryInfo, ArchiveLimits, ArchivePlan, InspectOptions } from './archive-types.js';
import { classifyEntry, makeKindRules } from './entry-kind.js';
import { describeName, normaliseEntryPath, type DecodedName } from './entry-name.js';
import { Violations } from './violations.js';

export interface EntryRecord {
  /** Printable name for error details (escaped when the name could not be decoded). */
  label: string;
  name: DecodedName;
  isSymlink: boolean;
  isEncrypted: boolean;
  /** ZIP compression method; folders report 0. */
  method: number;
  size: number;
  compressedSize: number;
  /** Bytes the entry occupies in the file at least: local header, name and data. */
  span?: { start: number; end: number };
  /** Set by the folder walk for sockets, FIFOs and devices: listed, never read. */
  ignoredReason?: string;
}

interface ParsedEntry {
  record: EntryRecord;
  segments: string[];
  path: string;
  isDirectory: boolean;
}

const AES_METHOD = 99;

export function buildPlan(records: EntryRecord[], options: InspectOptions): ArchivePlan {
  const { limits } = options;
  const violations = new Violations();
  const parsed = records.flatMap((record) => parseEntry(record, limits, violations));
  findOverlaps(records, violations);
  const files = parsed.filter((entry) => !entry.isDirectory);
  findDuplicates(files, violations);
  const totalBytes = checkTotals(records, limits, violations);
  const plan = classify(files, options, totalBytes, violations);
  violations.throwIfAny();
  if (!plan.entries.some((entry) => entry.kind === 'page')) throw archiveError('ARCHIVE_EMPTY');
  return plan;
}

function parseEntry(record: EntryRecord, limits: ArchiveLimits, violations: Violations): ParsedEntry[] {
  if (!record.name.ok) {
    violations.add('ARCHIVE_BAD_NAME', `${record.label}: ${record.name.problem}`);
    return [];
  }
  const normalised = normaliseEntryPath(record.name.name);
  if (!normalised.ok) {
    violations.add('ARCHIVE_UNSAFE_PATH', `${record.label}: ${normalised.problem}`);
    return [];
  }
  const path = normalised.segments.join('/');
  if (record.isSymlink) violations.add('ARCHIVE_SYMLINK', path);
  if (record.isEncrypted || record.method === AES_METHOD) violations.add('ARCHIVE_ENCRYPTED', path);
  else if (record.method !== 0 && record.method !== 8) {
    violations.add('ARCHIVE_UNSUPPORTED_COMPRESSION', `${path} (method ${record.method})`);
  }
  checkPathShape(normalised.segments, path, limits, violations);
  return [{ record, segments: normalised.segments, path, isDirectory: normalised.isDirectory }];
}

function checkPathShape(segments: string[], path: string, limits: ArchiveLimits, violations: Violations): void {
  const shown = path.length > 120 ? `${path.slice(0, 117)}...` : path;
  if (segments.length > limits.maxDepth) {
    violations.add('ARCHIVE_PATH_TOO_DEEP', `${shown} is ${segments.length} levels deep; the limit is ${limits.maxDepth}`);
  }
  const pathBytes = Buffer.byteLength(path);
  if (pathBytes > limits.maxPathBytes) {
    violations.add('ARCHIVE_PATH_TOO_LONG', `${shown} is ${pathBytes} bytes long; the limit is ${limits.maxPathBytes}`);
  }
  const longest = Math.max(...segments.map((segment) => Buffer.byteLength(segment)));
  if (longest > limits.maxSegmentBytes) {
    violations.add('ARCHIVE_PATH_TOO_LONG', `${shown} has a ${longest}-byte name; the limit is ${limits.maxSegmentBytes}`);
  }
}

function findOverlaps(records: EntryRecord[], violations: Violations): void {
  const placed = records.filter((record) => record.span).sort((a, b) => a.span!.start - b.span!.start);
  for (let i = 1; i < placed.length; i += 1) {
    const previous = placed[i - 1];
    if (placed[i].span!.start < previous.span!.end) {
      violations.add('ARCHIVE_OVERLAPPING_ENTRIES', `${placed[i].label} overlaps ${previous.label}`);
    }
  }
}

/** Case-folded, NFC: two names that one file system (macOS, Windows) would store as one file collide. */
function findDuplicates(files: ParsedEntry[], violations: Violations): void {
  const seen = new Map<string, string>();
  for (const file of files) {
    const key = file.path.toLowerCase();
    const first = seen.get(key);
    if (first === undefined) seen.set(key, file.record.label);
    else violations.add('ARCHIVE_DUPLICATE_PATH', `${describeName(first)} <-> ${describeName(file.record.label)}`);
  }
}

function checkTotals(records: EntryRecord[], limits: ArchiveLimits, violations: Violations): number {
  let total = 0;
  let compressed = 0;
  for (const record of records) {
    total += record.size;
    compressed += record.compressedSize;
    const ratio = record.size / Math.max(record.compressedSize, 1);
    if (record.size > limits.ratioMinBytes && ratio > limits.maxEntryRatio) {
      violations.add('ARCHIVE_RATIO_EXCEEDED', `${record.label} expands ${Math.round(ratio)}:1; the limit is ${limits.maxEntryRatio}:1`);
    }
  }
  const overall = total / Math.max(compressed, 1);
  if (total > limits.ratioMinBytes && overall > limits.maxTotalRatio) {
    violations.add(
      'ARCHIVE_RATIO_EXCEEDED',
      `the archive expands ${Math.round(overall)}:1 overall; the limit is ${limits.maxTotalRatio}:1`,
    );
  }
  if (total > limits.maxTotalBytes) {
    violations.add(
      'ARCHIVE_UNCOMPRESSED_TOO_LARGE',
      `the archive unpacks to ${formatBytes(total)}; the limit is ${formatBytes(limits.maxTotalBytes)}`,
    );
  }
  return total;
}

/** Details name the path as it is in the archive (before stripping), which is what the uploader sees. */
function checkEntrySize(entry: ArchiveEntryInfo, archivePath: string, limits: ArchiveLimits, violations: Violations): void {
  const limit = entry.kind === 'page' ? limits.maxEntryBytes : limits.maxAssetEntryBytes;
  if (limit !== undefined && entry.size > limit) {
    violations.add('ARCHIVE_ENTRY_TOO_LARGE', `${archivePath} is ${formatBytes(entry.size)}; the limit is ${formatBytes(limit)}`);
  }
}

function classify(files: ParsedEntry[], options: InspectOptions, totalBytes: number, violations: Violations): ArchivePlan {
  const top = options.stripTopFolder ? sharedTopFolder(files) : null;
  const rules = makeKindRules(options.pageExtensions, options.ignoreGlobs);
  const plan: ArchivePlan = { entries: [], ignored: [], topFolderStripped: top, totalBytes };
  for (const file of files) {
    const path = top !== null && file.segments[0] === top ? file.segments.slice(1).join('/') : file.path;
    const forced = file.record.ignoredReason;
    const kind = forced ? { kind: 'ignored' as const, reason: forced } : classifyEntry(file.segments, path, rules);
    const info: ArchiveEntryInfo = { path, size: file.record.size, compressedSize: file.record.compressedSize, kind: kind.kind };
    if (kind.kind === 'ignored') plan.ignored.push({ ...info, ignoredReason: kind.reason });
    else {
      plan.entries.push(info);
      checkEntrySize(info, file.record.label, options.limits, violations);
    }
  }
  return plan;
}

/** The one folder every real entry sits in; macOS `__MACOSX/` and hidden root files do not count. */
export function sharedTopFolder(files: Array<{ segments: string[] }>): string | null {
  const real = files.filter((file) => file.segments[0] !== '__MACOSX' && !file.segments[0].startsWith('.'));
  if (real.length === 0 || real.some((file) => file.segments.length < 2)) return null;
  const top = real[0].segments[0];
  return real.every((file) => file.segments[0] === top) ? top : null;
}
