import 'reflect-metadata';
import { and, count, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { DomainEvents } from '../../common/events/domain-events.js';
import { DbService } from '../../db/db.service.js';
import { outbox, tasks } from '../../db/schema/index.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { AuditService } from '../audit/audit.service.js';
import { createFixtureDocSet, type FixturePage, insertFixtureRun } from './testing/findings-fixture.js';

const WRITER = 'writer@demo.linkloom.test';
const basePages = (): FixturePage[] => [
  { path: 'index.md', title: 'Harbour ops' },
  { path: 'berths/allocation.md', title: 'Berth allocation', orphan: true, ownerEmail: WRITER },
  {
    path: 'cranes/maintenance.md',
    title: 'Crane maintenance',
    brokenLinks: [
      { href: '../safety/lockout.md', line: 12 },
      { href: 'manual.md#torque', line: 40, status: 'broken-anchor' },
    ],
  },
  { path: 'tides/tables.md', title: 'Tide tables', deadEnd: true, ownerEmail: 'nobody@elsewhere.test' },
];

describe('fix tasks', () => {
  let t: TestApp;
  let db: DbService['db'];
  let docSetId: string;
  const ids: Record<string, string> = {};
  const as = async (role: 'admin' | 'editor' | 'writer' | 'viewer') => `Bearer ${await t.tokenFor(role)}`;
  const mailsTo = async (email: string) =>
    (
      await db
        .select({ n: count() })
        .from(outbox)
        .where(and(eq(outbox.toAddress, email), eq(outbox.kind, 'task-assigned')))
    )[0].n;

  beforeAll(async () => {
    t = await createTestApp();
    db = t.app.get(DbService).db;
    docSetId = await createFixtureDocSet(db);
    await insertFixtureRun(db, docSetId, basePages(), new Date(Date.now() - 60_000));
    for (const role of ['admin', 'editor', 'writer', 'viewer'] as const) {
      ids[role] = (await t.http.get('/api/me').set('Authorization', await as(role))).body.id;
    }
  });
  afterAll(async () => t?.close());

  it('lets editors and admins create, and refuses writers and viewers (403)', async () => {
    const body = { docSetId, pagePath: 'index.md', kind: 'other', title: 'Check the intro' };
    for (const role of ['writer', 'viewer'] as const) {
      expect(
        (
          await t.http
            .post('/api/tasks')
            .set('Authorization', await as(role))
            .send(body)
        ).status,
        role,
      ).toBe(403);
      expect(
        (
          await t.http
            .post('/api/tasks/bulk')
            .set('Authorization', await as(role))
            .send({ docSetId, kind: 'other', pagePaths: ['index.md'] })
        ).status,
        role,
      ).toBe(403);
    }
    expect(
      (
        await t.http
          .post('/api/tasks')
          .set('Authorization', await as('admin'))
          .send(body)
      ).status,
    ).toBe(201);
    expect(
      (
        await t.http
          .post('/api/tasks')
          .set('Authorization', await as('editor'))
          .send({ ...body, status: 'done' })
      ).status,
    ).toBe(400);
  });

  it('assigns the front-matter owner by default and enqueues exactly one e-mail for the assignment', async () => {
    const before = await mailsTo(WRITER);
    const response = await t.http
      .post('/api/tasks')
      .set('Authorization', await as('editor'))
      .send({
        docSetId,
        pagePath: 'berths/allocation.md',
        kind: 'add-inbound-links',
        title: 'Link the berth allocation page',
        dueDate: '2020-01-31',
      });
    expect(response.status).toBe(201);
    expect(response.body).toMatchObject({ assignee: { id: ids.writer }, status: 'open', overdue: true, finding: { flags: ['orphan'] } });
    expect(await mailsTo(WRITER)).toBe(before + 1);
    // An owner who is not a user leaves the task unassigned, and no mail goes out.
    const unowned = await t.http
      .post('/api/tasks')
      .set('Authorization', await as('editor'))
      .send({ docSetId, pagePath: 'tides/tables.md', kind: 'add-outbound-links', title: 'Link onwards' });
    expect(unowned.body.assignee).toBeNull();
    expect((await db.select({ n: count() }).from(outbox).where(eq(outbox.toAddress, 'nobody@elsewhere.test')))[0].n).toBe(0);
  });

  it('writes the mail in the same transaction as the assignment: a failure after it leaves neither', async () => {
    const audit = t.app.get(AuditService);
    const spy = vi.spyOn(audit, 'record').mockRejectedValueOnce(new Error('disk hiccup'));
    const tasksBefore = (await db.select({ n: count() }).from(tasks))[0].n;
    const mailsBefore = await mailsTo(WRITER);
    const response = await t.http
      .post('/api/tasks')
      .set('Authorization', await as('editor'))
      .send({ docSetId, pagePath: 'index.md', kind: 'other', title: 'Rolled back', assigneeId: ids.writer });
    spy.mockRestore();
    expect(response.status).toBe(500);
    expect((await db.select({ n: count() }).from(tasks))[0].n).toBe(tasksBefore);
    expect(await mailsTo(WRITER)).toBe(mailsBefore);
  });

  it('creates one task per page in bulk, prefilled with the broken hrefs and their lines', async () => {
    const response = await t.http
      .post('/api/tasks/bulk')
      .set('Authorization', await as('editor'))
      .send({
        docSetId,
        kind: 'repair-broken-links',
        pagePaths: ['cranes/maintenance.md', 'index.md'],
        assigneeId: ids.writer,
        priority: 'high',
      });
    expect(response.status).toBe(201);
    expect(response.body.items).toHaveLength(2);
    const cranes = response.body.items.find((i: { pagePath: string }) => i.pagePath === 'cranes/maintenance.md');
    expect(cranes.title).toBe('Repair broken links on cranes/maintenance.md (2)');
    expect(cranes.details).toContain('line 12: ../safety/lockout.md (broken)');
    expect(cranes.details).toContain('line 40: manual.md#torque (broken-anchor)');
    expect(cranes.finding.brokenLinks).toHaveLength(2);
    const viewer = await t.http
      .post('/api/tasks/bulk')
      .set('Authorization', await as('editor'))
      .send({ docSetId, kind: 'other', pagePaths: ['index.md'], assigneeId: ids.viewer });
    expect(viewer.status).toBe(422);
  });

  it('shows writers only their tasks and lets them change only the status (RELIABILITY check 60)', async () => {
    const other = await t.http
      .post('/api/tasks')
      .set('Authorization', await as('editor'))
      .send({ docSetId, pagePath: 'index.md', kind: 'other', title: 'Editor’s own', assigneeId: ids.editor });
    const writer = await as('writer');
    const list = await t.http.get('/api/tasks?assignee=' + ids.editor).set('Authorization', writer);
    expect(list.status).toBe(200);
    expect(list.body.items.length).toBeGreaterThan(0);
    expect(list.body.items.every((i: { assignee: { id: string } }) => i.assignee.id === ids.writer)).toBe(true);
    expect((await t.http.get(`/api/tasks/${other.body.id}`).set('Authorization', writer)).status).toBe(404);
    expect((await t.http.patch(`/api/tasks/${other.body.id}`).set('Authorization', writer).send({ status: 'done' })).status).toBe(404);
    expect((await t.http.post(`/api/tasks/${other.body.id}/comments`).set('Authorization', writer).send({ body: 'hi' })).status).toBe(404);
    const own = list.body.items[0];
    expect((await t.http.patch(`/api/tasks/${own.id}`).set('Authorization', writer).send({ assigneeId: ids.editor })).status).toBe(403);
    expect((await t.http.patch(`/api/tasks/${own.id}`).set('Authorization', writer).send({ status: 'in-progress' })).status).toBe(200);
    expect((await t.http.post(`/api/tasks/${own.id}/comments`).set('Authorization', writer).send({ body: 'On it.' })).status).toBe(201);
    const viewer = await as('viewer');
    expect((await t.http.get(`/api/tasks/${other.body.id}`).set('Authorization', viewer)).status).toBe(200);
    expect((await t.http.patch(`/api/tasks/${own.id}`).set('Authorization', viewer).send({ status: 'done' })).status).toBe(403);
    expect((await t.http.post(`/api/tasks/${own.id}/comments`).set('Authorization', viewer).send({ body: 'x' })).status).toBe(403);
    const detail = await t.http.get(`/api/tasks/${own.id}`).set('Authorization', writer);
    expect(detail.body.events.map((e: { type: string }) => e.type)).toEqual(['change', 'change', 'comment']);
    expect(detail.body.events[1].changes.status).toEqual({ from: 'open', to: 'in-progress' });
  });

  it('filters by status, kind, page and overdue, and rejects unknown sort keys', async () => {
    const editor = await as('editor');
    const overdue = await t.http.get(`/api/tasks?docSetId=${docSetId}&overdue=true`).set('Authorization', editor);
    expect(overdue.body.items.map((i: { pagePath: string }) => i.pagePath)).toEqual(['berths/allocation.md']);
    const byKind = await t.http.get(`/api/tasks?kind=repair-broken-links&pagePath=cranes/maintenance.md`).set('Authorization', editor);
    expect(byKind.body.total).toBe(1);
    expect((await t.http.get('/api/tasks?sort=title;DROP TABLE tasks').set('Authorization', editor)).status).toBe(400);
    expect((await t.http.get('/api/tasks?status=closed').set('Authorization', editor)).status).toBe(400);
  });

  it('follows the page into the next snapshot and verifies, flags and reopens by what each run shows', async () => {
    const editor = await as('editor');
    const find = async (pagePath: string, kind: string) =>
      (await t.http.get(`/api/tasks?docSetId=${docSetId}&pagePath=${pagePath}&kind=${kind}`).set('Authorization', editor)).body.items[0];
    const cranes = await find('cranes/maintenance.md', 'repair-broken-links');
    await t.http
      .patch(`/api/tasks/${cranes.id}`)
      .set('Authorization', await as('writer'))
      .send({ status: 'done' });
    const events = t.app.get(DomainEvents);
    // Run 2: the berth page gained links, the crane links are still broken.
    const second = basePages().map((p) => (p.path === 'berths/allocation.md' ? { ...p, orphan: false } : p));
    const run2 = await insertFixtureRun(db, docSetId, second);
    await events.emit('run.finished', { docSetId, runId: run2.runId, trigger: 'manual' });
    expect(await find('berths/allocation.md', 'add-inbound-links')).toMatchObject({ status: 'done', verification: 'verified' });
    expect(await find('cranes/maintenance.md', 'repair-broken-links')).toMatchObject({ status: 'done', verification: 'flagged' });
    expect(await find('tides/tables.md', 'add-outbound-links')).toMatchObject({ status: 'open', verification: null });
    // Run 3: the orphan is back.
    const run3 = await insertFixtureRun(db, docSetId, basePages());
    await events.emit('run.finished', { docSetId, runId: run3.runId, trigger: 'manual' });
    const berth = await find('berths/allocation.md', 'add-inbound-links');
    expect(berth).toMatchObject({ status: 'open', verification: null });
    const history = (await t.http.get(`/api/tasks/${berth.id}`).set('Authorization', editor)).body.events.map(
      (e: { body: string }) => e.body,
    );
    expect(history.some((b: string) => b.includes('verified'))).toBe(true);
    expect(history.at(-1)).toContain('reopened');
  });
});
