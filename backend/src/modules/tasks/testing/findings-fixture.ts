// Test helper: writes a ready snapshot, its pages and broken links, a finished run and its page_metrics
// directly, so work features can be tested without the importer and the analysis. Values are invented.
import { sql } from 'drizzle-orm';
import type { Database } from '../../../db/database.js';
import { docSets, links, pageMetrics, pages, runs, snapshots } from '../../../db/schema/index.js';

export interface FixturePage {
  path: string;
  title?: string;
  orphan?: boolean;
  deadEnd?: boolean;
  reachable?: boolean;
  inboundCount?: number;
  stationaryScore?: number;
  wordCount?: number;
  ownerEmail?: string | null;
  reviewedAt?: string | null;
  protected?: boolean;
  brokenLinks?: { href: string; line: number; status?: 'broken' | 'broken-anchor' }[];
}

export async function createFixtureDocSet(db: Database, name = 'Harbour Ops Handbook'): Promise<string> {
  const { defaultDocSetSettings } = await import('@linkloom/shared');
  const [row] = await db.insert(docSets).values({ name, settings: defaultDocSetSettings() }).returning({ id: docSets.id });
  return row.id;
}

/** Inserts one snapshot + finished run for the doc set; returns their ids. Scores default to an even spread. */
export async function insertFixtureRun(
  db: Database,
  docSetId: string,
  fixturePages: FixturePage[],
  finishedAt = new Date(),
): Promise<{ snapshotId: string; runId: string }> {
  const { defaultDocSetSettings } = await import('@linkloom/shared');
  const [snapshot] = await db
    .insert(snapshots)
    .values({ docSetId, status: 'ready', source: 'demo', pageCount: fixturePages.length, finishedAt })
    .returning({ id: snapshots.id });
  const pageRows = await db
    .insert(pages)
    .values(
      fixturePages.map((p) => ({
        snapshotId: snapshot.id,
        path: p.path,
        title: p.title ?? p.path,
        contentHash: `hash-${p.path}`,
        wordCount: p.wordCount ?? 400,
        ownerEmail: p.ownerEmail ?? null,
        reviewedAt: p.reviewedAt ?? null,
        protected: p.protected ?? false,
        facts: {},
        rawLinks: [],
      })),
    )
    .returning({ id: pages.id, path: pages.path });
  const idOf = new Map(pageRows.map((r) => [r.path, r.id]));
  const broken = fixturePages.flatMap((p) =>
    (p.brokenLinks ?? []).map((b) => ({
      snapshotId: snapshot.id,
      sourcePageId: idOf.get(p.path)!,
      line: b.line,
      column: 1,
      href: b.href,
      kind: 'internal',
      status: b.status ?? 'broken',
    })),
  );
  if (broken.length) await db.insert(links).values(broken);
  const [run] = await db
    .insert(runs)
    .values({
      docSetId,
      number: sql<number>`(select coalesce(max(${runs.number}), 0) + 1 from ${runs} where ${runs.docSetId} = ${docSetId})`,
      snapshotId: snapshot.id,
      status: 'finished',
      trigger: 'manual',
      settings: defaultDocSetSettings(),
      startedAt: finishedAt,
      finishedAt,
    })
    .returning({ id: runs.id });
  const n = fixturePages.length;
  await db.insert(pageMetrics).values(
    fixturePages.map((p, i) => {
      const score = p.stationaryScore ?? (n - i) / ((n * (n + 1)) / 2);
      return {
        runId: run.id,
        pageId: idOf.get(p.path)!,
        path: p.path,
        title: p.title ?? p.path,
        stationaryScore: score,
        timesAverage: score * n,
        rank: i + 1,
        inboundCount: p.inboundCount ?? (p.orphan ? 0 : 2),
        outboundCount: p.deadEnd ? 0 : 3,
        depth: p.reachable === false ? null : 1,
        reachable: p.reachable ?? true,
        orphan: p.orphan ?? false,
        deadEnd: p.deadEnd ?? false,
        deep: false,
        brokenLinkCount: p.brokenLinks?.length ?? 0,
        wordCount: p.wordCount ?? 400,
      };
    }),
  );
  return { snapshotId: snapshot.id, runId: run.id };
}
