/**
 * Shapes and limits shared by the archive and folder readers. Limit values are the starting values of
 * docs/threats.md, "Limits"; callers override them from configuration.
 */

export interface ArchiveLimits {
  maxEntries: number;
  /** Declared (then counted) uncompressed size of one page file. */
  maxEntryBytes: number;
  /** Per-asset cap; assets are listed, never read, so by default only the total and ratios bound them. */
  maxAssetEntryBytes?: number;
  maxTotalBytes: number;
  maxEntryRatio: number;
  /** Entries (and archives) at or below this uncompressed size are exempt from ratio checks. */
  ratioMinBytes: number;
  maxTotalRatio: number;
  maxPathBytes: number;
  maxSegmentBytes: number;
  maxDepth: number;
}

const MIB = 1024 * 1024;

export const DEFAULT_ARCHIVE_LIMITS: ArchiveLimits = Object.freeze({
  maxEntries: 10_000,
  maxEntryBytes: 5 * MIB,
  maxTotalBytes: 200 * MIB,
  maxEntryRatio: 100,
  ratioMinBytes: 1 * MIB,
  maxTotalRatio: 50,
  maxPathBytes: 512,
  maxSegmentBytes: 255,
  maxDepth: 32,
});

export interface ArchiveEntryInfo {
  /** Normalised: '/'-separated, NFC, no '.' segments, top folder stripped when the plan says so. */
  path: string;
  size: number;
  compressedSize: number;
  kind: 'page' | 'asset' | 'ignored';
  ignoredReason?: string;
}

export interface ArchivePlan {
  /** Pages and assets, in central-directory (or directory-walk) order. */
  entries: ArchiveEntryInfo[];
  ignored: ArchiveEntryInfo[];
  topFolderStripped: string | null;
  /** Declared uncompressed bytes of every entry, ignored ones included. */
  totalBytes: number;
}

export interface InspectOptions {
  limits: ArchiveLimits;
  /** With or without the dot, matched case-insensitively: ['.md', 'markdown']. */
  pageExtensions: string[];
  /** picomatch globs, matched against the path after the top folder is stripped. */
  ignoreGlobs: string[];
  stripTopFolder: boolean;
}

/** Test and metrics hook: every byte handed out by a page reader is added here. */
export interface ReadMeter {
  bytesRead: number;
  entriesOpened: number;
}

export interface PageBytes {
  path: string;
  bytes: Buffer;
}
