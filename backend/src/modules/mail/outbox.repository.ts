import { Injectable } from '@nestjs/common';
import { and, count, desc, eq, sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import type { Executor } from '../../db/database.js';
import { outbox } from '../../db/schema/index.js';

export type OutboxRow = typeof outbox.$inferSelect;
export type NewOutboxMessage = Pick<OutboxRow, 'kind' | 'toAddress' | 'subject' | 'text' | 'html'> & {
  docSetId?: string | null;
  dedupeKey?: string;
  headers?: Record<string, string>;
};

@Injectable()
export class OutboxRepository {
  constructor(private readonly database: DbService) {}

  async insert(messages: (NewOutboxMessage & { id: string; messageId: string })[], executor: Executor = this.database.db): Promise<void> {
    // A fixed Message-ID (e.g. one digest per run and user) makes enqueueing the same mail twice harmless.
    if (messages.length) await executor.insert(outbox).values(messages).onConflictDoNothing({ target: outbox.messageId });
  }

  /** Claims due messages: marks them `sending` and counts the attempt, so a second sender skips them. */
  async claimDue(limit: number): Promise<OutboxRow[]> {
    const result = await this.database.db.execute(sql`
      update outbox set status = 'sending', attempts = attempts + 1
      where id in (
        select id from outbox where status = 'pending' and next_attempt_at <= now()
        order by next_attempt_at limit ${limit} for update skip locked)
      returning id`);
    const ids = (result as unknown as { rows: { id: string }[] }).rows.map((r) => r.id);
    if (ids.length === 0) return [];
    return this.database.db
      .select()
      .from(outbox)
      .where(sql`${outbox.id} in ${ids}`);
  }

  async markSent(id: string): Promise<void> {
    await this.database.db.update(outbox).set({ status: 'sent', sentAt: new Date(), lastError: null }).where(eq(outbox.id, id));
  }

  async markRetry(id: string, error: string, nextAttemptAt: Date): Promise<void> {
    await this.database.db.update(outbox).set({ status: 'pending', lastError: error, nextAttemptAt }).where(eq(outbox.id, id));
  }

  async markFailed(id: string, error: string): Promise<void> {
    await this.database.db.update(outbox).set({ status: 'failed', lastError: error }).where(eq(outbox.id, id));
  }

  /** After a crash, messages caught in `sending` go back to the queue (sent again with the same Message-ID). */
  async requeueInterrupted(): Promise<number> {
    const rows = await this.database.db
      .update(outbox)
      .set({ status: 'pending' })
      .where(eq(outbox.status, 'sending'))
      .returning({ id: outbox.id });
    return rows.length;
  }

  async list(status: OutboxRow['status'] | undefined, offset: number, limit: number) {
    const where = status ? and(eq(outbox.status, status)) : undefined;
    const rows = await this.database.db.select().from(outbox).where(where).orderBy(desc(outbox.createdAt)).offset(offset).limit(limit);
    const [{ value }] = await this.database.db.select({ value: count() }).from(outbox).where(where);
    return { rows, total: value };
  }
}
