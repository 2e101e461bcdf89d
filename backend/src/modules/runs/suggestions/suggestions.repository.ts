import { Injectable } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { DbService } from '../../../db/db.service.js';
import { pgArray, queryRows } from '../sql-values.js';

export interface StoredSuggestion {
  sourcePageId: number;
  scoreGain: number;
  reason: 'unlinked-mention' | 'same-folder';
}

/** Unlinked mentions (full-text search) and the link_suggestions cache. */
@Injectable()
export class SuggestionsRepository {
  constructor(private readonly database: DbService) {}

  private get db() {
    return this.database.db;
  }

  /**
   * Pages whose text names one of the phrases (title, aliases) but that have no link to the target:
   * `search @@ phraseto_tsquery` uses the GIN index on pages.search, best matches first.
   */
  async unlinkedMentions(
    snapshotId: string,
    targetPageId: number,
    phrases: readonly string[],
    limit: number,
  ): Promise<{ id: number; path: string; title: string }[]> {
    const usable = phrases
      .map((p) => p.trim())
      .filter((p) => p.length >= 3)
      .slice(0, 10);
    if (usable.length === 0) return [];
    const query = sql.join(
      usable.map((p) => sql`phraseto_tsquery('english', ${p})`),
      sql` || `,
    );
    const rows = await queryRows<{ id: unknown; path: string; title: string }>(
      this.db,
      sql`select p.id, p.path, p.title from pages p, (select ${query} as q) x
          where p.snapshot_id = ${snapshotId} and p.id <> ${targetPageId} and numnode(x.q) > 0 and p.search @@ x.q
            and not exists (select 1 from links l where l.snapshot_id = ${snapshotId} and l.source_page_id = p.id and l.target_page_id = ${targetPageId})
          order by ts_rank_cd(p.search, x.q) desc, p.path limit ${limit}`,
    );
    return rows.map((r) => ({ id: Number(r.id), path: r.path, title: r.title }));
  }

  /** Title and front-matter aliases of pages, the phrases another page may mention them by. */
  async namesOf(pageIds: readonly number[]): Promise<Map<number, string[]>> {
    if (pageIds.length === 0) return new Map();
    const rows = await queryRows<{ id: unknown; title: string; aliases: unknown }>(
      this.db,
      sql`select id, title, facts->'frontMatter'->'aliases' as aliases from pages where id = any(${pgArray(pageIds)}::bigint[])`,
    );
    return new Map(rows.map((r) => [Number(r.id), [r.title, ...toStrings(r.aliases)]]));
  }

  async store(runId: string, targetPageId: number, suggestions: readonly StoredSuggestion[]): Promise<void> {
    if (suggestions.length === 0) return;
    await this.db.execute(sql`
      insert into link_suggestions (run_id, target_page_id, source_page_id, score_gain, reason, position)
      select ${runId}, ${targetPageId}, * from unnest(${pgArray(suggestions.map((s) => s.sourcePageId))}::bigint[],
        ${pgArray(suggestions.map((s) => s.scoreGain))}::float8[], ${pgArray(suggestions.map((s) => s.reason))}::text[],
        ${pgArray(suggestions.map((_, i) => i + 1))}::int[])
      on conflict do nothing`);
  }

  async stored(runId: string, targetPageId: number): Promise<{ path: string; title: string; scoreGain: number; reason: string }[]> {
    return queryRows(
      this.db,
      sql`select m.path, m.title, s.score_gain as "scoreGain", s.reason from link_suggestions s
          join page_metrics m on m.run_id = s.run_id and m.page_id = s.source_page_id
          where s.run_id = ${runId} and s.target_page_id = ${targetPageId} order by s.position`,
    );
  }
}

function toStrings(value: unknown): string[] {
  if (typeof value === 'string') return [value];
  return Array.isArray(value) ? value.filter((v): v is string => typeof v === 'string') : [];
}

/** The run's pages in id order with their stored scores, to rebuild the gain computation's input. */
export async function runScores(database: DbService, runId: string): Promise<{ pageIds: number[]; paths: string[]; scores: Float64Array }> {
  const rows = await queryRows<{ page_id: unknown; path: string; stationary_score: number }>(
    database.db,
    sql`select page_id, path, stationary_score from page_metrics where run_id = ${runId} order by page_id`,
  );
  return {
    pageIds: rows.map((r) => Number(r.page_id)),
    paths: rows.map((r) => r.path),
    scores: Float64Array.from(rows, (r) => r.stationary_score),
  };
}
