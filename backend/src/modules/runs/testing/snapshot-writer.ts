/**
 * Writes a ready snapshot (pages and resolved links) straight into the database, shaped the way the
 * importer writes it (facts with title, headings, anchors, frontMatter, headingText; links with status and
 * target page). For tests and benchmarks of runs, independent of archive parsing.
 */
import { sql } from 'drizzle-orm';
import type { Database } from '../../../db/database.js';
import { pgArray, queryRows } from '../sql-values.js';

export interface FixturePage {
  path: string;
  title?: string;
  text?: string;
  headings?: string[];
  aliases?: string[];
  wordCount?: number;
}

export interface FixtureLink {
  from: string;
  /** Target page path (resolved links); omitted for broken, external, unsafe... */
  to?: string;
  href?: string;
  status?: 'ok' | 'broken' | 'broken-anchor' | 'unsafe' | 'external' | 'ambiguous' | 'redirected' | 'out-of-scope';
  line?: number;
  column?: number;
  targetPath?: string;
  targetIsAsset?: boolean;
  anchor?: string;
  kind?: string;
  reason?: string;
}

const BATCH = 5_000;

export async function writeSnapshot(
  db: Database,
  docSetId: string,
  pages: readonly FixturePage[],
  links: readonly FixtureLink[],
): Promise<{ snapshotId: string; pageIds: Map<string, number> }> {
  const [{ id: snapshotId }] = await queryRows<{ id: string }>(
    db,
    sql`insert into snapshots (doc_set_id, status, source, page_count, link_count, finished_at) values (${docSetId}, 'importing', 'upload', ${pages.length}, ${links.length}, now()) returning id`,
  );
  for (let start = 0; start < pages.length; start += BATCH) {
    const chunk = pages.slice(start, start + BATCH);
    const facts = chunk.map((p) => JSON.stringify(pageFacts(p)));
    await db.execute(sql`insert into pages (snapshot_id, path, title, content_hash, word_count, facts, raw_links, text)
      select ${snapshotId}, path, title, md5(path), words, facts::jsonb, '[]'::jsonb, body from unnest(
        ${pgArray(chunk.map((p) => p.path))}::text[], ${pgArray(chunk.map((p) => titleOf(p)))}::text[],
        ${pgArray(chunk.map((p) => p.wordCount ?? (p.text ?? '').split(/\s+/).filter(Boolean).length))}::int[],
        ${pgArray(facts)}::text[], ${pgArray(chunk.map((p) => p.text ?? ''))}::text[]) as x(path, title, words, facts, body)`);
  }
  const rows = await queryRows<{ id: unknown; path: string }>(db, sql`select id, path from pages where snapshot_id = ${snapshotId}`);
  const pageIds = new Map(rows.map((r) => [r.path, Number(r.id)]));
  for (let start = 0; start < links.length; start += BATCH) {
    const chunk = links.slice(start, start + BATCH);
    const column = <T extends string | number | boolean | null>(pick: (l: FixtureLink, k: number) => T) => pgArray(chunk.map(pick));
    await db.execute(sql`insert into links (snapshot_id, source_page_id, line, "column", href, kind, status, target_page_id, target_path, target_is_asset, anchor, reason)
      select ${snapshotId}, * from unnest(
        ${column((l) => pageIds.get(l.from)!)}::bigint[], ${column((l, k) => l.line ?? k + 1)}::int[], ${column((l) => l.column ?? 1)}::int[],
        ${column((l) => l.href ?? l.to ?? l.targetPath ?? '')}::text[], ${column((l) => l.kind ?? 'inline')}::text[],
        ${column((l) => l.status ?? (l.to ? 'ok' : 'broken'))}::text[], ${column((l) => (l.to ? pageIds.get(l.to)! : null))}::bigint[],
        ${column((l) => l.targetPath ?? l.to ?? null)}::text[], ${column((l) => l.targetIsAsset ?? false)}::boolean[],
        ${column((l) => l.anchor ?? null)}::text[], ${column((l) => l.reason ?? null)}::text[])`);
  }
  await db.execute(sql`update snapshots set status = 'ready' where id = ${snapshotId}`);
  return { snapshotId, pageIds };
}

function titleOf(page: FixturePage): string {
  return page.title ?? page.path.replace(/\.md$/, '');
}

function pageFacts(page: FixturePage) {
  const headings = (page.headings ?? []).map((text, i) => ({
    depth: 2,
    text,
    slug: text.toLowerCase().replace(/[^a-z0-9]+/g, '-'),
    line: i + 3,
  }));
  return {
    path: page.path,
    title: titleOf(page),
    headings,
    anchors: headings.map((h) => h.slug),
    blockIds: [],
    wordCount: page.wordCount ?? 0,
    frontMatter: { aliases: page.aliases ?? [], tags: [], redirectFrom: [], raw: page.aliases ? { aliases: page.aliases } : {} },
    warnings: [],
    headingText: headings.map((h) => h.text).join(' '),
  };
}
