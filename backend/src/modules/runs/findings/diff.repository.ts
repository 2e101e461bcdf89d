import { Injectable } from '@nestjs/common';
import { type SQL, sql } from 'drizzle-orm';
import { DbService } from '../../../db/db.service.js';
import { queryRows } from '../sql-values.js';

/** Listed items per finding kind and direction; the totals are always exact. */
export const DIFF_LIST_LIMIT = 500;
export const SCORE_MOVES = 25;

/** Page findings compared by path (pages keep their path across snapshots). */
export const PAGE_FINDINGS = {
  orphans: 'orphan',
  deadEnds: 'dead_end',
  unreachable: 'not reachable',
  deepPages: 'deep',
  islandPages: 'island_id is not null',
} as const;

/** Link findings compared by source page path + raw href. */
export const LINK_FINDINGS = {
  brokenLinks: 'broken',
  brokenAnchors: 'broken-anchor',
  unsafeLinks: 'unsafe',
  ambiguousLinks: 'ambiguous',
} as const;

export interface ChangeList<T> {
  total: number;
  items: T[];
}

@Injectable()
export class DiffRepository {
  constructor(private readonly database: DbService) {}

  /** Pages flagged in run `a` but not in run `b`. */
  async pagesOnlyIn(a: string, b: string, flag: string): Promise<ChangeList<{ path: string; title: string }>> {
    const condition = (alias: string) => sql.raw(flag.replace(/(orphan|dead_end|reachable|deep|island_id)/g, `${alias}.$1`));
    return this.listed(
      sql`select a.path, a.title from page_metrics a where a.run_id = ${a} and ${condition('a')}
          and not exists (select 1 from page_metrics b where b.run_id = ${b} and b.path = a.path and ${condition('b')})`,
    );
  }

  /** Pages of run `a` that run `b` does not have (by path): added pages, or, read the other way, removed ones. */
  async pagesMissingFrom(a: string, b: string): Promise<ChangeList<{ path: string; title: string }>> {
    return this.listed(
      sql`select a.path, a.title from page_metrics a where a.run_id = ${a}
          and not exists (select 1 from page_metrics b where b.run_id = ${b} and b.path = a.path)`,
    );
  }

  /** Links with the status in snapshot `a` but not in snapshot `b`. */
  async linksOnlyIn(a: string, b: string, status: string): Promise<ChangeList<{ sourcePath: string; href: string }>> {
    const select = (snapshotId: string) =>
      sql`select p.path as "sourcePath", l.href from links l join pages p on p.id = l.source_page_id where l.snapshot_id = ${snapshotId} and l.status = ${status}`;
    return this.listed(sql`${select(a)} except ${select(b)}`);
  }

  async scoreMoves(runId: string, againstId: string) {
    return queryRows<{ path: string; title: string; before: number; after: number; change: number }>(
      this.database.db,
      sql`select a.path, a.title, b.stationary_score as before, a.stationary_score as after, a.stationary_score - b.stationary_score as change
          from page_metrics a join page_metrics b on b.run_id = ${againstId} and b.path = a.path
          where a.run_id = ${runId} order by abs(a.stationary_score - b.stationary_score) desc, a.path limit ${SCORE_MOVES}`,
    );
  }

  private async listed<T>(query: SQL): Promise<ChangeList<T>> {
    const rows = await queryRows<T & { total: unknown }>(
      this.database.db,
      sql`select x.*, count(*) over () as total from (${query}) x order by 1, 2 limit ${DIFF_LIST_LIMIT}`,
    );
    return { total: rows.length > 0 ? Number(rows[0].total) : 0, items: rows.map(({ total: _total, ...item }) => item as unknown as T) };
  }
}
