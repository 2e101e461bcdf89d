import 'reflect-metadata';
import type { Run } from '@linkloom/shared';
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DbService } from '../../db/db.service.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { queryRows } from './sql-values.js';
import { HANDBOOK_LINKS, HANDBOOK_PAGES } from './testing/findings-fixture.js';
import { referenceScores } from './testing/reference-scores.js';
import { createDocSet, read, snapshotOf, startRun, waitForRun } from './testing/run-test-kit.js';

describe('run results', () => {
  let t: TestApp;
  let docSetId: string;
  let base: string;
  let run: Run;
  const paths = (body: { items: { path: string }[] }) => body.items.map((i) => i.path);

  beforeAll(async () => {
    t = await createTestApp();
    docSetId = await createDocSet(t, 'Bike "Hub" β');
    await snapshotOf(t, docSetId, HANDBOOK_PAGES, HANDBOOK_LINKS);
    run = await waitForRun(t, docSetId, await startRun(t, docSetId));
    base = `/api/doc-sets/${docSetId}/runs/${run.id}`;
  });
  afterAll(async () => t?.close());

  it('counts every finding of the hand-drawn handbook', () => {
    // Counted by hand from findings-fixture.ts (entry page index.md, depth threshold 3).
    expect(run.counts).toEqual({
      pages: 9,
      links: 14,
      internalLinks: 12,
      externalLinks: 1,
      brokenLinks: 2,
      brokenAnchors: 1,
      brokenAssets: 1,
      unsafeLinks: 1,
      ambiguousLinks: 0,
      redirectedLinks: 1,
      outOfScopeLinks: 0,
      orphans: 1,
      deadEnds: 3,
      unreachable: 3,
      deepPages: 1,
      islands: 2,
    });
  });

  it('filters by flags, depth and score, and sorts and pages in the database', async () => {
    expect(paths((await read(t, `${base}/pages?flags=orphan`)).body)).toEqual(['spoke-log.md']);
    expect(paths((await read(t, `${base}/pages?flags=orphan,deep&sort=path`)).body)).toEqual(['spoke-log.md', 'tools/deep/hubs.md']);
    expect((await read(t, `${base}/pages?flags=unreachable`)).body.total).toBe(3);
    expect((await read(t, `${base}/pages?flags=island`)).body.total).toBe(3);
    expect(paths((await read(t, `${base}/pages?minDepth=2&maxDepth=3&sort=depth`)).body)).toEqual([
      'tools/install.md',
      'tools/advanced.md',
    ]);
    const byScore = (await read(t, `${base}/pages?sort=-stationaryScore&pageSize=50`)).body;
    expect(byScore.items.map((i: { rank: number }) => i.rank)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
    const reference = referenceScores(
      HANDBOOK_PAGES.map((p) => p.path),
      HANDBOOK_LINKS,
      0.85,
    );
    for (const item of byScore.items) expect(item.stationaryScore).toBeCloseTo(reference.get(item.path)!, 9);
    const second = (await read(t, `${base}/pages?sort=rank&page=2&pageSize=3`)).body;
    expect(second).toMatchObject({ total: 9, page: 2, pageSize: 3 });
    expect(second.items.map((i: { rank: number }) => i.rank)).toEqual([4, 5, 6]);
    const threshold = byScore.items[2].stationaryScore;
    expect((await read(t, `${base}/pages?minScore=${threshold}`)).body.total).toBe(3);
    const inbound = (await read(t, `${base}/pages?sort=-inboundCount`)).body.items;
    for (let i = 1; i < inbound.length; i++) {
      expect(inbound[i - 1].inboundCount).toBeGreaterThanOrEqual(inbound[i].inboundCount);
      // Equal values keep rank order in the sort's direction (what the (run_id, column, rank) index gives).
      if (inbound[i - 1].inboundCount === inbound[i].inboundCount) expect(inbound[i - 1].rank).toBeGreaterThan(inbound[i].rank);
    }
  });

  // docs/threats.md checks 40 and 41 (OWASP ASVS 1.2.4: sort keys through an allowlist; LIKE wildcards escaped).
  it('treats %, _ and \\ in q literally and rejects injected or malformed parameters', async () => {
    for (const q of ['%', '_', '\\'])
      expect(paths((await read(t, `${base}/pages?q=${encodeURIComponent(q)}`)).body), q).toEqual(['notes/100%_done.md']);
    expect((await read(t, `${base}/pages?q=${encodeURIComponent("' OR 1=1--")}`)).body.total).toBe(0);
    const started = Date.now();
    for (const query of [
      'sort=title;DROP TABLE pages--',
      'sort=(select pg_sleep(5))',
      'sort=unknown',
      'order=sideways',
      'pageSize=-1',
      'pageSize=1e9',
      'pageSize=abc',
      'page=NaN',
      'sort[]=a&sort[]=b',
      'q[$ne]=1',
      'q[a][b]=c',
      'flags=orphan,nonsense',
    ]) {
      const response = await read(t, `${base}/pages?${query}`);
      expect(response.status, query).toBe(400);
      expect(response.body.message, query).not.toMatch(/select|insert|page_metrics/i);
    }
    expect(Date.now() - started).toBeLessThan(5_000);
    const rejected = await read(t, `${base}/pages?sort=${encodeURIComponent('title;DROP TABLE pages--')}`);
    expect(rejected.body.message).toMatch(/stationaryScore, -stationaryScore, .*wordCount, -wordCount/);
    const [{ n }] = await queryRows<{ n: unknown }>(t.app.get(DbService).db, sql`select count(*) as n from pages`);
    expect(Number(n)).toBe(9);
  });

  it('shows a page with its links, findings, neighbourhood and suggestions whose gains match a recomputation', async () => {
    const install = (await read(t, `${base}/page?path=tools/install.md`)).body;
    expect(install.inbound).toEqual([{ path: 'tools/setup.md', title: 'Setting up the bench', line: 5 }]);
    expect(install.outbound).toEqual([{ path: 'tools/advanced.md', title: 'Advanced wheel truing', line: 2 }]);
    expect(install.neighbourhood.nodes.map((n: { path: string }) => n.path).sort()).toEqual([
      'index.md',
      'tools/advanced.md',
      'tools/deep/hubs.md',
      'tools/install.md',
      'tools/setup.md',
    ]);
    expect(install.neighbourhood.edges).toHaveLength(4);
    expect(install.scoreHistory).toEqual([{ runId: run.id, finishedAt: run.finishedAt, stationaryScore: install.stationaryScore }]);
    const setup = (await read(t, `${base}/page?path=tools/setup.md`)).body;
    expect(setup.brokenLinks.map((l: { status: string }) => l.status).sort()).toEqual(['broken', 'broken', 'broken-anchor']);
    expect(setup.brokenLinkCount).toBe(3);

    const log = (await read(t, `${base}/page?path=spoke-log.md`)).body;
    expect(log).toMatchObject({ orphan: true, reachable: false, island: true });
    expect(log.unlinkedMentions).toEqual([{ path: 'tools/install.md', title: 'Installing the stand' }]);
    expect(log.suggestedSources.length).toBeGreaterThan(0);
    expect(log.suggestedSources[0]).toMatchObject({ path: 'tools/install.md', reason: 'unlinked-mention' });
    const pagePaths = HANDBOOK_PAGES.map((p) => p.path);
    for (const suggestion of log.suggestedSources) {
      expect(suggestion.scoreGain).toBeGreaterThan(0);
      // Independent check: the whole score vector recomputed from scratch with the new link added.
      const after = referenceScores(pagePaths, HANDBOOK_LINKS, 0.85, [suggestion.path, 'spoke-log.md']).get('spoke-log.md')!;
      expect(Math.abs(after - log.stationaryScore - suggestion.scoreGain)).toBeLessThan(1e-9);
    }
    expect((await read(t, `${base}/page?path=nope.md`)).status).toBe(404);
  });

  it('lists links with unsafe hrefs as text and groups broken links by missing target', async () => {
    const unsafe = (await read(t, `${base}/links?status=unsafe`)).body;
    expect(unsafe.items).toEqual([
      expect.objectContaining({ sourcePath: 'tools/install.md', href: null, hrefText: 'javascript:alert(1)', status: 'unsafe' }),
    ]);
    const external = (await read(t, `${base}/links?status=external`)).body.items[0];
    expect(external.href).toBe('https://example.org/parts');
    const grouped = (await read(t, `${base}/links?status=broken&groupBy=target`)).body;
    expect(grouped.items).toEqual([
      // The pages linking to each missing target, with their line, as the handbook fixture lays them out.
      {
        targetPath: 'missing.md',
        linkCount: 2,
        sourcePageCount: 2,
        sources: [
          { sourcePath: 'index.md', line: 11, column: 1 },
          { sourcePath: 'tools/setup.md', line: 8, column: 1 },
        ],
      },
      { targetPath: 'img/vise.png', linkCount: 1, sourcePageCount: 1, sources: [{ sourcePath: 'tools/setup.md', line: 10, column: 1 }] },
    ]);
    expect((await read(t, `${base}/links?page=tools/setup.md`)).body.total).toBe(4);
    expect((await read(t, `${base}/links?pageSize=5&page=3`)).body).toMatchObject({ total: 14, page: 3 });
  });

  it('lists islands and the score distribution', async () => {
    const islands = (await read(t, `${base}/islands`)).body;
    expect(islands.items.map((i: { pages: { path: string }[] }) => i.pages.map((p) => p.path).sort())).toEqual([
      ['spoke-log.md'],
      ['swap/left.md', 'swap/right.md'],
    ]);
    const distribution = (await read(t, `${base}/score-distribution`)).body;
    const shares = distribution.buckets.reduce((sum: number, b: { share: number }) => sum + b.share, 0);
    expect(shares).toBeCloseTo(1, 12);
    const top = (await read(t, `${base}/pages?pageSize=1`)).body.items[0];
    expect(distribution.topShares.top1).toBeCloseTo(top.stationaryScore, 12);
    expect(distribution.topShares.top50).toBeGreaterThanOrEqual(distribution.topShares.top10);
  });

  // docs/threats.md check 39: RFC 6266 Content-Disposition, formula cells prefixed with a quote.
  it('exports views as CSV with a safe file name and defused formulas', async () => {
    const response = await read(t, `${base}/export.csv?view=pages`);
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toMatch(/^text\/csv/);
    expect(response.headers['content-disposition']).toMatch(
      /^attachment; filename="Bike_Hub_-run-[0-9a-f]{8}-pages\.csv"; filename\*=UTF-8''Bike%20%22Hub%22%20%CE%B2-run-/,
    );
    const lines = response.text.trim().split('\r\n');
    expect(lines).toHaveLength(10);
    expect(lines.find((l) => l.startsWith('swap/left.md'))).toMatch(/^swap\/left\.md,'=SUM\(1\+1\) swap day,/);
    const broken = (await read(t, `${base}/export.csv?view=broken`)).text.trim().split('\r\n');
    expect(broken).toHaveLength(5);
    expect((await read(t, `${base}/export.csv?view=secrets`)).status).toBe(400);
  });

  it('exports exactly the rows the page list shows for the same filters', async () => {
    const filters = 'flags=orphan,unreachable&q=swap&sort=-inboundCount';
    const listed = (await read(t, `${base}/pages?${filters}&pageSize=500`)).body.items.map((p: { path: string }) => p.path).sort();
    expect(listed.length).toBeGreaterThan(0);
    const csv = (await read(t, `${base}/export.csv?view=pages&${filters}`)).text.trim().split('\r\n').slice(1);
    expect(csv.map((line) => line.split(',')[0]).sort()).toEqual(listed);
    expect((await read(t, `${base}/export.csv?view=pages&flags=nonsense`)).status).toBe(400);
  });
});
