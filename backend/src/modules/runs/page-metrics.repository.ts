import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import { FLAG_DEAD_END, FLAG_DEEP, FLAG_ORPHAN, FLAG_REACHABLE, type AnalyzeJobResult } from './analysis/analysis-jobs.js';
import type { SnapshotPages } from './run-inputs.repository.js';
import { pgArray } from './sql-values.js';

/**
 * Rows per statement: small enough that one statement holds the embedded database (and with PGlite the
 * event loop) for well under 100 ms, large enough that 100,000 pages need only 50 statements.
 */
const BATCH = 2_000;

/** Writes a run's per-page metrics. */
@Injectable()
export class PageMetricsRepository {
  constructor(private readonly database: DbService) {}

  /**
   * Batched unnest inserts, each its own short statement: one transaction over 100,000 rows would hold
   * PGlite's single connection for seconds. A failed run's partial rows are removed by `deleteRun`.
   */
  async insertAll(runId: string, pages: SnapshotPages, metrics: AnalyzeJobResult, brokenCounts: Map<number, number>): Promise<void> {
    for (let start = 0; start < pages.ids.length; start += BATCH) {
      const end = Math.min(start + BATCH, pages.ids.length);
      const range = Array.from({ length: end - start }, (_, k) => start + k);
      const flag = (bit: number) => pgArray(range.map((i) => (metrics.flags[i] & bit) !== 0));
      await this.database.db.execute(sql`
        insert into page_metrics (run_id, page_id, path, title, stationary_score, times_average, rank, inbound_count, outbound_count,
          depth, reachable, orphan, dead_end, deep, island_id, broken_link_count, word_count)
        select ${runId}, * from unnest(
          ${pgArray(range.map((i) => pages.ids[i]))}::bigint[], ${pgArray(range.map((i) => pages.paths[i]))}::text[],
          ${pgArray(range.map((i) => pages.titles[i]))}::text[], ${pgArray(range.map((i) => metrics.scores[i]))}::float8[],
          ${pgArray(range.map((i) => metrics.scores[i] * pages.ids.length))}::float8[], ${pgArray(range.map((i) => metrics.rank[i]))}::int[],
          ${pgArray(range.map((i) => metrics.inbound[i]))}::int[], ${pgArray(range.map((i) => metrics.outbound[i]))}::int[],
          ${pgArray(range.map((i) => (metrics.depth[i] >= 0 ? metrics.depth[i] : null)))}::int[],
          ${flag(FLAG_REACHABLE)}::boolean[], ${flag(FLAG_ORPHAN)}::boolean[], ${flag(FLAG_DEAD_END)}::boolean[], ${flag(FLAG_DEEP)}::boolean[],
          ${pgArray(range.map((i) => (metrics.islandId[i] > 0 ? metrics.islandId[i] : null)))}::int[],
          ${pgArray(range.map((i) => brokenCounts.get(pages.ids[i]) ?? 0))}::int[], ${pgArray(range.map((i) => pages.wordCounts[i]))}::int[])`);
    }
  }

  /**
   * Refreshes the planner's statistics: PGlite runs no autovacuum, and without them the planner guesses a
   * handful of rows per run and sorts whole runs instead of walking the (run_id, rank) index.
   */
  async analyze(): Promise<void> {
    await this.database.db.execute(sql`analyze page_metrics`);
  }

  async deleteRun(runId: string): Promise<void> {
    await this.database.db.execute(sql`delete from page_metrics where run_id = ${runId}`);
    await this.database.db.execute(sql`delete from link_suggestions where run_id = ${runId}`);
  }
}
