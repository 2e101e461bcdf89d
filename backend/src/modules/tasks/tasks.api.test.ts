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
    expect(cranes.details).toContain('cranes/maintenance.md line 12: ../safety/lockout.md (broken)');
    expect(cranes.details).toContain('cranes/maintenance.md line 40: manual.md#torque (broken-anchor)');
    expect(cranes.finding.brokenLinks).toHaveLength(2);
    const viewer = await t.http
      .post('/api/tasks/bulk')
      .set('Authorization', await as('editor'))
      .send({ docSetId, kind: 'other', pagePaths: ['index.md'], assigneeId: ids.viewer });
    expect(viewer.status).toBe(422);
  });

  it('shows writers only their tasks and lets them change only the status (docs/threats.md check 60)', async () => {
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

  it('turns selected links into tasks holding exactly those links: one per row, or one grouped task', async () => {
    const editor = await as('editor');
    const lockout = { sourcePath: 'cranes/maintenance.md', href: '../safety/lockout.md', line: 12 };
    const torque = { sourcePath: 'cranes/maintenance.md', href: 'manual.md#torque', line: 40 };
    const perRow = await t.http
      .post('/api/tasks/bulk')
      .set('Authorization', editor)
      .send({ docSetId, kind: 'repair-broken-links', links: [lockout], grouping: 'per-row', assigneeId: ids.writer });
    expect(perRow.status).toBe(201);
    expect(perRow.body.items).toHaveLength(1);
    // Only the selected link, not every broken link of the page.
    expect(perRow.body.items[0].finding.brokenLinks).toEqual([{ ...lockout, status: 'broken' }]);
    expect(perRow.body.items[0].title).toBe('Repair broken link on cranes/maintenance.md: ../safety/lockout.md');
    const grouped = await t.http
      .post('/api/tasks/bulk')
      .set('Authorization', editor)
      .send({ docSetId, kind: 'repair-broken-links', links: [lockout, torque], grouping: 'grouped', assigneeId: ids.writer });
    expect(grouped.body.items).toHaveLength(1);
    expect(grouped.body.items[0].finding.brokenLinks.map((l: { href: string }) => l.href)).toEqual([
      '../safety/lockout.md',
      'manual.md#torque',
    ]);
    expect(grouped.body.items[0].details).toContain('cranes/maintenance.md line 40: manual.md#torque (broken-anchor)');
  });

  it('refuses a selected link the latest run does not find, and creates nothing (422)', async () => {
    const before = (await db.select({ n: count() }).from(tasks))[0].n;
    const response = await t.http
      .post('/api/tasks/bulk')
      .set('Authorization', await as('editor'))
      .send({ docSetId, kind: 'repair-broken-links', links: [{ sourcePath: 'index.md', href: 'made-up.md', line: 1 }] });
    expect(response.status).toBe(422);
    expect(response.body.code).toBe('FINDING_NOT_IN_LATEST_RUN');
    expect(response.body.details).toEqual([{ sourcePath: 'index.md', href: 'made-up.md', line: 1 }]);
    expect((await db.select({ n: count() }).from(tasks))[0].n).toBe(before);
    const both = await t.http
      .post('/api/tasks/bulk')
      .set('Authorization', await as('editor'))
      .send({ docSetId, kind: 'other', pagePaths: ['index.md'], links: [{ sourcePath: 'index.md', href: 'x.md', line: 1 }] });
    expect(both.status).toBe(400);
  });

  it('groups selected pages into one task that every listed page shows', async () => {
    const editor = await as('editor');
    const response = await t.http
      .post('/api/tasks/bulk')
      .set('Authorization', editor)
      .send({ docSetId, kind: 'add-outbound-links', pagePaths: ['tides/tables.md', 'index.md'], grouping: 'grouped' });
    expect(response.body.items).toHaveLength(1);
    const task = response.body.items[0];
    expect(task.finding.pages).toEqual([
      { path: 'tides/tables.md', flags: ['dead-end'] },
      { path: 'index.md', flags: [] },
    ]);
    const onSecondPage = await t.http
      .get(`/api/tasks?docSetId=${docSetId}&pagePath=index.md&kind=add-outbound-links`)
      .set('Authorization', editor);
    expect(onSecondPage.body.items.map((i: { id: string }) => i.id)).toContain(task.id);
  });

  it('keeps "verified" for runs: a person setting it gets a 400 that says why', async () => {
    const [task] = (await t.http.get(`/api/tasks?docSetId=${docSetId}`).set('Authorization', await as('editor'))).body.items;
    const response = await t.http
      .patch(`/api/tasks/${task.id}`)
      .set('Authorization', await as('editor'))
      .send({ status: 'verified' });
    expect(response.status).toBe(400);
    expect(response.body.message).toContain('"verified" is set by a run');
  });

  it('follows the page into the next snapshot and verifies, flags and reopens by what each run shows, link by link', async () => {
    const editor = await as('editor');
    const find = async (pagePath: string, kind: string) =>
      (await t.http.get(`/api/tasks?docSetId=${docSetId}&pagePath=${pagePath}&kind=${kind}&pageSize=100`).set('Authorization', editor)).body
        .items;
    const grouped = (await find('cranes/maintenance.md', 'repair-broken-links')).find(
      (x: { title: string; finding: { brokenLinks?: unknown[] } }) => x.finding.brokenLinks?.length === 2 && x.title.startsWith('Repair 2'),
    );
    await t.http
      .patch(`/api/tasks/${grouped.id}`)
      .set('Authorization', await as('writer'))
      .send({ status: 'done' });
    const events = t.app.get(DomainEvents);
    // Run 2: the berth page gained links; of the two crane links only the lockout one was repaired.
    const second = basePages().map((p) => {
      if (p.path === 'berths/allocation.md') return { ...p, orphan: false };
      if (p.path === 'cranes/maintenance.md')
        return { ...p, brokenLinks: [{ href: 'manual.md#torque', line: 41, status: 'broken-anchor' as const }] };
      return p;
    });
    const run2 = await insertFixtureRun(db, docSetId, second);
    await events.emit('run.finished', { docSetId, runId: run2.runId, trigger: 'manual' });
    const [berth] = await find('berths/allocation.md', 'add-inbound-links');
    expect(berth).toMatchObject({ status: 'verified', verification: 'verified', check: { outcome: 'verified', runNumber: 2 } });
    const flagged = (await t.http.get(`/api/tasks/${grouped.id}`).set('Authorization', editor)).body;
    expect(flagged).toMatchObject({ status: 'done', verification: 'flagged' });
    expect(flagged.check.items.map((i: { href: string; stillFound: boolean; line: number }) => [i.href, i.stillFound, i.line])).toEqual([
      ['../safety/lockout.md', false, 12],
      ['manual.md#torque', true, 41],
    ]);
    expect(flagged.events.at(-1).body).toBe(
      'Marked done, but run 2 still finds 1 of 2: cranes/maintenance.md line 41: manual.md#torque (broken-anchor).',
    );

    // Run 3: the orphan is back: the task reopens and its assignee (the page owner, the writer) is told.
    const reopenMails = async () =>
      (
        await db
          .select({ n: count() })
          .from(outbox)
          .where(and(eq(outbox.toAddress, WRITER), eq(outbox.kind, 'task-reopened')))
      )[0].n;
    const before = await reopenMails();
    const run3 = await insertFixtureRun(db, docSetId, basePages());
    await events.emit('run.finished', { docSetId, runId: run3.runId, trigger: 'manual' });
    const reopened = (await t.http.get(`/api/tasks/${berth.id}`).set('Authorization', editor)).body;
    expect(reopened).toMatchObject({ status: 'open', verification: null, check: { outcome: 'reopened', runNumber: 3 } });
    expect(reopened.events.at(-1).body).toBe('Run 3 finds it again, so it is reopened. Still found: 1 of 1: berths/allocation.md.');
    expect(await reopenMails()).toBe(before + 1);
    const [mail] = await db
      .select()
      .from(outbox)
      .where(and(eq(outbox.toAddress, WRITER), eq(outbox.kind, 'task-reopened')));
    expect(mail.headers['List-Unsubscribe-Post']).toBe('List-Unsubscribe=One-Click');
    expect(mail.text).toContain('reopened by run 3');

    // With "task reopened" switched off, the next reopening is recorded but mails nobody.
    await t.http
      .patch('/api/me/notifications')
      .set('Authorization', await as('writer'))
      .send({ kinds: { 'task-reopened': false } });
    const run4 = await insertFixtureRun(db, docSetId, second);
    await events.emit('run.finished', { docSetId, runId: run4.runId, trigger: 'manual' });
    const run5 = await insertFixtureRun(db, docSetId, basePages());
    await events.emit('run.finished', { docSetId, runId: run5.runId, trigger: 'manual' });
    expect((await t.http.get(`/api/tasks/${berth.id}`).set('Authorization', editor)).body.check).toMatchObject({
      outcome: 'reopened',
      runNumber: 5,
    });
    expect(await reopenMails()).toBe(before + 1);
  });
});
