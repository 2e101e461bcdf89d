import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';

/**
 * The demo's three versions are imported within seconds of each other; to read as a handbook that changed
 * over weeks, each version's snapshot and run are moved back by whole weeks (version 3 stays today).
 */
@Injectable()
export class DemoHistoryRepository {
  constructor(private readonly database: DbService) {}

  async spreadOverWeeks(runId: string, versions: number): Promise<void> {
    const weeksBack = sql`(${versions} - coalesce(nullif(regexp_replace(s.label, '\\D', '', 'g'), '')::int, ${versions})) * 7`;
    await this.database.db.transaction(async (tx) => {
      await tx.execute(sql`
        update runs r set created_at = r.created_at - make_interval(days => ${weeksBack}),
          started_at = r.started_at - make_interval(days => ${weeksBack}), finished_at = r.finished_at - make_interval(days => ${weeksBack})
        from snapshots s where r.id = ${runId} and s.id = r.snapshot_id and s.source = 'demo'`);
      await tx.execute(sql`
        update snapshots s set created_at = s.created_at - make_interval(days => ${weeksBack}), finished_at = s.finished_at - make_interval(days => ${weeksBack})
        from runs r where r.id = ${runId} and s.id = r.snapshot_id and s.source = 'demo' and r.trigger = 'import'`);
    });
  }
}
