// @vitest-environment jsdom
// The contract between server and screens, checked end to end: the built server on the demo data, and every
// API file of the front end called in turn, so that each real answer goes through the front end's own parser
// (the response schemas of shared/). The server's own response check is switched off here, as in production:
// what judges each answer is the screens' parser. A field renamed on either side fails its call below.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Run } from '@linkloom/shared';
import { setSession } from '../frontend/src/lib/session.js';
import { signIn } from '../frontend/src/features/auth/api/sign-in.js';
import { changePassword } from '../frontend/src/features/auth/api/change-password.js';
import { signOut } from '../frontend/src/features/auth/api/sign-out.js';
import { getHealth } from '../frontend/src/features/health/api/get-health.js';
import { getDocSets } from '../frontend/src/features/doc-sets/api/get-doc-sets.js';
import { getDocSet } from '../frontend/src/features/doc-sets/api/get-doc-set.js';
import { createDocSet } from '../frontend/src/features/doc-sets/api/create-doc-set.js';
import { updateDocSet } from '../frontend/src/features/doc-sets/api/update-doc-set.js';
import { createToken } from '../frontend/src/features/doc-sets/api/create-token.js';
import { getTokens } from '../frontend/src/features/doc-sets/api/get-tokens.js';
import { deleteToken } from '../frontend/src/features/doc-sets/api/delete-token.js';
import { uploadArchive } from '../frontend/src/features/doc-sets/api/upload-archive.js';
import { getSnapshots } from '../frontend/src/features/doc-sets/api/get-snapshots.js';
import { getSnapshot } from '../frontend/src/features/doc-sets/api/get-snapshot.js';
import { getTopPages } from '../frontend/src/features/doc-sets/api/get-top-pages.js';
import { getScoreDistribution } from '../frontend/src/features/doc-sets/api/get-score-distribution.js';
import { getRuns } from '../frontend/src/features/runs/api/get-runs.js';
import { createRun } from '../frontend/src/features/runs/api/create-run.js';
import { getRunDiff } from '../frontend/src/features/runs/api/get-run-diff.js';
import { getRun } from '../frontend/src/features/pages/api/get-run.js';
import { getPages } from '../frontend/src/features/pages/api/get-pages.js';
import { getPage } from '../frontend/src/features/pages/api/get-page.js';
import { exportCsv } from '../frontend/src/features/pages/api/export-csv.js';
import { getLinks } from '../frontend/src/features/findings/api/get-links.js';
import { getLinksByTarget } from '../frontend/src/features/findings/api/get-links-by-target.js';
import { getIslands } from '../frontend/src/features/findings/api/get-islands.js';
import { searchPages } from '../frontend/src/features/search/api/search-pages.js';
import { getGraph } from '../frontend/src/features/link-map/api/get-graph.js';
import { getUsers } from '../frontend/src/features/users/api/get-users.js';
import { createUser } from '../frontend/src/features/users/api/create-user.js';
import { updateUser } from '../frontend/src/features/users/api/update-user.js';
import { getAssignees } from '../frontend/src/features/tasks/api/get-assignees.js';
import { createTask } from '../frontend/src/features/tasks/api/create-task.js';
import { createTasks } from '../frontend/src/features/tasks/api/create-tasks.js';
import { getTasks } from '../frontend/src/features/tasks/api/get-tasks.js';
import { getTask } from '../frontend/src/features/tasks/api/get-task.js';
import { updateTask } from '../frontend/src/features/tasks/api/update-task.js';
import { addTaskComment } from '../frontend/src/features/tasks/api/add-task-comment.js';
import { getPruningList } from '../frontend/src/features/pruning/api/get-pruning-list.js';
import { nominatePage } from '../frontend/src/features/pruning/api/nominate-page.js';
import { decidePruning } from '../frontend/src/features/pruning/api/decide-pruning.js';
import { exportPruning } from '../frontend/src/features/pruning/api/export-pruning.js';
import { getNotificationSettings } from '../frontend/src/features/notifications/api/get-notification-settings.js';
import { updateNotificationSettings } from '../frontend/src/features/notifications/api/update-notification-settings.js';
import { getUnsubscribeLink } from '../frontend/src/features/notifications/api/get-unsubscribe-link.js';
import { confirmUnsubscribe } from '../frontend/src/features/notifications/api/confirm-unsubscribe.js';
import { getMailbox } from '../frontend/src/features/mail/api/get-mailbox.js';
import { getMailboxMessage } from '../frontend/src/features/mail/api/get-mailbox-message.js';
import { getOutbox } from '../frontend/src/features/mail/api/get-outbox.js';
import { deliverOutbox } from '../frontend/src/features/mail/api/deliver-outbox.js';
import { getSchedule } from '../frontend/src/features/schedule/api/get-schedule.js';
import { runNightlyNow } from '../frontend/src/features/schedule/api/run-nightly-now.js';
import { waitForDemo } from './support/demo.js';
import { type FrontEndTraffic, frontEndApiFiles, pointFrontEndAt } from './support/front-end-client.js';
import { type RunningServer, startServer } from './support/server.js';
import { zipOf } from './support/zip.js';

const PASSWORD = 'linkloom-demo';
const ADMIN = 'admin@demo.linkloom.test';
const EDITOR = 'editor@demo.linkloom.test';
const WRITER = 'writer@demo.linkloom.test';

async function signInAs(email: string, password = PASSWORD) {
  const session = await signIn({ email, password });
  setSession(session);
  return session;
}

async function until<T>(read: () => Promise<T>, done: (value: T) => boolean, what: string, timeoutMs = 60_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await read();
    if (done(value)) return value;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
}

describe('every API file of the front end against the real server', () => {
  let server: RunningServer;
  let traffic: FrontEndTraffic;
  let demo: { docSetId: string; runId: string };
  let older: Run;
  const covered = new Set<string>();

  /** One API file, called as its screen calls it; it must reach the server, and its answer must parse. */
  function call(file: string, body: () => Promise<void>, timeoutMs?: number) {
    it(
      file,
      async () => {
        const before = traffic.requests.length;
        await body();
        expect(traffic.requests.length, `${file} made no request`).toBeGreaterThan(before);
        covered.add(file);
      },
      timeoutMs,
    );
  }

  beforeAll(async () => {
    server = await startServer({ CHECK_RESPONSES: 'false' });
    demo = await waitForDemo(server.url);
    traffic = pointFrontEndAt(server.url);
    await signInAs(ADMIN);
  });
  afterAll(async () => {
    await server?.stop();
    server?.cleanup();
  });

  describe('sign-in, health, users', () => {
    call('auth/api/sign-in.ts', async () => {
      const session = await signInAs(ADMIN);
      expect(session.user).toMatchObject({ email: ADMIN, role: 'admin' });
    });
    call('health/api/get-health.ts', async () => {
      expect(await getHealth()).toMatchObject({ status: 'ok', database: 'pglite', demo: true });
    });
    let userId = '';
    call('users/api/create-user.ts', async () => {
      const user = await createUser({
        email: 'contract.writer@example.com',
        name: 'Contract Writer',
        role: 'writer',
        password: 'bicycle-chain-42',
      });
      userId = user.id;
      expect(user).toMatchObject({ role: 'writer', disabled: false, lastSignInAt: null });
    });
    call('users/api/get-users.ts', async () => {
      const users = await getUsers(1, 50);
      expect(users.items.map((u) => u.email)).toEqual(expect.arrayContaining([ADMIN, EDITOR, 'contract.writer@example.com']));
    });
    call('users/api/update-user.ts', async () => {
      expect(await updateUser({ id: userId, name: 'Contract Writer Two' })).toMatchObject({ id: userId, name: 'Contract Writer Two' });
    });
    call('auth/api/change-password.ts', async () => {
      await signInAs('contract.writer@example.com', 'bicycle-chain-42');
      const renewed = await changePassword({ currentPassword: 'bicycle-chain-42', newPassword: 'derailleur-hanger-7' });
      expect(renewed.user.email).toBe('contract.writer@example.com');
      setSession(renewed);
    });
    call('auth/api/sign-out.ts', async () => {
      await expect(signOut()).resolves.toBeUndefined();
      await signInAs(ADMIN);
    });
  });

  describe('doc sets, runs and their results (the demo handbook)', () => {
    call('doc-sets/api/get-doc-sets.ts', async () => {
      expect((await getDocSets()).map((d) => d.id)).toContain(demo.docSetId);
    });
    call('doc-sets/api/get-doc-set.ts', async () => {
      expect((await getDocSet(demo.docSetId)).settings.damping).toBeGreaterThan(0);
    });
    call('runs/api/get-runs.ts', async () => {
      const runs = (await getRuns(demo.docSetId)).filter((r) => r.status === 'finished');
      expect(runs.length).toBeGreaterThanOrEqual(3);
      // Runs are numbered 1, 2, 3... per doc set in queue order; the list is newest first.
      expect(runs.every((r, i) => i === 0 || (r.number ?? 0) < (runs[i - 1].number ?? 0))).toBe(true);
      older = runs[runs.length - 1];
    });
    call('pages/api/get-run.ts', async () => {
      const run = await getRun(demo.docSetId, demo.runId);
      expect(run.counts?.pages).toBeGreaterThan(100);
    });
    let somePath = '';
    call('pages/api/get-pages.ts', async () => {
      const pages = await getPages(demo.docSetId, demo.runId, { page: 1, pageSize: 20, sort: '-stationaryScore', flags: ['orphan'] });
      expect(pages.items.length).toBeGreaterThan(0);
      expect(pages.items.every((p) => p.orphan)).toBe(true);
      somePath = pages.items[0].path;
    });
    call('pages/api/get-page.ts', async () => {
      const page = await getPage(demo.docSetId, demo.runId, somePath);
      expect(page.path).toBe(somePath);
      expect(page.neighbourhood.nodes.some((n) => n.distance === 0)).toBe(true);
    });
    call('pages/api/export-csv.ts', async () => {
      await exportCsv(demo.docSetId, demo.runId, { view: 'orphans', filters: {} });
      const file = traffic.downloads.at(-1)!;
      expect(file.name).toMatch(/orphans\.csv$/);
      expect(file.blob.type).toMatch(/^text\/csv/);
      expect((await file.blob.text()).split('\n')[0]).toContain('path');
    });
    call('doc-sets/api/get-top-pages.ts', async () => {
      const top = await getTopPages(demo.docSetId, demo.runId, 5);
      expect(top.items.map((p) => p.rank)).toEqual([1, 2, 3, 4, 5]);
    });
    call('doc-sets/api/get-score-distribution.ts', async () => {
      const distribution = await getScoreDistribution(demo.docSetId, demo.runId);
      expect(distribution?.buckets.length).toBe(10);
    });
    call('doc-sets/api/get-snapshots.ts', async () => {
      expect((await getSnapshots(demo.docSetId)).filter((s) => s.status === 'ready').length).toBeGreaterThanOrEqual(3);
    });
    call('doc-sets/api/get-snapshot.ts', async () => {
      const [latest] = await getSnapshots(demo.docSetId);
      expect((await getSnapshot(demo.docSetId, latest.id)).id).toBe(latest.id);
    });
    call('findings/api/get-links.ts', async () => {
      const links = await getLinks(demo.docSetId, demo.runId, { status: 'broken', page: 1, pageSize: 50 });
      expect(links.items.length).toBeGreaterThan(0);
      expect(links.items.every((l) => l.status === 'broken')).toBe(true);
    });
    call('findings/api/get-links-by-target.ts', async () => {
      const groups = await getLinksByTarget(demo.docSetId, demo.runId, { status: 'broken', page: 1, pageSize: 50 });
      expect(groups.items.length).toBeGreaterThan(0);
      for (const group of groups.items) expect(group.sources.length).toBe(Math.min(group.sourcePageCount, 100));
    });
    call('findings/api/get-islands.ts', async () => {
      const islands = await getIslands(demo.docSetId, demo.runId);
      expect(islands.length).toBeGreaterThan(0);
      for (const island of islands) expect(island.pages.length).toBe(Math.min(island.pageCount, 200));
    });
    call('search/api/search-pages.ts', async () => {
      const result = await searchPages(demo.docSetId, demo.runId, 'van', 'blend');
      expect(result.items.length).toBeGreaterThan(0);
      expect((await searchPages(demo.docSetId, demo.runId, 'van', 'subgraph')).mode).toBe('subgraph');
    });
    call('link-map/api/get-graph.ts', async () => {
      const folders = await getGraph(demo.docSetId, demo.runId, { folder: '', folderDepth: 1, limit: 10 });
      expect(folders.level).toBe('folders');
      const pages = await getGraph(demo.docSetId, demo.runId, { folder: '', folderDepth: 1, limit: 1000 });
      expect(pages.level).toBe('pages');
    });
    call('runs/api/get-run-diff.ts', async () => {
      const diff = await getRunDiff(demo.docSetId, demo.runId, older.id);
      expect(diff.findings.length).toBeGreaterThan(0);
    });
  });

  describe('a doc set of its own: settings, tokens, an upload and a run', () => {
    let docSetId = '';
    call('doc-sets/api/create-doc-set.ts', async () => {
      docSetId = (await createDocSet({ name: 'Contract probe' })).id;
    });
    call('doc-sets/api/update-doc-set.ts', async () => {
      const changed = await updateDocSet(docSetId, { description: 'Made by the contract test', settings: { entryPages: ['index.md'] } });
      expect(changed.settings.entryPages).toEqual(['index.md']);
    });
    let tokenId = '';
    call('doc-sets/api/create-token.ts', async () => {
      const token = await createToken(docSetId, 'contract CI');
      tokenId = token.id;
      expect(token.token.length).toBeGreaterThan(20);
    });
    call('doc-sets/api/get-tokens.ts', async () => {
      expect((await getTokens(docSetId)).map((t) => t.id)).toEqual([tokenId]);
    });
    call('doc-sets/api/delete-token.ts', async () => {
      await expect(deleteToken(docSetId, tokenId)).resolves.toBeUndefined();
    });
    it('doc-sets/api/upload-archive.ts', async () => {
      // An invented three-page workshop handbook; the upload goes over XMLHttpRequest, as in the browser.
      const archive = await zipOf({
        'index.md': '# Workshop\n\nSee [tools](tools.md) and [safety](safety.md).\n',
        'tools.md': '# Tools\n\nBack to the [start](index.md); [missing](gone.md).\n',
        'safety.md': '# Safety\n\nGoggles on.\n',
      });
      const { snapshot } = await uploadArchive(docSetId, new File([new Uint8Array(archive)], 'workshop.zip', { type: 'application/zip' }));
      const ready = await until(
        () => getSnapshot(docSetId, snapshot.id),
        (s) => s.status === 'ready',
        'the upload to be imported',
      );
      expect(ready.pageCount).toBe(3);
      covered.add('doc-sets/api/upload-archive.ts');
    });
    call('runs/api/create-run.ts', async () => {
      await until(
        () => getRuns(docSetId),
        (runs) => runs.some((r) => r.status === 'finished'),
        'the import run',
      );
      const { run } = await createRun(docSetId, { depthThreshold: 2 });
      expect(run).toMatchObject({ status: 'queued', trigger: 'manual' });
      expect(run.settings.depthThreshold).toBe(2);
    });
  });

  describe('work: tasks and the pruning list (demo handbook)', () => {
    let writerId = '';
    let taskId = '';
    call('tasks/api/get-assignees.ts', async () => {
      await signInAs(EDITOR);
      const writer = (await getAssignees()).items.find((a) => a.email === WRITER);
      writerId = writer!.id;
    });
    call('tasks/api/create-task.ts', async () => {
      const task = await createTask({
        docSetId: demo.docSetId,
        pagePath: 'index.md',
        kind: 'other',
        title: 'Check the contract',
        assigneeId: writerId,
      });
      taskId = task.id;
      expect(task.assignee?.id).toBe(writerId);
    });
    call('tasks/api/create-tasks.ts', async () => {
      const orphans = await getPages(demo.docSetId, demo.runId, { page: 1, pageSize: 2, sort: 'path', flags: ['orphan'] });
      const made = await createTasks({ docSetId: demo.docSetId, kind: 'add-inbound-links', pagePaths: orphans.items.map((p) => p.path) });
      expect(made.items.map((t) => t.pagePath)).toEqual(orphans.items.map((p) => p.path));
      // Selected links as the links table sends them, made into one task that holds exactly those links.
      const broken = await getLinks(demo.docSetId, demo.runId, { status: 'broken', page: 1, pageSize: 2 });
      const links = broken.items.map((l) => ({ sourcePath: l.sourcePath, href: l.hrefText, line: l.line }));
      const grouped = await createTasks({ docSetId: demo.docSetId, kind: 'repair-broken-links', links, grouping: 'grouped' });
      expect(grouped.items).toHaveLength(1);
      expect(grouped.items[0].finding.brokenLinks?.map(({ sourcePath, href, line }) => ({ sourcePath, href, line }))).toEqual(links);
      expect(grouped.items[0].check).toBeNull();
    });
    call('tasks/api/get-tasks.ts', async () => {
      expect((await getTasks({ page: 1, pageSize: 50, docSetId: demo.docSetId })).total).toBeGreaterThanOrEqual(2);
    });
    call('tasks/api/update-task.ts', async () => {
      expect((await updateTask({ id: taskId, status: 'in-progress', priority: 'high' })).status).toBe('in-progress');
    });
    call('tasks/api/add-task-comment.ts', async () => {
      expect((await addTaskComment({ taskId, body: 'Looked at it.' })).type).toBe('comment');
    });
    call('tasks/api/get-task.ts', async () => {
      const task = await getTask(taskId);
      expect(task.events.map((e) => e.type)).toContain('comment');
    });
    let version = 0;
    let candidate = '';
    call('pruning/api/get-pruning-list.ts', async () => {
      const list = await getPruningList(demo.docSetId, { status: 'undecided', page: 1, pageSize: 50 });
      expect(list.items.length).toBeGreaterThan(0);
      version = list.version;
      candidate = list.items[0].path;
    });
    call('pruning/api/nominate-page.ts', async () => {
      await signInAs(WRITER);
      const nominated = await nominatePage({ docSetId: demo.docSetId, path: 'index.md', reason: 'Only to check the contract.' });
      expect(nominated.nominations.map((n) => n.reason)).toContain('Only to check the contract.');
      await signInAs(EDITOR);
      version = (await getPruningList(demo.docSetId, { status: '', page: 1, pageSize: 1 })).version;
    });
    call('pruning/api/decide-pruning.ts', async () => {
      const result = await decidePruning({
        docSetId: demo.docSetId,
        version,
        decisions: [{ path: candidate, decision: 'approve', note: 'contract' }],
      });
      expect(result).toMatchObject({ decided: 1 });
    });
    call('pruning/api/export-pruning.ts', async () => {
      await exportPruning(demo.docSetId, 'txt');
      expect(await traffic.downloads.at(-1)!.blob.text()).toContain(candidate);
    });
  });

  describe('mail, notification settings, unsubscribe and the nightly job', () => {
    call('notifications/api/get-notification-settings.ts', async () => {
      const settings = await getNotificationSettings();
      expect(settings.docSets.map((d) => d.docSetId)).toContain(demo.docSetId);
      expect(Object.keys(settings.kinds).sort()).toEqual(['digest', 'pruning-waiting', 'task-assigned', 'task-reopened']);
    });
    call('notifications/api/update-notification-settings.ts', async () => {
      const saved = await updateNotificationSettings({
        timeZone: 'Europe/Berlin',
        docSets: [{ docSetId: demo.docSetId, nothingChanged: true }],
      });
      expect(saved).toMatchObject({ timeZone: 'Europe/Berlin', timeZoneIsDefault: false });
      expect(saved.docSets.find((d) => d.docSetId === demo.docSetId)).toMatchObject({ digest: true, nothingChanged: true });
    });
    call('schedule/api/get-schedule.ts', async () => {
      expect((await getSchedule()).docSets.map((d) => d.id)).toContain(demo.docSetId);
    });
    call('schedule/api/run-nightly-now.ts', async () => {
      expect(await runNightlyNow()).toMatchObject({ started: true });
    });
    let messageId = '';
    call('mail/api/get-mailbox.ts', async () => {
      await signInAs(ADMIN);
      // The demo sends "pruning list waiting" mail to editors and admins on its first runs.
      const mailbox = await until(
        () => getMailbox(1, 25),
        (m) => m.items.length > 0,
        'the first mail',
      );
      messageId = mailbox.items[0].id;
    });
    let unsubscribeToken = '';
    call('mail/api/get-mailbox-message.ts', async () => {
      const message = await getMailboxMessage(messageId);
      expect(message.text.length).toBeGreaterThan(0);
      // Every mail carries its one-click unsubscribe address (RFC 8058, "Signaling One-Click Functionality for
      // List Email Headers", section 3.1: a List-Unsubscribe URI to POST to, plus the List-Unsubscribe-Post
      // header with the value List-Unsubscribe=One-Click; from memory).
      expect(message.headers['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');
      unsubscribeToken = /\/api\/unsubscribe\/([^>\s]+)>/.exec(message.headers['list-unsubscribe'] ?? '')?.[1] ?? '';
      expect(unsubscribeToken).not.toBe('');
    });
    call('notifications/api/get-unsubscribe-link.ts', async () => {
      const info = await getUnsubscribeLink(unsubscribeToken);
      expect(info.maskedEmail).toMatch(/^.•••@/);
      expect(info.subscribed).toBe(true);
    });
    call('notifications/api/confirm-unsubscribe.ts', async () => {
      const done = await confirmUnsubscribe(unsubscribeToken);
      expect(done.subscribed).toBe(false);
      expect((await getUnsubscribeLink(unsubscribeToken)).subscribed).toBe(false);
    });
    call('mail/api/get-outbox.ts', async () => {
      expect((await getOutbox('', 1, 25)).total).toBeGreaterThan(0);
    });
    call('mail/api/deliver-outbox.ts', async () => {
      expect((await deliverOutbox()).sent).toBeGreaterThanOrEqual(0);
    });
  });

  it('called every API file of the front end (a new one must be added above)', () => {
    expect(frontEndApiFiles().length).toBeGreaterThan(40);
    expect(frontEndApiFiles().filter((file) => !covered.has(file))).toEqual([]);
  });
});
