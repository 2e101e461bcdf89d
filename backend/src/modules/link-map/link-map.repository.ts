import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';

export interface MapPageRow {
  pageId: number;
  path: string;
  title: string;
  stationaryScore: number;
  orphan: boolean;
  deadEnd: boolean;
  reachable: boolean;
  deep: boolean;
  island: boolean;
}

/** LIKE pattern for "starts with", with the pattern characters of the prefix taken literally. */
function startsWith(prefix: string): string {
  return `${prefix.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

/**
 * The group a page belongs to on the map: the first `depth` folder names below `prefix`, or '' for the
 * pages directly in `prefix`. Written in SQL so link counts between groups are summed in the database.
 */
function groupKey(prefix: string, depth: number) {
  const rest = sql`substr(pm.path, ${prefix.length + 1})`;
  const parts = sql`string_to_array(${rest}, '/')`;
  return sql`case when position('/' in ${rest}) = 0 then '' else array_to_string((${parts})[1:least(${depth}::int, array_length(${parts}, 1) - 1)], '/') end`;
}

@Injectable()
export class LinkMapRepository {
  constructor(private readonly database: DbService) {}

  private rows<T>(result: unknown): T[] {
    return (result as { rows: T[] }).rows;
  }

  async countPages(runId: string, prefix: string): Promise<number> {
    const result = await this.database.db.execute(
      sql`select count(*)::int as n from page_metrics pm where pm.run_id = ${runId} and pm.path like ${startsWith(prefix)}`,
    );
    return this.rows<{ n: number }>(result)[0].n;
  }

  async topPages(runId: string, prefix: string, limit: number): Promise<MapPageRow[]> {
    const result = await this.database.db.execute(sql`
      select pm.page_id as "pageId", pm.path, pm.title, pm.stationary_score as "stationaryScore", pm.orphan, pm.dead_end as "deadEnd",
             pm.reachable, pm.deep, (pm.island_id is not null) as island
      from page_metrics pm where pm.run_id = ${runId} and pm.path like ${startsWith(prefix)}
      order by pm.rank limit ${limit}`);
    return this.rows<MapPageRow>(result).map((r) => ({ ...r, pageId: Number(r.pageId) }));
  }

  async edgesAmong(snapshotId: string, pageIds: number[]): Promise<{ source: number; target: number; weight: number }[]> {
    if (pageIds.length === 0) return [];
    const ids = sql.raw(`ARRAY[${pageIds.map((id) => Number(id)).join(',')}]::bigint[]`);
    const result = await this.database.db.execute(sql`
      select l.source_page_id as source, l.target_page_id as target, count(*)::int as weight
      from links l
      where l.snapshot_id = ${snapshotId} and l.status in ('ok', 'redirected') and l.target_is_asset = false
        and l.source_page_id = any(${ids}) and l.target_page_id = any(${ids}) and l.source_page_id <> l.target_page_id
      group by 1, 2`);
    return this.rows<{ source: number; target: number; weight: number }>(result).map((r) => ({
      source: Number(r.source),
      target: Number(r.target),
      weight: r.weight,
    }));
  }

  async folderGroups(runId: string, prefix: string, depth: number) {
    const result = await this.database.db.execute(sql`
      select ${groupKey(prefix, depth)} as key, count(*)::int as "pageCount", sum(pm.stationary_score) as "stationaryScore",
             sum(case when pm.orphan then 1 else 0 end)::int as orphans, sum(case when pm.dead_end then 1 else 0 end)::int as "deadEnds",
             sum(case when pm.reachable then 0 else 1 end)::int as unreachable, sum(case when pm.deep then 1 else 0 end)::int as deep
      from page_metrics pm where pm.run_id = ${runId} and pm.path like ${startsWith(prefix)}
      group by 1 order by 3 desc`);
    return this.rows<{
      key: string;
      pageCount: number;
      stationaryScore: number;
      orphans: number;
      deadEnds: number;
      unreachable: number;
      deep: number;
    }>(result);
  }

  async folderEdges(runId: string, snapshotId: string, prefix: string, depth: number, limit: number) {
    const result = await this.database.db.execute(sql`
      with g as (select pm.page_id, ${groupKey(prefix, depth)} as key from page_metrics pm where pm.run_id = ${runId} and pm.path like ${startsWith(prefix)})
      select s.key as source, t.key as target, count(*)::int as weight
      from links l join g s on s.page_id = l.source_page_id join g t on t.page_id = l.target_page_id
      where l.snapshot_id = ${snapshotId} and l.status in ('ok', 'redirected') and s.key <> t.key
      group by 1, 2 order by 3 desc limit ${limit}`);
    return this.rows<{ source: string; target: string; weight: number }>(result);
  }
}
