import { Injectable } from '@nestjs/common';
import { eq, sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import { jobLeases } from '../../db/schema/index.js';

export type JobLeaseRow = typeof jobLeases.$inferSelect;

/**
 * A lease row per job: taking it is one conditional upsert, so of two processes (or a clock tick and a
 * "run now") only one gets it. A lease expires, so a crashed holder does not block the job for ever.
 */
@Injectable()
export class JobLeaseRepository {
  constructor(private readonly database: DbService) {}

  async tryAcquire(name: string, holder: string, seconds: number): Promise<boolean> {
    const result = await this.database.db.execute(sql`
      insert into job_leases (name, holder, lease_until, last_started_at)
      values (${name}, ${holder}, now() + make_interval(secs => ${seconds}), now())
      on conflict (name) do update set holder = excluded.holder, lease_until = excluded.lease_until, last_started_at = now()
      where job_leases.lease_until is null or job_leases.lease_until < now()
      returning name`);
    return (result as unknown as { rows: unknown[] }).rows.length === 1;
  }

  async extend(name: string, holder: string, seconds: number): Promise<void> {
    await this.database.db.execute(sql`
      update job_leases set lease_until = now() + make_interval(secs => ${seconds}) where name = ${name} and holder = ${holder}`);
  }

  async release(name: string, holder: string, result: Record<string, unknown>): Promise<void> {
    await this.database.db
      .update(jobLeases)
      .set({ leaseUntil: null, lastFinishedAt: new Date(), lastResult: result })
      .where(sql`${jobLeases.name} = ${name} and ${jobLeases.holder} = ${holder}`);
  }

  async find(name: string): Promise<JobLeaseRow | null> {
    const [row] = await this.database.db.select().from(jobLeases).where(eq(jobLeases.name, name)).limit(1);
    return row ?? null;
  }

  /** A new installation records "now" as its baseline so it does not count earlier nights as missed. */
  async ensureBaseline(name: string): Promise<void> {
    await this.database.db.execute(sql`
      insert into job_leases (name, last_started_at, last_result) values (${name}, now(), ${JSON.stringify({ baseline: true })}::jsonb)
      on conflict (name) do nothing`);
  }
}
