import type { Snapshot } from '@linkloom/shared';
import type { SnapshotRow } from '../../db/schema/index.js';

/** A snapshot as the API shows it: the shared response shape (docs/api.md "Doc sets and imports"). */
export type SnapshotView = Snapshot;

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

/** Drizzle's PGlite driver may hand timestamps back as strings (docs/threats.md, "Database engine facts"). */
function iso(value: Date | string | null): string | null {
  if (value === null) return null;
  return (value instanceof Date ? value : new Date(value)).toISOString();
}
