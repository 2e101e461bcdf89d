import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DbService } from '../../../db/db.service.js';
import { EDGE_STATUSES } from '../run-inputs.repository.js';
import { pgArray, queryRows } from '../sql-values.js';
import { PAGE_ITEM_COLUMNS, toPageItem, type PageItem } from './page-item.js';

const LINKED_PAGES_LIMIT = 500;

export interface LinkedPage {
  path: string;
  title: string;
  line: number;
}

/** Everything about one page of a run, read from page_metrics, pages and links. */
@Injectable()
export class PageDetailRepository {
  constructor(private readonly database: DbService) {}

  private get db() {
    return this.database.db;
  }

  async item(runId: string, path: string): Promise<PageItem | null> {
    const rows = await queryRows<PageItem>(
      this.db,
      sql`select ${sql.raw(PAGE_ITEM_COLUMNS)} from page_metrics where run_id = ${runId} and path = ${path}`,
    );
    return rows[0] ? toPageItem(rows[0]) : null;
  }

  async items(runId: string, pageIds: readonly number[]): Promise<PageItem[]> {
    if (pageIds.length === 0) return [];
    const rows = await queryRows<PageItem>(
      this.db,
      sql`select ${sql.raw(PAGE_ITEM_COLUMNS)} from page_metrics where run_id = ${runId} and page_id = any(${pgArray(pageIds)}::bigint[])`,
    );
    return rows.map(toPageItem);
  }

  async facts(pageId: number): Promise<Record<string, unknown>> {
    const rows = await queryRows<{ facts: Record<string, unknown> | string }>(this.db, sql`select facts from pages where id = ${pageId}`);
    const facts = rows[0]?.facts ?? {};
    return typeof facts === 'string' ? (JSON.parse(facts) as Record<string, unknown>) : facts;
  }

  /** Distinct pages linking here (first link line of each), self-links excluded. */
  async inbound(snapshotId: string, pageId: number): Promise<LinkedPage[]> {
    return queryRows(
      this.db,
      sql`select * from (select distinct on (l.source_page_id) p.path, p.title, l.line from links l join pages p on p.id = l.source_page_id
          where l.snapshot_id = ${snapshotId} and l.target_page_id = ${pageId} and l.source_page_id <> ${pageId}
            and l.status in ${EDGE_STATUSES} and not l.target_is_asset
          order by l.source_page_id, l.line) x order by path limit ${LINKED_PAGES_LIMIT}`,
    );
  }

  async outbound(snapshotId: string, pageId: number): Promise<LinkedPage[]> {
    return queryRows(
      this.db,
      sql`select * from (select distinct on (l.target_page_id) p.path, p.title, l.line from links l join pages p on p.id = l.target_page_id
          where l.snapshot_id = ${snapshotId} and l.source_page_id = ${pageId} and l.target_page_id <> ${pageId}
            and l.status in ${EDGE_STATUSES} and not l.target_is_asset
          order by l.target_page_id, l.line) x order by line, path limit ${LINKED_PAGES_LIMIT}`,
    );
  }

  async brokenLinks(snapshotId: string, pageId: number) {
    return queryRows<{
      line: number;
      column: number;
      href: string;
      targetPath: string | null;
      anchor: string | null;
      status: string;
      reason: string | null;
    }>(
      this.db,
      sql`select line, "column", href, target_path as "targetPath", anchor, status, reason from links
          where snapshot_id = ${snapshotId} and source_page_id = ${pageId} and status in ('broken', 'broken-anchor')
          order by line, "column" limit ${LINKED_PAGES_LIMIT}`,
    );
  }

  /** The page's score in every finished run of the doc set (matched by path), oldest first. */
  async scoreHistory(docSetId: string, path: string) {
    const rows = await queryRows<{ runId: string; finishedMs: unknown; stationaryScore: number }>(
      this.db,
      sql`select * from (select r.id as "runId", extract(epoch from r.finished_at) * 1000 as "finishedMs", m.stationary_score as "stationaryScore"
          from runs r join page_metrics m on m.run_id = r.id and m.path = ${path}
          where r.doc_set_id = ${docSetId} and r.status = 'finished' order by r.finished_at desc limit 100) x order by "finishedMs"`,
    );
    return rows.map((r) => ({
      runId: r.runId,
      finishedAt: new Date(Number(r.finishedMs)).toISOString(),
      stationaryScore: r.stationaryScore,
    }));
  }

  /** Distinct page-to-page edges touching any of the given pages (capped: hubs can have thousands). */
  async edgesTouching(snapshotId: string, pageIds: readonly number[], limit: number): Promise<[number, number][]> {
    const ids = pgArray(pageIds);
    const rows = await queryRows<{ s: unknown; t: unknown }>(
      this.db,
      sql`select distinct source_page_id as s, target_page_id as t from links
          where snapshot_id = ${snapshotId} and status in ${EDGE_STATUSES} and target_page_id is not null and not target_is_asset
            and source_page_id <> target_page_id
            and (source_page_id = any(${ids}::bigint[]) or target_page_id = any(${ids}::bigint[])) limit ${limit}`,
    );
    return rows.map((r) => [Number(r.s), Number(r.t)]);
  }
}
