import { Injectable } from '@nestjs/common';
import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import { links, linkSuggestions, pageMetrics, pages, runs } from '../../db/schema/index.js';

/** What the latest run says about one page (read-only view over the runs module's stored results). */
export interface PageFinding {
  path: string;
  title: string;
  orphan: boolean;
  deadEnd: boolean;
  reachable: boolean;
  deep: boolean;
  inboundCount: number;
  stationaryScore: number;
  wordCount: number;
  ownerEmail: string | null;
  reviewedAt: string | null;
  protected: boolean;
  brokenLinks: { href: string; line: number; status: string }[];
}

export interface RunRef {
  id: string;
  snapshotId: string;
  number?: number | null;
}

const BROKEN = ['broken', 'broken-anchor'];

/** Reads stored run results (page_metrics, pages, links, link_suggestions); never writes them. */
@Injectable()
export class RunFindingsRepository {
  constructor(private readonly database: DbService) {}

  async latestFinishedRun(docSetId: string): Promise<RunRef | null> {
    const [row] = await this.database.db
      .select({ id: runs.id, snapshotId: runs.snapshotId })
      .from(runs)
      .where(and(eq(runs.docSetId, docSetId), eq(runs.status, 'finished')))
      .orderBy(desc(runs.finishedAt), desc(runs.createdAt))
      .limit(1);
    return row ?? null;
  }

  async runById(runId: string): Promise<RunRef | null> {
    const [row] = await this.database.db
      .select({ id: runs.id, snapshotId: runs.snapshotId, number: runs.number })
      .from(runs)
      .where(eq(runs.id, runId))
      .limit(1);
    return row ?? null;
  }

  /** Findings per page for the given paths (all pages of the run when `paths` is omitted). */
  async pageFindings(run: RunRef, paths?: string[]): Promise<Map<string, PageFinding>> {
    const db = this.database.db;
    if (paths && paths.length === 0) return new Map();
    const rows = await db
      .select({
        pageId: pageMetrics.pageId,
        path: pageMetrics.path,
        title: pageMetrics.title,
        orphan: pageMetrics.orphan,
        deadEnd: pageMetrics.deadEnd,
        reachable: pageMetrics.reachable,
        deep: pageMetrics.deep,
        inboundCount: pageMetrics.inboundCount,
        stationaryScore: pageMetrics.stationaryScore,
        wordCount: pageMetrics.wordCount,
        ownerEmail: pages.ownerEmail,
        reviewedAt: pages.reviewedAt,
        protected: pages.protected,
      })
      .from(pageMetrics)
      .leftJoin(pages, and(eq(pages.id, pageMetrics.pageId), eq(pages.snapshotId, run.snapshotId)))
      .where(and(eq(pageMetrics.runId, run.id), paths ? inArray(pageMetrics.path, paths) : undefined));
    const broken = await db
      .select({ pageId: links.sourcePageId, href: links.href, line: links.line, status: links.status })
      .from(links)
      .where(
        and(
          eq(links.snapshotId, run.snapshotId),
          inArray(links.status, BROKEN),
          paths
            ? inArray(
                links.sourcePageId,
                rows.map((r) => r.pageId),
              )
            : undefined,
        ),
      )
      .orderBy(links.sourcePageId, links.line);
    const brokenByPage = new Map<number, PageFinding['brokenLinks']>();
    for (const b of broken)
      brokenByPage.set(b.pageId, [...(brokenByPage.get(b.pageId) ?? []), { href: b.href, line: b.line, status: b.status }]);
    return new Map(
      rows.map(({ pageId, ...r }) => [
        r.path,
        {
          ...r,
          ownerEmail: r.ownerEmail ?? null,
          reviewedAt: r.reviewedAt ?? null,
          protected: r.protected ?? false,
          brokenLinks: brokenByPage.get(pageId) ?? [],
        },
      ]),
    );
  }

  /** Suggested source pages (with score gain) for pages that need inbound links. */
  async suggestedSources(
    run: RunRef,
    paths: string[],
    perPage = 5,
  ): Promise<Map<string, { path: string; title: string; scoreGain: number }[]>> {
    if (paths.length === 0) return new Map();
    const rows = await this.database.db.execute(sql`
      select t.path as target, s.path as path, s.title as title, ls.score_gain as "scoreGain"
      from ${linkSuggestions} ls
      join ${pageMetrics} t on t.run_id = ls.run_id and t.page_id = ls.target_page_id
      join ${pageMetrics} s on s.run_id = ls.run_id and s.page_id = ls.source_page_id
      where ls.run_id = ${run.id} and t.path in ${paths} and ls.position < ${perPage}
      order by t.path, ls.position`);
    const result = new Map<string, { path: string; title: string; scoreGain: number }[]>();
    for (const r of (rows as unknown as { rows: { target: string; path: string; title: string; scoreGain: number }[] }).rows) {
      result.set(r.target, [...(result.get(r.target) ?? []), { path: r.path, title: r.title, scoreGain: Number(r.scoreGain) }]);
    }
    return result;
  }
}
