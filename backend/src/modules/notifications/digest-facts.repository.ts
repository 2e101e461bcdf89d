import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';

function rows<T>(result: unknown): T[] {
  return (result as { rows: T[] }).rows;
}

/** Read-only facts for the nightly digest: the run before, and the work that the run touched. */
@Injectable()
export class DigestFactsRepository {
  constructor(private readonly database: DbService) {}

  async previousFinishedRun(docSetId: string, runId: string): Promise<{ id: string; snapshotId: string } | null> {
    const result = await this.database.db.execute(sql`
      select r.id, r.snapshot_id as "snapshotId" from runs r, runs cur
      where cur.id = ${runId} and r.doc_set_id = ${docSetId} and r.status = 'finished' and r.id <> cur.id and r.finished_at <= cur.finished_at
      order by r.finished_at desc limit 1`);
    return rows<{ id: string; snapshotId: string }>(result)[0] ?? null;
  }

  async tasksVerifiedBy(runId: string): Promise<string[]> {
    const result = await this.database.db.execute(sql`
      select title || ' (' || page_path || ')' as label from tasks where verified_run_id = ${runId} and verification = 'verified' order by page_path limit 50`);
    return rows<{ label: string }>(result).map((r) => r.label);
  }

  async tasksOverdue(docSetId: string, today: string): Promise<string[]> {
    const result = await this.database.db.execute(sql`
      select title || ' (' || page_path || ', due ' || due_date || ')' as label from tasks
      where doc_set_id = ${docSetId} and status in ('open', 'in-progress') and due_date is not null and due_date < ${today}
      order by due_date limit 50`);
    return rows<{ label: string }>(result).map((r) => r.label);
  }

  async pruningWaiting(docSetId: string): Promise<number> {
    const result = await this.database.db.execute(sql`
      select count(*)::int as n from pruning_candidates c
      where c.doc_set_id = ${docSetId} and c.in_latest_run
        and not exists (select 1 from pruning_decisions d where d.doc_set_id = c.doc_set_id and d.path = c.path and d.flagged_at is null)`);
    return rows<{ n: number }>(result)[0]?.n ?? 0;
  }
}
