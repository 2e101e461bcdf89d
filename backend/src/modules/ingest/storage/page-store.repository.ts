/**
 * Bulk writes of a snapshot's pages, links and assets. Each batch is one short statement that carries its
 * rows as a single JSON parameter (`json_to_recordset`), which PGlite and node-postgres bind the same way and
 * which keeps statements to a few MB. No transaction spans batches: PGlite serialises every query behind an
 * open transaction (docs/threats.md, "Import pipeline", P5), so a long one would stall every other request.
 */
import { Injectable } from '@nestjs/common';
import { type SQL, sql } from 'drizzle-orm';
import { DbService } from '../../../db/db.service.js';

export interface PageInsert {
  path: string;
  title: string;
  content_hash: string;
  word_count: number;
  owner_email: string | null;
  reviewed_at: string | null;
  facts: Record<string, unknown>;
  raw_links: unknown[];
  text: string;
}

export interface LinkInsert {
  source_page_id: number;
  line: number;
  column: number;
  href: string;
  kind: string;
  status: string;
  target_page_id: number | null;
  target_path: string | null;
  target_is_asset: boolean;
  anchor: string | null;
  reason: string | null;
  flags: string[];
}

export interface StoredPageFacts {
  path: string;
  title: string;
  wordCount: number;
  facts: Record<string, unknown>;
  rawLinks: unknown[];
}

const DELETE_BATCH = 5_000;

@Injectable()
export class PageStoreRepository {
  constructor(private readonly database: DbService) {}

  private async rows<T>(query: SQL): Promise<T[]> {
    const result = (await this.database.db.execute(query)) as unknown as { rows: T[] };
    return result.rows;
  }

  async insertPages(snapshotId: string, pages: PageInsert[]): Promise<{ id: number; path: string }[]> {
    if (pages.length === 0) return [];
    const rows = await this.rows<{ id: string | number; path: string }>(sql`
      INSERT INTO pages (snapshot_id, path, title, content_hash, word_count, owner_email, reviewed_at, facts, raw_links, text)
      SELECT ${snapshotId}::uuid, x.path, x.title, x.content_hash, x.word_count, x.owner_email, x.reviewed_at, x.facts::jsonb, x.raw_links::jsonb, x.text
      FROM json_to_recordset(CAST(${JSON.stringify(pages)}::text AS json)) AS x(path text, title text, content_hash text,
        word_count int, owner_email text, reviewed_at text, facts json, raw_links json, text text)
      RETURNING id, path`);
    return rows.map((row) => ({ id: Number(row.id), path: row.path }));
  }

  /** Unchanged pages are copied inside the database, so their text and facts never travel through Node. */
  async copyPages(snapshotId: string, fromSnapshotId: string, paths: string[]): Promise<{ id: number; path: string }[]> {
    if (paths.length === 0) return [];
    const rows = await this.rows<{ id: string | number; path: string }>(sql`
      INSERT INTO pages (snapshot_id, path, title, content_hash, word_count, owner_email, reviewed_at, protected, facts, raw_links, text)
      SELECT ${snapshotId}::uuid, p.path, p.title, p.content_hash, p.word_count, p.owner_email, p.reviewed_at, p.protected, p.facts, p.raw_links, p.text
      FROM pages p
      WHERE p.snapshot_id = ${fromSnapshotId}::uuid
        AND p.path IN (SELECT value FROM json_array_elements_text(CAST(${JSON.stringify(paths)}::text AS json)))
      RETURNING id, path`);
    return rows.map((row) => ({ id: Number(row.id), path: row.path }));
  }

  /** Path, hash and parser options of every page of a snapshot: enough to decide what can be reused. */
  async pageHashes(snapshotId: string): Promise<Map<string, { hash: string; parseOptions: unknown }>> {
    const rows = await this.rows<{ path: string; content_hash: string; parse_options: unknown }>(sql`
      SELECT path, content_hash, facts->'parseOptions' AS parse_options FROM pages WHERE snapshot_id = ${snapshotId}::uuid`);
    return new Map(rows.map((row) => [row.path, { hash: row.content_hash, parseOptions: parseJson(row.parse_options) }]));
  }

  async pageFacts(snapshotId: string, paths: string[]): Promise<StoredPageFacts[]> {
    if (paths.length === 0) return [];
    const rows = await this.rows<{ path: string; title: string; word_count: number; facts: unknown; raw_links: unknown }>(sql`
      SELECT path, title, word_count, facts, raw_links FROM pages
      WHERE snapshot_id = ${snapshotId}::uuid
        AND path IN (SELECT value FROM json_array_elements_text(CAST(${JSON.stringify(paths)}::text AS json)))`);
    return rows.map((row) => ({
      path: row.path,
      title: row.title,
      wordCount: row.word_count,
      facts: parseJson(row.facts) as Record<string, unknown>,
      rawLinks: parseJson(row.raw_links) as unknown[],
    }));
  }

  async insertLinks(snapshotId: string, links: LinkInsert[]): Promise<void> {
    if (links.length === 0) return;
    const rows = links.map((link) => ({ ...link, flags: toArrayLiteral(link.flags) }));
    await this.database.db.execute(sql`
      INSERT INTO links (snapshot_id, source_page_id, line, "column", href, kind, status, target_page_id, target_path, target_is_asset, anchor, reason, flags)
      SELECT ${snapshotId}::uuid, x.source_page_id, x.line, x."column", x.href, x.kind, x.status, x.target_page_id, x.target_path,
        x.target_is_asset, x.anchor, x.reason, x.flags::text[]
      FROM json_to_recordset(CAST(${JSON.stringify(rows)}::text AS json)) AS x(source_page_id bigint, line int, "column" int,
        href text, kind text, status text, target_page_id bigint, target_path text, target_is_asset boolean, anchor text, reason text, flags text)`);
  }

  async insertAssets(snapshotId: string, assets: { path: string; bytes: number }[]): Promise<void> {
    if (assets.length === 0) return;
    await this.database.db.execute(sql`
      INSERT INTO assets (snapshot_id, path, bytes)
      SELECT ${snapshotId}::uuid, x.path, x.bytes FROM json_to_recordset(CAST(${JSON.stringify(assets)}::text AS json)) AS x(path text, bytes int)`);
  }

  /** Removes a failed snapshot's rows a few thousand at a time, never in one long statement. */
  async deleteSnapshotRows(snapshotId: string): Promise<void> {
    for (const table of ['links', 'assets', 'pages'] as const) {
      for (;;) {
        const [{ deleted }] = await this.rows<{ deleted: string | number }>(sql`
          WITH gone AS (
            DELETE FROM ${sql.identifier(table)} WHERE id IN (
              SELECT id FROM ${sql.identifier(table)} WHERE snapshot_id = ${snapshotId}::uuid LIMIT ${DELETE_BATCH})
            RETURNING 1)
          SELECT count(*) AS deleted FROM gone`);
        if (Number(deleted) < DELETE_BATCH) break;
      }
    }
  }

  async rowCounts(snapshotId: string): Promise<{ pages: number; links: number; assets: number }> {
    const [row] = await this.rows<{ pages: string; links: string; assets: string }>(sql`
      SELECT (SELECT count(*) FROM pages WHERE snapshot_id = ${snapshotId}::uuid) AS pages,
             (SELECT count(*) FROM links WHERE snapshot_id = ${snapshotId}::uuid) AS links,
             (SELECT count(*) FROM assets WHERE snapshot_id = ${snapshotId}::uuid) AS assets`);
    return { pages: Number(row.pages), links: Number(row.links), assets: Number(row.assets) };
  }
}

/**
 * A PostgreSQL array literal (PostgreSQL 15 manual, section 8.15.2 "Array Value Input": elements in double
 * quotes, backslash escapes `"` and `\`). Measured here: a third cheaper per link row than unpacking a JSON array.
 */
function toArrayLiteral(values: string[]): string {
  if (values.length === 0) return '{}';
  return `{${values.map((value) => `"${value.replace(/[\\"]/g, (c) => `\\${c}`)}"`).join(',')}}`;
}

/** node-postgres parses json columns; PGlite through `execute` may hand back text. */
function parseJson(value: unknown): unknown {
  return typeof value === 'string' ? JSON.parse(value) : value;
}
