import { Injectable } from '@nestjs/common';
import { and, count, desc, eq, inArray, isNotNull } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import type { Executor } from '../../db/database.js';
import { digestDeliveries, type DigestDeliveryRow } from '../../db/schema/index.js';

/** The record of sent digests: each reader's last covered run per doc set, and how many got each run's digest. */
@Injectable()
export class DigestDeliveriesRepository {
  constructor(private readonly database: DbService) {}

  /** The latest digest this reader got for this doc set. */
  async last(userId: string, docSetId: string): Promise<DigestDeliveryRow | null> {
    const [row] = await this.database.db
      .select()
      .from(digestDeliveries)
      .where(and(eq(digestDeliveries.userId, userId), eq(digestDeliveries.docSetId, docSetId)))
      .orderBy(desc(digestDeliveries.createdAt))
      .limit(1);
    return row ?? null;
  }

  /** Records a digest once per reader and run, in the transaction that enqueues its mail. */
  async insert(row: typeof digestDeliveries.$inferInsert, executor: Executor): Promise<void> {
    await executor
      .insert(digestDeliveries)
      .values(row)
      .onConflictDoNothing({ target: [digestDeliveries.userId, digestDeliveries.runId] });
  }

  async countsForRuns(runIds: string[]): Promise<Map<string, number>> {
    if (runIds.length === 0) return new Map();
    const rows = await this.database.db
      .select({ runId: digestDeliveries.runId, n: count() })
      .from(digestDeliveries)
      .where(and(inArray(digestDeliveries.runId, runIds), isNotNull(digestDeliveries.outboxId)))
      .groupBy(digestDeliveries.runId);
    return new Map(rows.map((r) => [r.runId, r.n]));
  }
}
