import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DbService } from '../../../db/db.service.js';
import { EDGE_STATUSES } from '../run-inputs.repository.js';
import { pgArray, queryRows } from '../sql-values.js';
import type { Match } from './ranked-search.js';

/** Full-text matches of a run's snapshot (GIN index on pages.search), with the run's scores. */
@Injectable()
export class SearchRepository {
  constructor(private readonly database: DbService) {}

  async matches(runId: string, snapshotId: string, q: string, cap: number): Promise<Match[]> {
    const rows = await queryRows<Match>(
      this.database.db,
      sql`select p.id as "pageId", m.path, m.title, ts_rank_cd(p.search, x.q) as "textRank", m.stationary_score as "stationaryScore", m.times_average as "timesAverage"
          from pages p, websearch_to_tsquery('english', ${q}) x(q), page_metrics m
          where p.snapshot_id = ${snapshotId} and p.search @@ x.q and m.run_id = ${runId} and m.page_id = p.id
          order by 4 desc, m.rank limit ${cap}`,
    );
    return rows.map((r) => ({ ...r, pageId: Number(r.pageId) }));
  }

  async edgesAmong(snapshotId: string, pageIds: readonly number[]): Promise<[number, number][]> {
    if (pageIds.length === 0) return [];
    const ids = pgArray(pageIds);
    const rows = await queryRows<{ s: unknown; t: unknown }>(
      this.database.db,
      sql`select distinct source_page_id as s, target_page_id as t from links
          where snapshot_id = ${snapshotId} and status in ${EDGE_STATUSES} and not target_is_asset
            and source_page_id = any(${ids}::bigint[]) and target_page_id = any(${ids}::bigint[])`,
    );
    return rows.map((r) => [Number(r.s), Number(r.t)]);
  }

  /** Text excerpts around the matched words; «» mark them (plain text, never HTML). */
  async snippets(pageIds: readonly number[], q: string): Promise<Map<number, string>> {
    if (pageIds.length === 0) return new Map();
    const rows = await queryRows<{ id: unknown; snippet: string }>(
      this.database.db,
      sql`select p.id, ts_headline('english', left(p.text, 20000), websearch_to_tsquery('english', ${q}),
            'StartSel=«, StopSel=», MaxWords=30, MinWords=10, MaxFragments=2, FragmentDelimiter=" … "') as snippet
          from pages p where p.id = any(${pgArray(pageIds)}::bigint[])`,
    );
    return new Map(rows.map((r) => [Number(r.id), r.snippet]));
  }
}
