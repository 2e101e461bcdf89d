import type { RunRow } from '../../db/schema/index.js';

/** A run as the API shows it (database rows never reach the API). */
export function toRunView(row: RunRow) {
  return {
    id: row.id,
    number: row.number,
    docSetId: row.docSetId,
    snapshotId: row.snapshotId,
    status: row.status,
    trigger: row.trigger,
    settings: row.settings,
    createdAt: row.createdAt.toISOString(),
    startedAt: row.startedAt?.toISOString() ?? null,
    finishedAt: row.finishedAt?.toISOString() ?? null,
    iterations: row.iterations,
    residual: row.residual,
    durationMs: row.durationMs,
    counts: row.counts,
    warnings: row.warnings,
    error: row.error,
    createdBy: row.createdBy,
  };
}
export type RunView = ReturnType<typeof toRunView>;
