import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import type { LinkStatusCount } from './analysis/run-counts.js';
import { queryRows } from './sql-values.js';

/** Statuses of a link that reaches a page: these are the edges of the link graph (docs/metrics.md). */
export const EDGE_STATUSES = sql`('ok', 'redirected')`;

export interface SnapshotPages {
  ids: number[];
  paths: string[];
  titles: string[];
  wordCounts: number[];
}

/** Reads what a run needs from an imported snapshot (pages, resolved links); never writes. */
@Injectable()
export class RunInputsRepository {
  constructor(private readonly database: DbService) {}

  private get db() {
    return this.database.db;
  }

  async latestReadySnapshotId(docSetId: string): Promise<string | null> {
    const rows = await queryRows<{ id: string }>(
      this.db,
      sql`select id from snapshots where doc_set_id = ${docSetId} and status = 'ready' order by created_at desc, id desc limit 1`,
    );
    return rows[0]?.id ?? null;
  }

  async isReadySnapshot(docSetId: string, snapshotId: string): Promise<boolean> {
    const rows = await queryRows<{ id: string }>(
      this.db,
      sql`select id from snapshots where id = ${snapshotId} and doc_set_id = ${docSetId} and status = 'ready'`,
    );
    return rows.length > 0;
  }

  /** Pages in id order (the order every array of the run follows). */
  async pages(snapshotId: string): Promise<SnapshotPages> {
    const rows = await queryRows<{ id: unknown; path: string; title: string; word_count: number }>(
      this.db,
      sql`select id, path, title, word_count from pages where snapshot_id = ${snapshotId} order by id`,
    );
    return {
      ids: rows.map((r) => Number(r.id)),
      paths: rows.map((r) => r.path),
      titles: rows.map((r) => r.title),
      wordCounts: rows.map((r) => r.word_count),
    };
  }

  /**
   * Resolved page-to-page links as interleaved positions in `pageIds`. Aggregated into one string in the
   * database: one row instead of hundreds of thousands is much cheaper to hand over from PGlite.
   */
  async edgePairs(snapshotId: string, pageIds: readonly number[]): Promise<Int32Array> {
    const rows = await queryRows<{ pairs: string | null }>(
      this.db,
      sql`select string_agg(source_page_id::text || ' ' || target_page_id::text, ' ') as pairs from links
          where snapshot_id = ${snapshotId} and status in ${EDGE_STATUSES} and target_page_id is not null and not target_is_asset`,
    );
    const text = rows[0]?.pairs;
    if (!text) return new Int32Array(0);
    const position = new Map<number, number>();
    pageIds.forEach((id, i) => position.set(id, i));
    const parts = text.split(' ');
    const pairs = new Int32Array(parts.length);
    let kept = 0;
    for (let k = 0; k + 1 < parts.length; k += 2) {
      const s = position.get(Number(parts[k]));
      const t = position.get(Number(parts[k + 1]));
      if (s === undefined || t === undefined) continue;
      pairs[kept++] = s;
      pairs[kept++] = t;
    }
    return pairs.slice(0, kept);
  }

  async linkStatusCounts(snapshotId: string): Promise<LinkStatusCount[]> {
    const rows = await queryRows<{ status: string; target_is_asset: boolean; n: unknown }>(
      this.db,
      sql`select status, target_is_asset, count(*) as n from links where snapshot_id = ${snapshotId} group by status, target_is_asset`,
    );
    return rows.map((r) => ({ status: r.status, targetIsAsset: r.target_is_asset, count: Number(r.n) }));
  }

  /** Broken links and broken anchors per source page. */
  async brokenLinkCounts(snapshotId: string): Promise<Map<number, number>> {
    const rows = await queryRows<{ source_page_id: unknown; n: unknown }>(
      this.db,
      sql`select source_page_id, count(*) as n from links where snapshot_id = ${snapshotId} and status in ('broken', 'broken-anchor') group by source_page_id`,
    );
    return new Map(rows.map((r) => [Number(r.source_page_id), Number(r.n)]));
  }
}
