// The team's day, driven over HTTP against the built product (and looked at in chromium): an archive is
// uploaded, the nightly job runs, a changed archive comes in during the day, the next nightly digest reports
// exactly those changes with the numbers of the run diff; every kind of mail can be stopped with its own
// one-click unsubscribe; a task that a run reopens mails its assignee. The archive is an invented
// quay-operations handbook.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { launchBrowser, screenshot, signIn } from './support/browser.js';
import { type Client, signedInClient, waitFor } from './support/http.js';
import { zipOf } from './support/zip.js';
import { type RunningServer, startServer } from './support/server.js';

const ADMIN = 'admin@demo.linkloom.test';
const EDITOR = 'editor@demo.linkloom.test';
const WRITER = 'writer@demo.linkloom.test';
const FILLER = Array.from(
  { length: 12 },
  (_, i) => `Quay lead ${i + 1} checks the mooring lines, confirms the crane slot with the berth desk and logs the tide before each call.`,
).join(' ');

interface Version {
  /** The day's change: three pages removed (with the links to them) and one link to a heading that does not exist. */
  changed: boolean;
  lockoutBroken: boolean;
  /** A second old, thin, unlinked page: a new pruning candidate. */
  olderNotes: boolean;
}

const REMOVED = ['guide/ferry.md', 'guide/pilots.md', 'guide/harbour-map.md'];

function handbook(v: Version): Record<string, string> {
  const guides = ['guide/cranes.md', 'guide/berths.md', 'guide/tides.md', ...(v.changed ? [] : REMOVED)];
  const files: Record<string, string> = {
    'index.md': `# Quay handbook\n\n${guides.map((g) => `- [${g}](${g})`).join('\n')}\n\n${FILLER}\n`,
    'guide/cranes.md': `# Crane work\n\n${v.lockoutBroken ? '[Lockout steps](../safety/lockout.md)' : '[Berths](berths.md)'} and [start](../index.md).\n\n${FILLER}\n`,
    'guide/berths.md': `# Berths\n\n[Start](../index.md), [tides](tides.md)${v.changed ? ' and [neap tides](tides.md#neap-tides)' : ''}.\n\n${FILLER}\n`,
    'guide/tides.md': `# Tide tables\n\n## Spring tides\n\n[Start](../index.md).\n\n${FILLER}\n`,
    'old-notes.md': '# Old notes\n\nA few words from long ago.\n',
  };
  if (!v.changed) for (const path of REMOVED) files[path] = `# ${path}\n\n[Start](../index.md).\n\n${FILLER}\n`;
  if (v.olderNotes) files['older-notes.md'] = '# Older notes\n\nEven fewer words.\n';
  return files;
}

interface Mail {
  id: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  headers: Record<string, string>;
}

/** The numbers a digest states for one kind, e.g. "Pages: 0 added, 3 removed". */
function stated(text: string, label: string): { appeared: number; disappeared: number } | null {
  const match = new RegExp(`^${label}: (\\d+) [a-z ]+, (\\d+) [a-z ]+$`, 'm').exec(text);
  return match ? { appeared: Number(match[1]), disappeared: Number(match[2]) } : null;
}

const DIGEST_LABELS: Record<string, string> = {
  brokenLinks: 'Broken links',
  brokenAnchors: 'Broken anchors',
  pages: 'Pages',
  orphans: 'Orphan pages',
  unreachable: 'Unreachable pages',
  deadEnds: 'Dead ends',
  deepPages: 'Deep pages',
};

describe('the digest, the mail people can stop, and tasks that follow the runs', () => {
  let server: RunningServer;
  let browser: BrowserContext;
  let admin: Client;
  let editor: Client;
  let writer: Client;
  let docSetId: string;
  let seen = new Set<string>();

  const finishedRuns = async () =>
    ((await editor(`/doc-sets/${docSetId}/runs?pageSize=100`)).body.items as { status: string }[]).filter((r) => r.status === 'finished')
      .length;
  async function importVersion(v: Version) {
    const before = await finishedRuns();
    const form = new FormData();
    form.append('archive', new Blob([new Uint8Array(await zipOf(handbook(v)))], { type: 'application/zip' }), 'quay.zip');
    expect((await editor(`/doc-sets/${docSetId}/snapshots`, { method: 'POST', body: form })).status).toBe(202);
    await waitFor(async () => (await finishedRuns()) === before + 1, 120_000, 'the run after the import');
  }
  async function nightly() {
    const before = (await editor('/schedule')).body.lastStartedAt;
    expect((await editor('/schedule/run-now', { method: 'POST' })).status).toBe(202);
    await waitFor(
      async () => {
        const s = (await editor('/schedule')).body;
        return !s.running && s.lastStartedAt !== before && s.lastFinishedAt !== null;
      },
      180_000,
      'the nightly job',
    );
    return (await editor('/schedule')).body.lastResult.docSets.find((d: { docSetId: string }) => d.docSetId === docSetId);
  }
  /** Mails that arrived in the built-in mailbox since the last call. */
  async function newMail(): Promise<Mail[]> {
    await admin('/outbox/deliver', { method: 'POST' });
    const list = (await admin('/mail?pageSize=500')).body.items as { id: string }[];
    const fresh = list.filter((m) => !seen.has(m.id));
    seen = new Set(list.map((m) => m.id));
    return Promise.all(fresh.map(async (m) => (await admin(`/mail/${m.id}`)).body as Mail));
  }
  /** Polls the mailbox until the mails wanted are there (a run's effects follow its "finished" state). */
  async function mailUntil(wanted: (m: Mail) => boolean): Promise<Mail[]> {
    const got: Mail[] = [];
    await waitFor(async () => (got.push(...(await newMail())), got.some(wanted)), 30_000, 'an e-mail');
    return got;
  }
  /** What a mail client does for `List-Unsubscribe-Post: List-Unsubscribe=One-Click` (RFC 8058 section 3.1). */
  async function oneClick(mail: Mail) {
    expect(mail.headers['list-unsubscribe-post']).toBe('List-Unsubscribe=One-Click');
    const url = /^<(https?:\/\/[^>]+)>$/.exec(mail.headers['list-unsubscribe'])![1];
    const local = `${server.url}${new URL(url).pathname}`;
    const response = await fetch(local, {
      method: 'POST',
      headers: { 'Content-Type': 'application/x-www-form-urlencoded' },
      body: 'List-Unsubscribe=One-Click',
    });
    expect(response.status).toBe(200);
  }
  const freshPage = async (email: string): Promise<Page> => {
    const page = await browser.newPage();
    await signIn(page, server.url, email);
    return page;
  };

  beforeAll(async () => {
    server = await startServer({ DEMO_CONTENT: 'false', TZ: 'UTC' });
    browser = await launchBrowser();
    [admin, editor, writer] = await Promise.all([ADMIN, EDITOR, WRITER].map((e) => signedInClient(server.url, e)));
    docSetId = (await editor('/doc-sets', { method: 'POST', json: { name: 'Quay Handbook', settings: { entryPages: ['index.md'] } } })).body
      .id;
    // The writer follows this doc set's digest and reads dates in New York time.
    const chosen = await writer('/me/notifications', {
      method: 'PATCH',
      json: { timeZone: 'America/New_York', docSets: [{ docSetId, digest: true }] },
    });
    expect(chosen.status).toBe(200);
    await importVersion({ changed: false, lockoutBroken: true, olderNotes: false });
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop('SIGTERM');
    server?.cleanup();
  });

  it('sends nothing on a night without change, then reports exactly the day’s changes with the numbers of the run diff', async () => {
    const quiet = await nightly();
    expect(quiet).toMatchObject({ outcome: 'finished', digestSentTo: 0 });
    expect((await newMail()).filter((m) => m.subject.startsWith('Linkloom digest'))).toEqual([]);

    await importVersion({ changed: true, lockoutBroken: true, olderNotes: false });
    const night = await nightly();
    expect(night.digestSentTo).toBe(3);
    const digests = (await newMail()).filter((m) => m.subject.startsWith('Linkloom digest'));
    expect(digests.map((m) => m.to[0]).sort()).toEqual([ADMIN, EDITOR, WRITER]);

    // The digest's base is last night's run: its numbers are the API's diff of the two nightly runs.
    const runs = (await editor(`/doc-sets/${docSetId}/runs?pageSize=100`)).body.items as { id: string; trigger: string }[];
    const [tonight, lastNight] = runs.filter((r) => r.trigger === 'nightly');
    expect(tonight.id).toBe(night.runId);
    const diff = (await editor(`/doc-sets/${docSetId}/runs/${tonight.id}/diff?against=${lastNight.id}`)).body;
    const text = digests.find((m) => m.to[0] === WRITER)!.text;
    for (const [kind, label] of Object.entries(DIGEST_LABELS)) {
      const expected = { appeared: diff.kinds[kind].appeared.total, disappeared: diff.kinds[kind].disappeared.total };
      if (expected.appeared + expected.disappeared === 0) expect(stated(text, label), `${label} is not mentioned`).toBeNull();
      else expect(stated(text, label), label).toEqual(expected);
    }
    // And those are the day's changes, as drawn by hand above: three pages removed, one broken anchor more.
    expect(stated(text, 'Pages')).toEqual({ appeared: 0, disappeared: 3 });
    expect(stated(text, 'Broken anchors')).toEqual({ appeared: 1, disappeared: 0 });
    expect(stated(text, 'Broken links')).toBeNull();
    for (const path of REMOVED) expect(text).toContain(`removed: ${path}`);
    expect(text).toContain('new: guide/berths.md → tides.md#neap-tides');
  });

  it('writes dates in the reader’s zone, links into the app, and has a styled HTML part with no remote content', async () => {
    const night = (await editor('/schedule')).body.lastResult.docSets[0];
    const run = (await editor(`/doc-sets/${docSetId}/runs/${night.runId}`)).body;
    const list = (await admin('/mail?pageSize=500')).body.items as { id: string; to: string[]; subject: string }[];
    const id = list.find((m) => m.to[0] === WRITER && m.subject.startsWith('Linkloom digest'))!.id;
    const mail = (await admin(`/mail/${id}`)).body as Mail;
    // The reference for the zone is the runtime's ECMA-402 Intl with the IANA time zone database.
    const local = new Intl.DateTimeFormat('en-GB', {
      timeZone: 'America/New_York',
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
    }).format(new Date(run.finishedAt));
    expect(mail.text).toContain(`${local} (America/New_York)`);
    const publicUrl = `http://localhost:${server.port}`;
    expect(mail.text).toContain(`${publicUrl}/doc-sets/${docSetId}/findings?run=${run.id}`);
    expect(mail.html).toContain('style="');
    expect(mail.html).not.toMatch(/<(img|link|script|style)\b|url\(|src="https?:/i);
    const page = await browser.newPage();
    await page.setContent(mail.html);
    expect(await page.getByRole('heading', { name: 'Pages: 0 added, 3 removed' }).count()).toBe(1);
    await screenshot(page, 'digest-mail-html');
    await page.close();
  });

  it('shows the digest count per run on the nightly screen and asks before running the job', async () => {
    const page = await freshPage(EDITOR);
    await page.goto(`${server.url}/admin/schedule`);
    await page.getByText('digest sent to 3 people').waitFor({ timeout: 30_000 });
    await page.getByRole('button', { name: 'Run now' }).click();
    await page.getByRole('dialog').getByText('Run the nightly job now?').waitFor();
    // The dialog fades in; look at it once it is fully there.
    await expect.poll(() => page.getByRole('dialog').evaluate((d) => getComputedStyle(d.parentElement!).opacity)).toBe('1');
    await screenshot(page, 'digest-nightly-confirm');
    await page.getByRole('dialog').getByRole('button', { name: 'Cancel' }).click();
    expect((await editor('/schedule')).body.running).toBe(false);
    await page.close();
  });

  it('stops the digest with its one-click link, and an assignment mail with the unsubscribe page', async () => {
    const writerDigest = (await admin('/mail?pageSize=500')).body.items.find(
      (m: Mail) => m.to[0] === WRITER && m.subject.startsWith('Linkloom digest'),
    );
    await oneClick((await admin(`/mail/${writerDigest.id}`)).body);
    expect((await writer('/me/notifications')).body.kinds.digest).toBe(false);

    // The editor turns the selected broken link into a task for the writer.
    const page = await freshPage(EDITOR);
    await page.goto(`${server.url}/doc-sets/${docSetId}/findings/broken-links`);
    await page.getByRole('checkbox', { name: /Select row guide\/cranes\.md:/ }).click({ timeout: 60_000 });
    await page.getByRole('button', { name: 'Create tasks' }).click();
    await page.getByRole('list', { name: 'Selected findings' }).getByText('../safety/lockout.md').waitFor();
    await page.getByRole('combobox', { name: 'Assignee' }).click();
    await page.getByRole('option', { name: /Wren Writer/ }).click();
    await screenshot(page, 'digest-create-task-selected-link');
    await page.getByRole('button', { name: 'Create task' }).click();
    await page.getByText(/1 task created/).waitFor({ timeout: 15_000 });
    await page.close();

    const assignedTo = (m: Mail) => m.to[0] === WRITER && m.subject.startsWith('Task assigned');
    const [assigned] = (await mailUntil(assignedTo)).filter(assignedTo);
    expect(assigned.text).toContain('Unsubscribe from “A task assigned to you”');
    // Opened from the mail: the page asks first (a GET changes nothing), then the button unsubscribes.
    const link = /^Unsubscribe from .* with one click: (\S+)$/m.exec(assigned.text)![1];
    const reader = await browser.newPage();
    await reader.goto(`${server.url}${new URL(link).pathname}`);
    await reader.getByText('Stop e-mails of the kind').waitFor({ timeout: 30_000 });
    expect((await writer('/me/notifications')).body.kinds['task-assigned']).toBe(true);
    await screenshot(reader, 'digest-unsubscribe-page');
    await reader.getByRole('button', { name: 'Unsubscribe' }).click();
    await reader.getByText(/You will get no more e-mails/).waitFor();
    await reader.close();
    expect((await writer('/me/notifications')).body.kinds['task-assigned']).toBe(false);

    const another = await editor('/tasks', {
      method: 'POST',
      json: {
        docSetId,
        pagePath: 'guide/tides.md',
        kind: 'other',
        title: 'Check the tide table',
        assigneeId: (await writer('/me')).body.id,
      },
    });
    expect(another.status).toBe(201);
    expect((await newMail()).filter((m) => m.to[0] === WRITER)).toEqual([]);
  });

  it('verifies the task when the link is fixed, reopens it and mails the writer when it breaks again, and stops that mail too', async () => {
    const [task] = (await editor(`/tasks?docSetId=${docSetId}&kind=repair-broken-links`)).body.items;
    expect(task.finding.brokenLinks).toEqual([
      { sourcePath: 'guide/cranes.md', href: '../safety/lockout.md', line: expect.any(Number), status: 'broken' },
    ]);
    // The editor stops pruning-list mail from its own earlier mail; the new orphan in this version is mailed to the admin only.
    const pruning = (await admin('/mail?pageSize=500')).body.items.find(
      (m: Mail) => m.to[0] === EDITOR && m.subject.startsWith('Pruning list waiting'),
    );
    await oneClick((await admin(`/mail/${pruning.id}`)).body);
    await newMail();

    await importVersion({ changed: true, lockoutBroken: false, olderNotes: true });
    await waitFor(async () => (await editor(`/tasks/${task.id}`)).body.status === 'verified', 30_000, 'the task to be verified');
    const afterFix = await mailUntil((m) => m.subject.startsWith('Pruning list waiting'));
    expect(afterFix.filter((m) => m.subject.startsWith('Pruning list waiting')).map((m) => m.to[0])).toEqual([ADMIN]);

    await importVersion({ changed: true, lockoutBroken: true, olderNotes: true });
    await waitFor(async () => (await editor(`/tasks/${task.id}`)).body.status === 'open', 30_000, 'the task to reopen');
    const reopened = (await editor(`/tasks/${task.id}`)).body;
    expect(reopened.check).toMatchObject({ outcome: 'reopened', items: [{ href: '../safety/lockout.md', stillFound: true }] });
    const [mail] = (await mailUntil((m) => m.subject.startsWith('Task reopened'))).filter((m) => m.subject.startsWith('Task reopened'));
    expect(mail.to).toEqual([WRITER]);
    expect(mail.text).toContain('still found: guide/cranes.md line');

    const page = await freshPage(WRITER);
    await page.goto(`${server.url}/`);
    const panel = page.getByRole('region', { name: 'Your open tasks' });
    await panel.getByText(/Reopened by run/).waitFor({ timeout: 30_000 });
    await screenshot(page, 'digest-writer-home-reopened');
    await panel.getByRole('link', { name: /Repair broken link on guide\/cranes\.md/ }).click();
    await page.getByRole('region', { name: 'Findings of this task' }).getByText('still found').waitFor();
    await screenshot(page, 'digest-task-still-found');
    await page.close();

    await oneClick(mail);
    await importVersion({ changed: true, lockoutBroken: false, olderNotes: true });
    await importVersion({ changed: true, lockoutBroken: true, olderNotes: true });
    await waitFor(
      async () =>
        (await editor(`/tasks/${task.id}`)).body.check?.outcome === 'reopened' &&
        (await editor(`/tasks/${task.id}`)).body.status === 'open',
      30_000,
      'the second reopening',
    );
    expect((await newMail()).filter((m) => m.to[0] === WRITER)).toEqual([]);
  });

  it('leaves the unsubscribed writer out of the next digest, which lists the runs’ task outcomes', async () => {
    const night = await nightly();
    const digests = (await newMail()).filter((m) => m.subject.startsWith('Linkloom digest'));
    expect(digests.map((m) => m.to[0]).sort()).toEqual([ADMIN, EDITOR]);
    expect(night.digestSentTo).toBe(2);
    const text = digests[0].text;
    expect(stated(text, 'Pages')).toEqual({ appeared: 1, disappeared: 0 });
    expect(text).toContain('Tasks reopened (the finding is back): 1');
  });

  it('puts every choice on the Notifications screen, reached from the account menu', async () => {
    const page = await freshPage(WRITER);
    await page.goto(`${server.url}/`);
    await page.getByRole('button', { name: /Account menu/ }).click();
    await page.getByRole('menuitem', { name: 'Notifications' }).click();
    await page.getByRole('heading', { name: 'Notifications' }).waitFor();
    expect(await page.getByRole('switch', { name: /Digest of what changed/ }).isChecked()).toBe(false);
    expect(await page.getByRole('switch', { name: /A task assigned to you/ }).isChecked()).toBe(false);
    expect(await page.getByRole('switch', { name: /Your task reopened by a run/ }).isChecked()).toBe(false);
    await screenshot(page, 'digest-notifications-screen');
    // The same doc set's choices on its own overview, where people look for them too.
    await page.goto(`${server.url}/doc-sets/${docSetId}`);
    const card = page.getByRole('region', { name: 'Your e-mail for this doc set' });
    await card.getByText('You switched off all digests under Notifications').waitFor({ timeout: 30_000 });
    await card.scrollIntoViewIfNeeded();
    await screenshot(page, 'digest-overview-email-choices');
    await page.close();
  });

  it('shows a viewer all tasks to read, without "My tasks" or task actions', async () => {
    const page = await freshPage('viewer@demo.linkloom.test');
    await page.goto(`${server.url}/tasks`);
    await page.getByRole('heading', { name: 'Tasks', exact: true }).waitFor({ timeout: 30_000 });
    await page.getByText('Check the tide table').click();
    await page.getByRole('region', { name: 'Findings of this task' }).waitFor();
    expect(await page.getByRole('link', { name: 'My tasks' }).count()).toBe(0);
    expect(await page.getByRole('combobox', { name: 'Status' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Add comment' }).count()).toBe(0);
    await screenshot(page, 'digest-viewer-tasks');
    await page.close();
  });
});
