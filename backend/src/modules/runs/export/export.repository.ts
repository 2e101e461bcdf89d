import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DbService } from '../../../db/db.service.js';
import type { LinkRowView } from '../findings/findings.repository.js';
import { PAGE_ITEM_COLUMNS, toPageItem, type PageItem } from '../pages/page-item.js';
import { type PageFilters, whereClause } from '../pages/page-list.repository.js';
import { pgArray, queryRows } from '../sql-values.js';

/** Keyset-paged reads for exports: each chunk continues after the last key, so chunk 100 costs what chunk 1 does. */
@Injectable()
export class ExportRepository {
  constructor(private readonly database: DbService) {}

  async pagesAfterRank(runId: string, condition: string, filters: PageFilters, afterRank: number, limit: number): Promise<PageItem[]> {
    const rows = await queryRows<PageItem>(
      this.database.db,
      sql`select ${sql.raw(PAGE_ITEM_COLUMNS)} from page_metrics where ${whereClause(runId, filters)} and rank > ${afterRank}::int and (${sql.raw(condition)})
          order by rank limit ${limit}`,
    );
    return rows.map(toPageItem);
  }

  async linksAfterId(
    snapshotId: string,
    statuses: readonly string[] | null,
    afterId: number,
    limit: number,
  ): Promise<(LinkRowView & { id: number })[]> {
    const statusFilter = statuses ? sql`and l.status = any(${pgArray(statuses)}::text[])` : sql``;
    const rows = await queryRows<LinkRowView & { id: unknown }>(
      this.database.db,
      sql`select l.id, p.path as "sourcePath", l.line, l."column", l.href, l.target_path as "targetPath", l.anchor, l.kind, l.status, l.reason
          from links l join pages p on p.id = l.source_page_id
          where l.snapshot_id = ${snapshotId} and l.id > ${afterId} ${statusFilter} order by l.id limit ${limit}`,
    );
    return rows.map((r) => ({ ...r, id: Number(r.id) }));
  }
}
