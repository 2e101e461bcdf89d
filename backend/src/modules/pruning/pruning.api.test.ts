import 'reflect-metadata';
import { and, count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DbService } from '../../db/db.service.js';
import { auditLog, outbox, pruningDecisions } from '../../db/schema/index.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { createFixtureDocSet, type FixturePage, insertFixtureRun } from '../tasks/testing/findings-fixture.js';
import { PruningRefreshService } from './pruning-refresh.service.js';

const pages = (over: Record<string, Partial<FixturePage>> = {}): FixturePage[] =>
  [
    { path: 'index.md', stationaryScore: 0.4 },
    { path: 'guide/quay-cranes.md', stationaryScore: 0.2 },
    { path: 'guide/old-ferry-times.md', orphan: true, stationaryScore: 0.01, wordCount: 30 },
    { path: 'guide/draft-notes.md', orphan: true, stationaryScore: 0.02, reviewedAt: '2019-03-01' },
    { path: 'guide/frozen.md', orphan: true, stationaryScore: 0.03, wordCount: 12, protected: true },
    { path: 'legal/notice.md', orphan: true, stationaryScore: 0.04, wordCount: 12 },
    { path: 'guide/pilots.md', stationaryScore: 0.3 },
    { path: 'guide/moorings.md', stationaryScore: 0.3 },
  ].map((p) => ({ ...p, ...(over[p.path] ?? {}) }));

describe('pruning list', () => {
  let t: TestApp;
  let db: DbService['db'];
  let docSetId: string;
  const as = async (role: 'admin' | 'editor' | 'writer' | 'viewer') => `Bearer ${await t.tokenFor(role)}`;
  const list = async (query = '') =>
    (await t.http.get(`/api/doc-sets/${docSetId}/pruning${query}`).set('Authorization', await as('viewer'))).body;

  beforeAll(async () => {
    t = await createTestApp();
    db = t.app.get(DbService).db;
    docSetId = await createFixtureDocSet(db, 'Harbour Ops ="Handbook"');
    const editor = await as('editor');
    await t.http
      .patch(`/api/doc-sets/${docSetId}`)
      .set('Authorization', editor)
      .send({ settings: { pruning: { protectGlobs: ['legal/**'], lowScorePercentile: 40 } } });
    const run = await insertFixtureRun(db, docSetId, pages());
    await t.app.get(PruningRefreshService).refresh(docSetId, run.runId);
  });
  afterAll(async () => t?.close());

  it('proposes candidates with their reasons, never protected pages, and mails editors once', async () => {
    const body = await list();
    expect(body.items.map((i: { path: string }) => i.path)).toEqual(['guide/draft-notes.md', 'guide/old-ferry-times.md']);
    expect(body.items[1].reasons.map((r: { rule: string }) => r.rule)).toEqual(['orphan', 'low-score', 'thin']);
    expect(body.version).toBe(1);
    const mails = await db.select({ to: outbox.toAddress }).from(outbox).where(eq(outbox.kind, 'pruning-waiting'));
    expect(mails.map((m) => m.to).sort()).toEqual(['admin@demo.linkloom.test', 'editor@demo.linkloom.test']);
  });

  it('takes nominations from writers with a reason, not from viewers, and only for pages in the run', async () => {
    const writer = await as('writer');
    const ok = await t.http
      .post(`/api/doc-sets/${docSetId}/pruning/nominations`)
      .set('Authorization', writer)
      .send({ path: 'guide/pilots.md', reason: 'Replaced by the pilot roster' });
    expect(ok.status).toBe(201);
    expect(ok.body.reasons).toEqual([{ rule: 'nominated', detail: 'Nominated by Wren Writer (demo): Replaced by the pilot roster' }]);
    expect(
      (
        await t.http
          .post(`/api/doc-sets/${docSetId}/pruning/nominations`)
          .set('Authorization', await as('viewer'))
          .send({ path: 'guide/pilots.md', reason: 'nope' })
      ).status,
    ).toBe(403);
    expect(
      (
        await t.http
          .post(`/api/doc-sets/${docSetId}/pruning/nominations`)
          .set('Authorization', writer)
          .send({ path: 'nowhere.md', reason: 'gone' })
      ).status,
    ).toBe(422);
    const audit = await db.select({ n: count() }).from(auditLog).where(eq(auditLog.action, 'pruning.nominated'));
    expect(audit[0].n).toBe(1);
  });

  it('lets only editors decide, and refuses a stale version with 409 (docs/threats.md checks 57 and 63)', async () => {
    const { version } = await list();
    const decisions = [{ path: 'guide/old-ferry-times.md', decision: 'approve', note: '=cmd|/c calc' }];
    expect(
      (
        await t.http
          .post(`/api/doc-sets/${docSetId}/pruning/decisions`)
          .set('Authorization', await as('writer'))
          .send({ version, decisions })
      ).status,
    ).toBe(403);
    const [a, b] = await Promise.all([
      t.http
        .post(`/api/doc-sets/${docSetId}/pruning/decisions`)
        .set('Authorization', await as('editor'))
        .send({ version, decisions }),
      t.http
        .post(`/api/doc-sets/${docSetId}/pruning/decisions`)
        .set('Authorization', await as('admin'))
        .send({ version, decisions: [{ ...decisions[0], decision: 'reject' }] }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 409]);
    expect([a, b].find((r) => r.status === 409)!.body.code).toBe('PRUNING_LIST_CHANGED');
    const applied = await db.select().from(pruningDecisions).where(eq(pruningDecisions.path, 'guide/old-ferry-times.md'));
    expect(applied).toHaveLength(1);
    expect(
      (
        await db
          .select({ n: count() })
          .from(auditLog)
          .where(and(eq(auditLog.entityType, 'pruning-page'), eq(auditLog.docSetId, docSetId)))
      )[0].n,
    ).toBe(2);
  });

  it('changes nothing when a bulk decision names a page that is not on the list', async () => {
    const { version } = await list();
    const response = await t.http
      .post(`/api/doc-sets/${docSetId}/pruning/decisions`)
      .set('Authorization', await as('editor'))
      .send({
        version,
        decisions: [
          { path: 'guide/draft-notes.md', decision: 'approve', note: '' },
          { path: 'index.md', decision: 'approve', note: '' },
        ],
      });
    expect(response.status).toBe(422);
    expect((await list()).version).toBe(version);
    expect(await db.select().from(pruningDecisions).where(eq(pruningDecisions.path, 'guide/draft-notes.md'))).toHaveLength(0);
  });

  it('carries decisions into the next snapshot by path and flags an approved page that gained links', async () => {
    await forceApprove();
    const next = await insertFixtureRun(db, docSetId, pages({ 'guide/old-ferry-times.md': { orphan: false, inboundCount: 3 } }));
    await t.app.get(PruningRefreshService).refresh(docSetId, next.runId);
    const item = (await list('?status=approve')).items.find((i: { path: string }) => i.path === 'guide/old-ferry-times.md');
    expect(item.decision).toMatchObject({ decision: 'approve', flagged: true });
    expect(item.decision.flagReason).toContain('3 inbound link(s)');
    expect((await list('?status=flagged')).total).toBe(1);
  });

  it('exports the approved list as guarded CSV and as plain paths, with an RFC 6266 file name', async () => {
    const csv = await t.http.get(`/api/doc-sets/${docSetId}/pruning/export.csv`).set('Authorization', await as('viewer'));
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toContain('text/csv');
    expect(csv.headers['content-disposition']).toBe(
      `attachment; filename="pruning-approved-Harbour-Ops-=-Handbook-.csv"; filename*=UTF-8''pruning-approved-Harbour-Ops-%3D-Handbook-.csv`,
    );
    const [header, row] = csv.text.split('\r\n');
    expect(header).toBe('path,title,note,approvedBy,approvedAt,needsAnotherLook');
    expect(row.startsWith(`guide/old-ferry-times.md,guide/old-ferry-times.md,'=cmd|/c calc,`)).toBe(true);
    const txt = await t.http.get(`/api/doc-sets/${docSetId}/pruning/export.txt`).set('Authorization', await as('viewer'));
    expect(txt.text).toBe('guide/old-ferry-times.md\n');
  });

  async function forceApprove() {
    const { version } = await list();
    const response = await t.http
      .post(`/api/doc-sets/${docSetId}/pruning/decisions`)
      .set('Authorization', await as('editor'))
      .send({ version, decisions: [{ path: 'guide/old-ferry-times.md', decision: 'approve', note: '=cmd|/c calc' }] });
    expect(response.status).toBe(200);
  }
});
