import 'reflect-metadata';
import { defaultDocSetSettings } from '@linkloom/shared';
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { DomainEvents } from '../../common/events/domain-events.js';
import { DbService } from '../../db/db.service.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { AnalysisWorkerClient } from './analysis/analysis-worker-client.js';
import { INTERRUPTED, RunsService } from './runs.service.js';
import { queryRows } from './sql-values.js';
import { createDocSet, read, snapshotOf, startRun, waitForRun } from './testing/run-test-kit.js';

// Langville and Meyer, "Deeper Inside PageRank", Internet Mathematics 1(3), 2004, section 4: six pages,
// d = 0.9, page 2 a dead end. Scores as given in docs/metrics.md (recalled from memory there and reproduced by
// independent computation). Page 1 is the doc set's root index page, so it is the entry page.
const PAGES = ['index.md', 'two.md', 'three.md', 'four.md', 'five.md', 'six.md'];
const EDGES = [
  [1, 2],
  [1, 3],
  [3, 1],
  [3, 2],
  [3, 5],
  [4, 5],
  [4, 6],
  [5, 4],
  [5, 6],
  [6, 4],
];
const PUBLISHED = [0.03721, 0.05396, 0.04151, 0.3751, 0.206, 0.2862];

describe('runs', () => {
  let t: TestApp;
  let docSetId: string;
  beforeAll(async () => {
    t = await createTestApp();
    docSetId = await createDocSet(t, 'Deeper inside');
    await snapshotOf(
      t,
      docSetId,
      PAGES.map((path) => ({ path })),
      EDGES.map(([s, d]) => ({ from: PAGES[s - 1], to: PAGES[d - 1] })),
    );
  });
  afterAll(async () => t?.close());

  it('computes the published six-page example in a worker thread and stores every metric', async () => {
    const runId = await startRun(t, docSetId, { damping: 0.9 });
    const run = await waitForRun(t, docSetId, runId);
    expect(run).toMatchObject({ status: 'finished', trigger: 'manual', warnings: [] });
    expect(run.settings.damping).toBe(0.9);
    expect(run.counts).toMatchObject({
      pages: 6,
      links: 10,
      internalLinks: 10,
      brokenLinks: 0,
      orphans: 0,
      deadEnds: 1,
      unreachable: 0,
      deepPages: 0,
      islands: 0,
    });
    expect(run.residual).toBeLessThan(1e-10);
    const list = await read(t, `/api/doc-sets/${docSetId}/runs/${runId}/pages?sort=path&pageSize=10`);
    const byPath = new Map(list.body.items.map((item: { path: string }) => [item.path, item]));
    PAGES.forEach((path, i) => {
      const item = byPath.get(path) as Record<string, number>;
      // Four significant figures as published (Langville and Meyer 2004, section 4).
      expect(Math.abs(item.stationaryScore - PUBLISHED[i]), path).toBeLessThan(5e-5 * Math.max(1, PUBLISHED[i] * 10));
      expect(item.timesAverage).toBeCloseTo(item.stationaryScore * 6, 12);
    });
    // Hand-counted from the edge list: distinct linking / linked pages, clicks from index.md.
    expect(PAGES.map((p) => (byPath.get(p) as { inboundCount: number }).inboundCount)).toEqual([1, 2, 1, 2, 2, 2]);
    expect(PAGES.map((p) => (byPath.get(p) as { outboundCount: number }).outboundCount)).toEqual([2, 0, 3, 2, 2, 1]);
    expect(PAGES.map((p) => (byPath.get(p) as { depth: number }).depth)).toEqual([0, 1, 1, 3, 2, 3]);
    expect(PAGES.map((p) => (byPath.get(p) as { rank: number }).rank)).toEqual([6, 4, 5, 1, 3, 2]);
    expect((byPath.get('two.md') as { deadEnd: boolean }).deadEnd).toBe(true);
  });

  it('queues two runs of one doc set and executes them one after the other', async () => {
    const [first, second] = await Promise.all([startRun(t, docSetId), startRun(t, docSetId, { depthThreshold: 2 })]);
    const [a, b] = [await waitForRun(t, docSetId, first), await waitForRun(t, docSetId, second)];
    expect([a.status, b.status]).toEqual(['finished', 'finished']);
    const [earlier, later] = a.startedAt! <= b.startedAt! ? [a, b] : [b, a];
    expect(Date.parse(later.startedAt!)).toBeGreaterThanOrEqual(Date.parse(earlier.finishedAt!));
    // depthThreshold 2 makes four.md and six.md (3 clicks) deep.
    expect(b.counts?.deepPages).toBe(2);
    expect(a.counts?.deepPages).toBe(0);
    const listed = await read(t, `/api/doc-sets/${docSetId}/runs?pageSize=2`);
    expect(listed.body.total).toBeGreaterThanOrEqual(3);
    expect(listed.body.items).toHaveLength(2);
  });

  it('marks a failing run failed and leaves earlier runs and their results intact', async () => {
    const before = await read(t, `/api/doc-sets/${docSetId}/runs/latest`);
    const spy = vi.spyOn(t.app.get(AnalysisWorkerClient), 'analyze').mockRejectedValueOnce(new Error('worker crashed'));
    const failedId = await startRun(t, docSetId);
    const failed = await waitForRun(t, docSetId, failedId);
    spy.mockRestore();
    expect(failed.status).toBe('failed');
    expect(failed.error).toMatch(/internal error/);
    const latest = await read(t, `/api/doc-sets/${docSetId}/runs/latest`);
    expect(latest.body.id).toBe(before.body.id);
    expect((await read(t, `/api/doc-sets/${docSetId}/runs/${before.body.id}/pages`)).body.total).toBe(6);
    expect((await read(t, `/api/doc-sets/${docSetId}/runs/${failedId}/pages`)).status).toBe(409);
  });

  it('turns runs left queued or running by a crash into failed runs on start', async () => {
    const db = t.app.get(DbService).db;
    const [{ id }] = await queryRows<{ id: string }>(
      db,
      sql`insert into runs (doc_set_id, snapshot_id, status, trigger, settings)
          select doc_set_id, id, 'running', 'manual', ${JSON.stringify(defaultDocSetSettings())}::jsonb from snapshots where doc_set_id = ${docSetId} limit 1 returning id`,
    );
    await t.app.get(RunsService).onApplicationBootstrap();
    const run = await read(t, `/api/doc-sets/${docSetId}/runs/${id}`);
    expect(run.body).toMatchObject({ status: 'failed', error: INTERRUPTED });
  });

  it('starts a run with trigger import when a snapshot becomes ready', async () => {
    const other = await createDocSet(t, 'Imported');
    const { snapshotId } = await snapshotOf(t, other, [{ path: 'index.md' }, { path: 'a.md' }], [{ from: 'index.md', to: 'a.md' }]);
    await t.app.get(DomainEvents).emit('snapshot.ready', { docSetId: other, snapshotId, trigger: 'import', actorId: null });
    const listed = await read(t, `/api/doc-sets/${other}/runs`);
    expect(listed.body.items[0]).toMatchObject({ trigger: 'import', snapshotId });
    expect((await waitForRun(t, other, listed.body.items[0].id)).status).toBe('finished');
  });

  it('lets only editors and admins start runs, and explains a doc set without a snapshot', async () => {
    for (const role of ['viewer', 'writer'] as const) {
      const response = await t.http
        .post(`/api/doc-sets/${docSetId}/runs`)
        .set('Authorization', `Bearer ${await t.tokenFor(role)}`)
        .send({});
      expect(response.status, role).toBe(403);
    }
    const empty = await createDocSet(t, 'Empty');
    const response = await t.http
      .post(`/api/doc-sets/${empty}/runs`)
      .set('Authorization', `Bearer ${await t.tokenFor('editor')}`)
      .send({});
    expect(response.status).toBe(409);
    expect(response.body.code).toBe('NO_READY_SNAPSHOT');
    const bad = await t.http
      .post(`/api/doc-sets/${docSetId}/runs`)
      .set('Authorization', `Bearer ${await t.tokenFor('editor')}`)
      .send({ settings: { damping: 1.5 } });
    expect(bad.status).toBe(400);
    expect((await read(t, `/api/doc-sets/${docSetId}/runs/not-a-run`)).status).toBe(400);
  });

  it('warns when a doc set has no entry page and judges no page unreachable', async () => {
    const noIndex = await createDocSet(t, 'No index');
    await snapshotOf(t, noIndex, [{ path: 'a.md' }, { path: 'b.md' }, { path: 'c.md' }], [{ from: 'a.md', to: 'b.md' }]);
    const run = await waitForRun(t, noIndex, await startRun(t, noIndex));
    expect(run.warnings.map((w: { code: string }) => w.code)).toEqual(['NO_ENTRY_PAGE']);
    expect(run.counts).toMatchObject({ unreachable: 0, deepPages: 0, islands: 1 });
  });
});
