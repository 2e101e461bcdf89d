import { Injectable } from '@nestjs/common';
import { and, count, desc, eq, inArray, sql } from 'drizzle-orm';
import type { DocSetSettings } from '@linkloom/shared';
import { DbService } from '../../db/db.service.js';
import { runs, type RunCounts, type RunRow } from '../../db/schema/index.js';
import type { RunWarning } from './analysis/entry-pages.js';
import { queryRows } from './sql-values.js';

export type RunTrigger = RunRow['trigger'];

/** The runs table: queueing, claiming and recording how a run ended. */
@Injectable()
export class RunsRepository {
  constructor(private readonly database: DbService) {}

  private get db() {
    return this.database.db;
  }

  async insertQueued(values: {
    docSetId: string;
    snapshotId: string;
    trigger: RunTrigger;
    settings: DocSetSettings;
    createdBy: string | null;
  }): Promise<RunRow> {
    // The next number of the doc set, in the same statement, so the numbers follow the queue order.
    const number = sql<number>`(select coalesce(max(${runs.number}), 0) + 1 from ${runs} where ${runs.docSetId} = ${values.docSetId})`;
    const [row] = await this.db
      .insert(runs)
      .values({ ...values, number, status: 'queued' })
      .returning();
    return row;
  }

  /**
   * Moves the doc set's oldest queued run to `running`, unless one is already running: the check and the
   * update are one statement, so even two processes on one PostgreSQL server never run two at once.
   */
  async claimNext(docSetId: string): Promise<RunRow | null> {
    const claimed = await queryRows<{ id: string }>(
      this.db,
      sql`update runs set status = 'running', started_at = now()
          where id = (select id from runs where doc_set_id = ${docSetId} and status = 'queued' order by created_at, id limit 1)
            and not exists (select 1 from runs where doc_set_id = ${docSetId} and status = 'running')
          returning id`,
    );
    return claimed[0] ? this.findById(claimed[0].id) : null;
  }

  async markFinished(
    id: string,
    result: { iterations: number; residual: number; durationMs: number; counts: RunCounts; warnings: RunWarning[] },
  ): Promise<RunRow> {
    const [row] = await this.db
      .update(runs)
      .set({ ...result, status: 'finished', finishedAt: new Date() })
      .where(eq(runs.id, id))
      .returning();
    return row;
  }

  async markFailed(id: string, error: string): Promise<void> {
    await this.db.update(runs).set({ status: 'failed', error, finishedAt: new Date() }).where(eq(runs.id, id));
  }

  /** After a crash or kill nothing is computing: every unfinished run is closed as failed. */
  async failUnfinished(error: string): Promise<number> {
    const rows = await this.db
      .update(runs)
      .set({ status: 'failed', error, finishedAt: new Date() })
      .where(inArray(runs.status, ['queued', 'running']))
      .returning({ id: runs.id });
    return rows.length;
  }

  async hasQueued(docSetId: string): Promise<boolean> {
    const rows = await queryRows<{ id: string }>(
      this.db,
      sql`select id from runs where doc_set_id = ${docSetId} and status = 'queued' limit 1`,
    );
    return rows.length > 0;
  }

  async findById(id: string): Promise<RunRow | null> {
    const [row] = await this.db.select().from(runs).where(eq(runs.id, id)).limit(1);
    return row ?? null;
  }

  async findInDocSet(docSetId: string, runId: string): Promise<RunRow | null> {
    const [row] = await this.db
      .select()
      .from(runs)
      .where(and(eq(runs.id, runId), eq(runs.docSetId, docSetId)))
      .limit(1);
    return row ?? null;
  }

  async latestFinished(docSetId: string): Promise<RunRow | null> {
    const [row] = await this.db
      .select()
      .from(runs)
      .where(and(eq(runs.docSetId, docSetId), eq(runs.status, 'finished')))
      .orderBy(desc(runs.finishedAt), desc(runs.createdAt))
      .limit(1);
    return row ?? null;
  }

  async list(docSetId: string, offset: number, limit: number): Promise<{ rows: RunRow[]; total: number }> {
    const rows = await this.db
      .select()
      .from(runs)
      .where(eq(runs.docSetId, docSetId))
      .orderBy(desc(runs.createdAt), desc(runs.id))
      .offset(offset)
      .limit(limit);
    const [{ value }] = await this.db.select({ value: count() }).from(runs).where(eq(runs.docSetId, docSetId));
    return { rows, total: value };
  }
}
