import { Injectable } from '@nestjs/common';
import { type SQL, sql } from 'drizzle-orm';
import { DbService } from '../../../db/db.service.js';
import { PAGE_FLAGS, PAGE_SORT_COLUMNS, type PageListQuery, type PageSortKey } from '../run-queries.js';
import { containsPattern, queryRows } from '../sql-values.js';
import { PAGE_ITEM_COLUMNS, toPageItem, type PageItem } from './page-item.js';

const TOTALS_CACHE_SIZE = 500;

/**
 * Sorted, filtered, paged pages of a run, done in the database with the page_metrics indexes. A finished
 * run never changes, so the total of a filter is cached (it is the expensive half of a page request).
 */
@Injectable()
export class PageListRepository {
  private readonly totals = new Map<string, number>();

  constructor(private readonly database: DbService) {}

  async list(
    runId: string,
    query: Omit<PageListQuery, 'page' | 'pageSize'>,
    offset: number,
    limit: number,
  ): Promise<{ rows: PageItem[]; total: number }> {
    const where = whereClause(runId, query);
    const order = orderBy(query.sort);
    const key = JSON.stringify([runId, query.q, query.flags, query.minScore, query.maxScore, query.minDepth, query.maxDepth]);
    const cached = this.totals.get(key);
    if (cached !== undefined) {
      const rows = await queryRows<PageItem>(
        this.database.db,
        sql`select ${sql.raw(PAGE_ITEM_COLUMNS)} from page_metrics where ${where} order by ${order} limit ${limit} offset ${offset}`,
      );
      return { rows: rows.map(toPageItem), total: cached };
    }
    // First time for this filter: rows and total in one pass over the matches (a text filter cannot use an
    // index, so a separate count would scan the run twice).
    const rows = await queryRows<PageItem & { total: unknown }>(
      this.database.db,
      sql`select ${sql.raw(PAGE_ITEM_COLUMNS)}, count(*) over () as total from page_metrics where ${where} order by ${order} limit ${limit} offset ${offset}`,
    );
    const total = rows.length > 0 ? Number(rows[0].total) : offset === 0 ? 0 : await this.count(where);
    if (this.totals.size >= TOTALS_CACHE_SIZE) this.totals.delete(this.totals.keys().next().value!);
    this.totals.set(key, total);
    return { rows: rows.map(({ total: _total, ...row }) => toPageItem(row as PageItem)), total };
  }

  private async count(where: SQL): Promise<number> {
    const [{ n }] = await queryRows<{ n: unknown }>(this.database.db, sql`select count(*) as n from page_metrics where ${where}`);
    return Number(n);
  }
}

/** The filters of the page list as SQL; the CSV export applies the same ones. */
export function whereClause(runId: string, query: PageFilters): SQL {
  const parts: SQL[] = [sql`run_id = ${runId}`];
  if (query.q) {
    const pattern = containsPattern(query.q);
    parts.push(sql`(path ilike ${pattern} escape '\\' or title ilike ${pattern} escape '\\')`);
  }
  // A page matches when it has any of the asked flags (the findings view lists all pages needing work).
  if (query.flags.length > 0) parts.push(sql`(${sql.raw(query.flags.map((f) => PAGE_FLAGS[f]).join(' or '))})`);
  if (query.minScore !== undefined) parts.push(sql`stationary_score >= ${query.minScore}`);
  if (query.maxScore !== undefined) parts.push(sql`stationary_score <= ${query.maxScore}`);
  if (query.minDepth !== undefined) parts.push(sql`depth >= ${query.minDepth}`);
  if (query.maxDepth !== undefined) parts.push(sql`depth <= ${query.maxDepth}`);
  return sql.join(parts, sql` and `);
}

export type PageFilters = Omit<PageListQuery, 'page' | 'pageSize' | 'sort'>;

function orderBy(sort: string): SQL {
  const descending = sort.startsWith('-');
  const { column, invert } = PAGE_SORT_COLUMNS[(descending ? sort.slice(1) : sort) as PageSortKey];
  const direction = descending !== invert ? 'desc' : 'asc';
  // Rank is unique within a run, so it makes every order total (stable paging). It follows the sort's
  // direction because the (run_id, column, rank) indexes can then deliver the rows already in order;
  // default NULL placement (unknown depth last ascending, first descending) is the btree's order too.
  const tieBreak = column === 'rank' || column === 'path' ? '' : `, rank ${direction}`;
  return sql.raw(`${column} ${direction}${tieBreak}`);
}
