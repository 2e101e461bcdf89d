import { Injectable } from '@nestjs/common';
import { and, asc, desc, eq, gt, lt, lte, ne } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import { runs, type RunRow } from '../../db/schema/index.js';

/** Finished runs of a doc set in time order, for readers that look back over several runs (the digest). */
@Injectable()
export class RunHistoryRepository {
  constructor(private readonly database: DbService) {}

  async finishedRun(docSetId: string, runId: string): Promise<RunRow | null> {
    const [row] = await this.database.db
      .select()
      .from(runs)
      .where(and(eq(runs.id, runId), eq(runs.docSetId, docSetId), eq(runs.status, 'finished')))
      .limit(1);
    return row ?? null;
  }

  /** The newest finished run (of the given trigger, when given) that ended before `run` did. */
  async finishedBefore(run: RunRow, trigger?: RunRow['trigger']): Promise<RunRow | null> {
    const [row] = await this.database.db
      .select()
      .from(runs)
      .where(
        and(
          eq(runs.docSetId, run.docSetId),
          eq(runs.status, 'finished'),
          ne(runs.id, run.id),
          lt(runs.finishedAt, run.finishedAt!),
          trigger ? eq(runs.trigger, trigger) : undefined,
        ),
      )
      .orderBy(desc(runs.finishedAt))
      .limit(1);
    return row ?? null;
  }

  /** Runs that finished after `after` (all when null) up to and including `upto`, oldest first. */
  async finishedBetween(docSetId: string, after: Date | null, upto: Date): Promise<RunRow[]> {
    return this.database.db
      .select()
      .from(runs)
      .where(
        and(
          eq(runs.docSetId, docSetId),
          eq(runs.status, 'finished'),
          after ? gt(runs.finishedAt, after) : undefined,
          lte(runs.finishedAt, upto),
        ),
      )
      .orderBy(asc(runs.finishedAt))
      .limit(1000);
  }
}
