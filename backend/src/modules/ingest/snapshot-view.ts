import type { SnapshotRow, SnapshotWarning } from '../../db/schema/index.js';

/** A snapshot as the HTTP contract shows it (API.md "Doc sets and imports"). */
export interface SnapshotView {
  id: string;
  docSetId: string;
  status: SnapshotRow['status'];
  source: SnapshotRow['source'];
  label: string | null;
  progress: { done: number; total: number };
  error: string | null;
  errorCode: string | null;
  pageCount: number;
  linkCount: number;
  assetCount: number;
  reusedPageCount: number;
  warnings: SnapshotWarning[];
  ignored: { path: string; reason: string }[];
  createdAt: string;
  createdBy: string | null;
  finishedAt: string | null;
  archiveSha256: string | null;
  archiveBytes: number | null;
  importMs: number | null;
}

export function toSnapshotView(row: SnapshotRow): SnapshotView {
  return {
    id: row.id,
    docSetId: row.docSetId,
    status: row.status,
    source: row.source,
    label: row.label,
    progress: { done: row.progressDone, total: row.progressTotal },
    error: row.error,
    errorCode: row.errorCode,
    pageCount: row.pageCount,
    linkCount: row.linkCount,
    assetCount: row.assetCount,
    reusedPageCount: row.reusedPageCount,
    warnings: row.warnings,
    ignored: row.ignored,
    createdAt: iso(row.createdAt)!,
    createdBy: row.createdBy,
    finishedAt: iso(row.finishedAt),
    archiveSha256: row.archiveSha256,
    archiveBytes: row.archiveBytes,
    importMs: row.importMs,
  };
}

/** Drizzle's PGlite driver may hand timestamps back as strings (RELIABILITY.md 2.2). */
function iso(value: Date | string | null): string | null {
  if (value === null) return null;
  return (value instanceof Date ? value : new Date(value)).toISOString();
}
