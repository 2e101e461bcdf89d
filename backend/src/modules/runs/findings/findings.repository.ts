import { Injectable } from '@nestjs/common';
import { type SQL, sql } from 'drizzle-orm';
import { DbService } from '../../../db/db.service.js';
import { LINK_TARGET_SOURCES } from '@linkloom/shared';
import { pgArray, queryRows } from '../sql-values.js';

export interface LinkRowView {
  sourcePath: string;
  line: number;
  column: number;
  href: string;
  targetPath: string | null;
  anchor: string | null;
  kind: string;
  status: string;
  reason: string | null;
}

const SHARE_BUCKETS = 10;

/** Link findings, islands and the score distribution of a run. */
@Injectable()
export class FindingsRepository {
  constructor(private readonly database: DbService) {}

  private get db() {
    return this.database.db;
  }

  /** Links in source-page then line order (the links_snapshot_source_idx order). */
  async links(
    snapshotId: string,
    filter: { status?: string; source?: string },
    offset: number,
    limit: number,
  ): Promise<{ rows: LinkRowView[]; total: number }> {
    const where = linkWhere(snapshotId, filter);
    const rows = await queryRows<LinkRowView>(
      this.db,
      sql`select p.path as "sourcePath", l.line, l."column", l.href, l.target_path as "targetPath", l.anchor, l.kind, l.status, l.reason
          from links l join pages p on p.id = l.source_page_id where ${where}
          order by l.source_page_id, l.line, l."column", l.id limit ${limit} offset ${offset}`,
    );
    const [{ n }] = await queryRows<{ n: unknown }>(
      this.db,
      sql`select count(*) as n from links l join pages p on p.id = l.source_page_id where ${where}`,
    );
    return { rows, total: Number(n) };
  }

  /** Broken links grouped by the missing target, most-linked first (fix one page, fix many links). */
  async brokenByTarget(snapshotId: string, filter: { status?: string; source?: string }, offset: number, limit: number) {
    const where = linkWhere(snapshotId, { ...filter, status: filter.status ?? 'broken' });
    const rows = await queryRows<{ targetPath: string; linkCount: unknown; sourcePageCount: unknown }>(
      this.db,
      sql`select coalesce(l.target_path, l.href) as "targetPath", count(*) as "linkCount", count(distinct l.source_page_id) as "sourcePageCount"
          from links l join pages p on p.id = l.source_page_id where ${where}
          group by 1 order by 2 desc, 1 limit ${limit} offset ${offset}`,
    );
    const [{ n }] = await queryRows<{ n: unknown }>(
      this.db,
      sql`select count(distinct coalesce(l.target_path, l.href)) as n from links l join pages p on p.id = l.source_page_id where ${where}`,
    );
    const sources = await this.firstLinkPerSourcePage(
      where,
      rows.map((r) => r.targetPath),
    );
    return {
      rows: rows.map((r) => ({
        targetPath: r.targetPath,
        linkCount: Number(r.linkCount),
        sourcePageCount: Number(r.sourcePageCount),
        sources: (sources.get(r.targetPath) ?? []).slice(0, LINK_TARGET_SOURCES),
      })),
      total: Number(n),
    };
  }

  /** For each missing target, the first link from each page that points at it (the screen lists the pages; tasks go to them). */
  private async firstLinkPerSourcePage(where: SQL, targets: string[]) {
    const bySource = new Map<string, { sourcePath: string; line: number; column: number }[]>();
    if (targets.length === 0) return bySource;
    const rows = await queryRows<{ target: string; sourcePath: string; line: number; column: number }>(
      this.db,
      sql`select * from (select distinct on (coalesce(l.target_path, l.href), l.source_page_id)
            coalesce(l.target_path, l.href) as target, p.path as "sourcePath", l.line, l."column"
          from links l join pages p on p.id = l.source_page_id
          where ${where} and coalesce(l.target_path, l.href) = any(${pgArray(targets)}::text[])
          order by coalesce(l.target_path, l.href), l.source_page_id, l.line, l."column") x order by target, "sourcePath"`,
    );
    for (const { target, ...source } of rows) {
      const list = bySource.get(target) ?? [];
      if (list.length === 0) bySource.set(target, list);
      list.push(source);
    }
    return bySource;
  }

  async islands(runId: string, offset: number, limit: number, pagesPerIsland = 200) {
    const rows = await queryRows<{ islandId: number; pageCount: unknown; pages: unknown }>(
      this.db,
      sql`select island_id as "islandId", count(*) as "pageCount",
            (json_agg(json_build_object('path', path, 'title', title, 'stationaryScore', stationary_score) order by rank))::text as pages
          from page_metrics where run_id = ${runId} and island_id is not null
          group by island_id order by island_id limit ${limit} offset ${offset}`,
    );
    const [{ n }] = await queryRows<{ n: unknown }>(
      this.db,
      sql`select count(distinct island_id) as n from page_metrics where run_id = ${runId} and island_id is not null`,
    );
    const items = rows.map((r) => ({
      islandId: r.islandId,
      pageCount: Number(r.pageCount),
      pages: (JSON.parse(String(r.pages)) as unknown[]).slice(0, pagesPerIsland),
    }));
    return { items, total: Number(n) };
  }

  /** Share of the total score per tenth of the ranking, and held by the top 1 / 10 / 50 % of pages. */
  async scoreDistribution(runId: string) {
    const [totals] = await queryRows<{ n: unknown; total: number | null }>(
      this.db,
      sql`select count(*) as n, sum(stationary_score) as total from page_metrics where run_id = ${runId}`,
    );
    const n = Number(totals.n);
    const total = totals.total ?? 0;
    if (n === 0 || total <= 0) return { buckets: [], topShares: { top1: 0, top10: 0, top50: 0 } };
    const buckets = await queryRows<{ bucket: number; fromRank: number; toRank: number; score: number }>(
      this.db,
      sql`select (rank - 1) * ${SHARE_BUCKETS}::int / ${n}::int as bucket, min(rank) as "fromRank", max(rank) as "toRank", sum(stationary_score) as score
          from page_metrics where run_id = ${runId} group by 1 order by 1`,
    );
    const top = (percent: number) => Math.max(1, Math.ceil((n * percent) / 100));
    const [shares] = await queryRows<{ top1: number; top10: number; top50: number }>(
      this.db,
      sql`select sum(stationary_score) filter (where rank <= ${top(1)}::int) as top1, sum(stationary_score) filter (where rank <= ${top(10)}::int) as top10,
            sum(stationary_score) filter (where rank <= ${top(50)}::int) as top50 from page_metrics where run_id = ${runId}`,
    );
    return {
      buckets: buckets.map((b) => ({ fromRank: b.fromRank, toRank: b.toRank, share: b.score / total })),
      topShares: { top1: shares.top1 / total, top10: shares.top10 / total, top50: shares.top50 / total },
    };
  }
}

function linkWhere(snapshotId: string, filter: { status?: string; source?: string }): SQL {
  const parts: SQL[] = [sql`l.snapshot_id = ${snapshotId}`];
  if (filter.status) parts.push(sql`l.status = ${filter.status}`);
  if (filter.source) parts.push(sql`p.path = ${filter.source}`);
  return sql.join(parts, sql` and `);
}
