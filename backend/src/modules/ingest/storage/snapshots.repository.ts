import { Injectable } from '@nestjs/common';
import { and, count, desc, eq, gte, inArray, sql } from 'drizzle-orm';
import { DbService } from '../../../db/db.service.js';
import { snapshots, type SnapshotRow, type SnapshotWarning } from '../../../db/schema/index.js';

export type NewSnapshot = Pick<SnapshotRow, 'docSetId' | 'source' | 'label' | 'createdBy' | 'archiveSha256' | 'archiveBytes'> & {
  ignored: { path: string; reason: string }[];
  progressTotal: number;
};

export interface ReadyCounts {
  pageCount: number;
  linkCount: number;
  assetCount: number;
  reusedPageCount: number;
  warnings: SnapshotWarning[];
  importMs: number;
}

const UNIQUE_VIOLATION = '23505';
const IMPORTING = ['received', 'importing'] as const;

/** Snapshot rows: the import's state machine received -> importing -> ready | failed. */
@Injectable()
export class SnapshotsRepository {
  constructor(private readonly database: DbService) {}

  /** Null when another import of the doc set is still running (the partial unique index decides). */
  async insertReceived(values: NewSnapshot): Promise<SnapshotRow | null> {
    try {
      const [row] = await this.database.db
        .insert(snapshots)
        .values({ ...values, status: 'received' })
        .returning();
      return row;
    } catch (error) {
      if (isUniqueViolation(error)) return null;
      throw error;
    }
  }

  async markImporting(id: string, total: number): Promise<void> {
    await this.database.db
      .update(snapshots)
      .set({ status: 'importing', progressTotal: total, progressDone: 0 })
      .where(eq(snapshots.id, id));
  }

  async progress(id: string, done: number): Promise<void> {
    await this.database.db.update(snapshots).set({ progressDone: done }).where(eq(snapshots.id, id));
  }

  /** The one small transaction that makes a snapshot visible to readers. */
  async markReady(id: string, counts: ReadyCounts): Promise<void> {
    await this.database.db.transaction(async (tx) => {
      await tx
        .update(snapshots)
        .set({ ...counts, status: 'ready', progressDone: counts.pageCount, finishedAt: new Date() })
        .where(and(eq(snapshots.id, id), eq(snapshots.status, 'importing')));
    });
  }

  async markFailed(id: string, code: string, message: string, warnings?: SnapshotWarning[]): Promise<void> {
    await this.database.db
      .update(snapshots)
      .set({ status: 'failed', errorCode: code, error: message, finishedAt: new Date(), ...(warnings ? { warnings } : {}) })
      .where(eq(snapshots.id, id));
  }

  async findUnfinished(): Promise<Pick<SnapshotRow, 'id' | 'docSetId'>[]> {
    return this.database.db
      .select({ id: snapshots.id, docSetId: snapshots.docSetId })
      .from(snapshots)
      .where(inArray(snapshots.status, [...IMPORTING]));
  }

  async list(docSetId: string, offset: number, limit: number): Promise<{ rows: SnapshotRow[]; total: number }> {
    const rows = await this.database.db
      .select()
      .from(snapshots)
      .where(eq(snapshots.docSetId, docSetId))
      .orderBy(desc(snapshots.createdAt), desc(snapshots.id))
      .offset(offset)
      .limit(limit);
    const [{ total }] = await this.database.db.select({ total: count() }).from(snapshots).where(eq(snapshots.docSetId, docSetId));
    return { rows, total: Number(total) };
  }

  async find(docSetId: string, id: string): Promise<SnapshotRow | null> {
    const [row] = await this.database.db
      .select()
      .from(snapshots)
      .where(and(eq(snapshots.docSetId, docSetId), eq(snapshots.id, id)))
      .limit(1);
    return row ?? null;
  }

  async latestReady(docSetId: string): Promise<SnapshotRow | null> {
    const [row] = await this.database.db
      .select()
      .from(snapshots)
      .where(and(eq(snapshots.docSetId, docSetId), eq(snapshots.status, 'ready')))
      .orderBy(desc(snapshots.finishedAt), desc(snapshots.createdAt))
      .limit(1);
    return row ?? null;
  }

  async countCreatedSince(userId: string, since: Date): Promise<number> {
    const [{ total }] = await this.database.db
      .select({ total: count() })
      .from(snapshots)
      .where(and(eq(snapshots.createdBy, userId), gte(snapshots.createdAt, since), sql`${snapshots.source} <> 'demo'`));
    return Number(total);
  }
}

/** Drizzle 0.45 wraps driver errors (`cause`); PGlite and node-postgres both carry the SQLSTATE in `code`. */
function isUniqueViolation(error: unknown): boolean {
  for (let e = error as { code?: string; cause?: unknown } | undefined; e; e = e.cause as typeof e) {
    if (e.code === UNIQUE_VIOLATION) return true;
  }
  return false;
}
