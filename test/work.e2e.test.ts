// Work on findings, driven as people would: an editor turns findings into assigned tasks, a writer finishes
// one, a new snapshot verifies it; the editor approves two pruning candidates and exports them.
// Uses the real importer and runs: the archive below is an invented harbour-operations handbook.
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { launchBrowser, screenshot, signIn } from './support/browser.js';
import { waitFor } from './support/http.js';
import { type RunningServer, startServer } from './support/server.js';
import { zipOf as zip } from './support/zip.js';

const EDITOR = 'editor@demo.linkloom.test';
const WRITER = 'writer@demo.linkloom.test';
const FILLER = Array.from(
  { length: 12 },
  (_, i) =>
    `Shift lead ${i + 1} checks the quay log, confirms the berth plan with the tug desk and records weather notes before each vessel call.`,
).join(' ');

function handbook(cranesFixed: boolean): Record<string, string> {
  const cranesLinks = cranesFixed
    ? '[Back to start](../index.md) and [berths](berths.md).'
    : '[Lockout steps](../safety/lockout.md), [torque table](torque.md) and [start](../index.md).';
  return {
    'index.md': `# Harbour operations\n\nSee [cranes](guide/cranes.md), [berths](guide/berths.md) and [tides](guide/tides.md).\n\n${FILLER}\n`,
    'guide/cranes.md': `---\nowner: ${WRITER}\n---\n# Crane maintenance\n\n${cranesLinks}\n\n${FILLER}\n`,
    'guide/berths.md': `# Berth allocation\n\n[Start](../index.md) and [tides](tides.md).\n\n${FILLER}\n`,
    'guide/tides.md': `# Tide tables\n\n[Start](../index.md).\n\n${FILLER}\n`,
    'guide/old-ferry.md': `---\nowner: ${WRITER}\n---\n# Old ferry times\n\nThe winter ferry left at six. [Start](../index.md)\n`,
    'guide/pilot-notes.md': `# Pilot notes\n\nDraft, never finished. [Start](../index.md)\n`,
  };
}

describe('work on findings: tasks and the pruning list', () => {
  let server: RunningServer;
  let browser: BrowserContext;
  let token: string;
  let docSetId: string;
  const api = async (path: string, init: RequestInit = {}) => {
    const response = await fetch(`${server.url}/api${path}`, {
      ...init,
      headers: {
        Authorization: `Bearer ${token}`,
        ...(init.body && typeof init.body === 'string' ? { 'Content-Type': 'application/json' } : {}),
        ...(init.headers ?? {}),
      },
    });
    const text = await response.text();
    return { status: response.status, body: text ? JSON.parse(text) : undefined };
  };
  const finishedRuns = async () =>
    ((await api(`/doc-sets/${docSetId}/runs`)).body.items as { status: string }[]).filter((r) => r.status === 'finished').length;
  async function importArchive(cranesFixed: boolean) {
    const before = await finishedRuns();
    const form = new FormData();
    form.append('archive', new Blob([new Uint8Array(await zip(handbook(cranesFixed)))], { type: 'application/zip' }), 'handbook.zip');
    const upload = await api(`/doc-sets/${docSetId}/snapshots`, { method: 'POST', body: form });
    expect(upload.status).toBe(202);
    await waitFor(async () => (await finishedRuns()) === before + 1, 90_000, 'the run after the import');
  }
  const freshPage = async (email: string): Promise<Page> => {
    const page = await browser.newPage();
    await page.goto(`${server.url}/sign-in`);
    await page.evaluate(() => localStorage.clear());
    await signIn(page, server.url, email);
    return page;
  };

  beforeAll(async () => {
    server = await startServer({ DEMO_CONTENT: 'false' });
    browser = await launchBrowser();
    const signInResponse = await fetch(`${server.url}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: EDITOR, password: 'linkloom-demo' }),
    });
    token = (await signInResponse.json()).accessToken;
    docSetId = (await api('/doc-sets', { method: 'POST', body: JSON.stringify({ name: 'Harbour Ops Handbook' }) })).body.id;
    await importArchive(false);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop('SIGTERM');
    server?.cleanup();
  });

  it('editor creates tasks from findings and assigns them; the writer completes one; a new snapshot verifies it', async () => {
    const editor = await freshPage(EDITOR);
    // From the orphan finding: select the row, "Create tasks", confirm (assignee defaults to the page owner).
    await editor.goto(`${server.url}/doc-sets/${docSetId}/findings/needs-links`);
    await editor.getByRole('checkbox', { name: 'Select row guide/old-ferry.md' }).click({ timeout: 60_000 });
    await editor.getByRole('button', { name: 'Create tasks' }).click();
    await editor.getByRole('button', { name: 'Create task' }).click();
    await editor.getByText(/1 task created/).waitFor({ timeout: 15_000 });
    // From the page detail of a page with broken links, assigned explicitly to the writer.
    await editor.goto(`${server.url}/doc-sets/${docSetId}/page?path=${encodeURIComponent('guide/cranes.md')}`);
    // The page detail is a heavy screen; on a busy two-core machine it can take a while to appear.
    await editor.getByRole('button', { name: 'Create fix task' }).click({ timeout: 60_000 });
    await editor.getByRole('combobox', { name: 'Assignee' }).click();
    await editor.getByRole('option', { name: /Wren Writer/ }).click();
    await editor.getByRole('button', { name: 'Create task' }).click();
    await editor.getByText('Tasks on this page').waitFor();
    await expect.poll(() => editor.getByText(/Repair broken links on guide\/cranes.md/).count(), { timeout: 15_000 }).toBeGreaterThan(0);
    await editor.goto(`${server.url}/tasks?view=all`);
    await editor.getByText('guide/old-ferry.md').first().waitFor();
    await screenshot(editor, 'work-tasks-all-editor');
    const tasks = (await api(`/tasks?docSetId=${docSetId}`)).body.items as {
      id: string;
      pagePath: string;
      kind: string;
      details: string;
      assignee: { email: string } | null;
    }[];
    const cranes = tasks.find((t) => t.pagePath === 'guide/cranes.md')!;
    expect(cranes.kind).toBe('repair-broken-links');
    expect(cranes.details).toContain('../safety/lockout.md');
    expect(tasks.every((t) => t.assignee?.email === WRITER)).toBe(true);
    await editor.close();

    const writer = await freshPage(WRITER);
    await writer.goto(`${server.url}/tasks`);
    await writer.getByText('My tasks', { exact: true }).first().waitFor();
    await writer.getByText(/Repair broken links on guide\/cranes.md/).click();
    const drawer = writer.locator('.MuiDrawer-paper');
    await drawer.getByRole('combobox', { name: 'Status' }).click();
    await writer.getByRole('option', { name: 'Done' }).click();
    await writer.getByText('Task updated').waitFor();
    await drawer.getByLabel('Comment', { exact: true }).fill('Fixed the lockout and torque links.');
    await writer.getByRole('button', { name: 'Add comment' }).click();
    await writer.getByText('Fixed the lockout and torque links.').first().waitFor();
    await screenshot(writer, 'work-task-writer-done');

    await importArchive(true);
    await expect.poll(async () => (await api(`/tasks/${cranes.id}`)).body.verification, { timeout: 30_000 }).toBe('verified');
    // "Fixed and verified by run N" is a state of its own, apart from the writer's "done".
    expect((await api(`/tasks/${cranes.id}`)).body.status).toBe('verified');
    await writer.goto(`${server.url}/tasks?status=verified&task=${cranes.id}`);
    await writer.getByText(/no longer finds this: fixed and verified\./).waitFor({ timeout: 15_000 });
    expect(
      await writer
        .getByText(/^Fixed and verified by run \d+$/)
        .first()
        .isVisible(),
    ).toBe(true);
    await screenshot(writer, 'work-task-verified');
    // The old-ferry task's orphan finding is still there, so it stays open.
    const ferry = tasks.find((t) => t.pagePath === 'guide/old-ferry.md')!;
    expect((await api(`/tasks/${ferry.id}`)).body).toMatchObject({ status: 'open', verification: null });
    await writer.close();
  });

  it('editor approves two pruning candidates and exports the approved list', async () => {
    const editor = await freshPage(EDITOR);
    await editor.goto(`${server.url}/doc-sets/${docSetId}/pruning`);
    await editor.getByText('Linkloom never deletes documentation').waitFor({ timeout: 30_000 });
    await editor.getByText('guide/pilot-notes.md').waitFor();
    await editor.getByRole('checkbox', { name: 'Select row guide/old-ferry.md' }).click();
    await editor.getByRole('checkbox', { name: 'Select row guide/pilot-notes.md' }).click();
    await screenshot(editor, 'work-pruning-candidates');
    await editor.getByRole('button', { name: 'Approve selected' }).click();
    await editor.getByLabel(/Note/).fill('Superseded by the berth guide; checked against the retention schedule.');
    await editor.getByRole('dialog').getByRole('button', { name: 'Approve' }).click();
    await editor.getByText(/2 pages: approved/).waitFor();
    await editor.getByRole('tab', { name: 'Approved' }).click();
    await editor.getByText('guide/pilot-notes.md').waitFor();
    const [download] = await Promise.all([
      editor.waitForEvent('download'),
      editor.getByRole('button', { name: 'Export approved (CSV)' }).click(),
    ]);
    const csv = readFileSync((await download.path())!, 'utf8');
    expect(download.suggestedFilename()).toBe('pruning-approved-Harbour-Ops-Handbook.csv');
    expect(csv.split('\r\n')[0]).toBe('path,title,note,approvedBy,approvedAt,needsAnotherLook');
    expect(csv).toContain('guide/old-ferry.md');
    expect(csv).toContain('guide/pilot-notes.md');
    const txt = await fetch(`${server.url}/api/doc-sets/${docSetId}/pruning/export.txt`, { headers: { Authorization: `Bearer ${token}` } });
    expect((await txt.text()).split('\n').filter(Boolean).sort()).toEqual(['guide/old-ferry.md', 'guide/pilot-notes.md']);
    await screenshot(editor, 'work-pruning-approved');
    await editor.close();
  });
});
