import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, signIn } from './support/browser.js';
import { apiAs, waitForDemo } from './support/demo.js';
import { type RunningServer, startServer } from './support/server.js';

/** "1–50 of 294" from the table's pager. */
async function pagerTotal(page: Page): Promise<number> {
  const text = await page.locator('.MuiTablePagination-displayedRows').first().innerText({ timeout: 60_000 });
  const match = /of\s+([\d,]+)/.exec(text);
  if (!match) throw new Error(`no total in "${text}"`);
  return Number(match[1].replace(/,/g, ''));
}

async function waitForPagerTotal(page: Page, expected: number): Promise<void> {
  await expect.poll(() => pagerTotal(page).catch(() => -1), { timeout: 60_000 }).toBe(expected);
}

describe('every screen on the demo doc set, as each role', () => {
  let server: RunningServer;
  let browser: BrowserContext;
  let docSetId: string;
  let counts: Record<string, number>;
  let get: Awaited<ReturnType<typeof apiAs>>;

  beforeAll(async () => {
    server = await startServer();
    ({ docSetId } = await waitForDemo(server.url));
    get = await apiAs(server.url, 'viewer@demo.linkloom.test');
    counts = (await get(`/api/doc-sets/${docSetId}/runs/latest`)).counts;
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop('SIGTERM');
    server?.cleanup();
  });

  it("shows the overview with the latest run's numbers (viewer: no upload button)", async () => {
    const page = await browser.newPage();
    await signIn(page, server.url, 'viewer@demo.linkloom.test');
    await page.goto(`${server.url}/doc-sets/${docSetId}`);
    await expect.poll(() => page.locator('main').innerText(), { timeout: 60_000 }).toMatch(new RegExp(`Pages\\s+${counts.pages}\\b`));
    const body = await page.locator('main').innerText();
    expect(body).toMatch(new RegExp(`Broken links\\s+${counts.brokenLinks}\\b`));
    expect(body).toMatch(new RegExp(`Orphan pages\\s+${counts.orphans}\\b`));
    expect(await page.getByRole('button', { name: /upload/i }).count()).toBe(0);
    await screenshot(page, 'screen-overview-viewer');
    await page.close();
  });

  it('lists pages with server-side filter, sort, paging and CSV export (editor)', async () => {
    const page = await browser.newPage();
    await signIn(page, server.url, 'editor@demo.linkloom.test');
    await page.goto(`${server.url}/doc-sets/${docSetId}/pages`);
    await waitForPagerTotal(page, counts.pages);
    await screenshot(page, 'screen-page-explorer');

    await page
      .getByRole('group', { name: 'Show only pages that are' })
      .getByText(/orphan/i)
      .first()
      .click();
    await waitForPagerTotal(page, counts.orphans);
    expect(page.url()).toContain('flags=orphan');
    const orphanApi = await get(`/api/doc-sets/${docSetId}/runs/latest/pages?flags=orphan&pageSize=500`);
    expect(orphanApi.total).toBe(counts.orphans);

    await page.goto(`${server.url}/doc-sets/${docSetId}/pages`);
    await waitForPagerTotal(page, counts.pages);
    await page.getByRole('button', { name: /next page/i }).click();
    await expect.poll(() => page.url()).toContain('page=2');
    await page
      .getByRole('columnheader', { name: /inbound/i })
      .getByRole('button')
      .first()
      .click();
    await expect.poll(() => page.url()).toMatch(/sort=-?inboundCount/);
    const [download] = await Promise.all([
      page.waitForEvent('download', { timeout: 60_000 }),
      page.getByRole('button', { name: /export csv/i }).click(),
    ]);
    expect(download.suggestedFilename()).toMatch(/\.csv$/);
    await page.close();
  });

  it('opens a page detail with its neighbourhood picture', async () => {
    const page = await browser.newPage();
    await signIn(page, server.url, 'writer@demo.linkloom.test');
    const top = (await get(`/api/doc-sets/${docSetId}/runs/latest/pages?sort=-stationaryScore&pageSize=1`)).items[0];
    await page.goto(`${server.url}/doc-sets/${docSetId}/page?path=${encodeURIComponent(top.path)}`);
    await expect.poll(() => page.getByText(top.title).first().isVisible(), { timeout: 60_000 }).toBe(true);
    await expect
      .poll(() => page.locator('#neighbourhood-title, [aria-labelledby="neighbourhood-title"] canvas').count(), { timeout: 60_000 })
      .toBeGreaterThan(0);
    await screenshot(page, 'screen-page-detail');
    await page.close();
  });

  it('shows the findings with counts from the run, the link map and search', async () => {
    const page = await browser.newPage();
    await signIn(page, server.url, 'editor@demo.linkloom.test');
    await page.goto(`${server.url}/doc-sets/${docSetId}/findings/broken-links`);
    await expect.poll(() => page.locator('main').innerText(), { timeout: 60_000 }).toContain(`${counts.brokenLinks} missing target`);
    await screenshot(page, 'screen-findings-broken-links');
    await page.goto(`${server.url}/doc-sets/${docSetId}/findings/needs-links`);
    await expect.poll(() => page.getByText('Orphans').first().isVisible(), { timeout: 60_000 }).toBe(true);
    await screenshot(page, 'screen-findings-needs-links');

    await page.goto(`${server.url}/doc-sets/${docSetId}/map`);
    await expect.poll(() => page.locator('canvas').count(), { timeout: 60_000 }).toBeGreaterThan(0);
    await screenshot(page, 'screen-link-map');

    await page.goto(`${server.url}/doc-sets/${docSetId}/search`);
    const box = page.getByLabel('Words to find');
    await box.fill('depot');
    await box.press('Enter');
    const api = await get(`/api/doc-sets/${docSetId}/runs/latest/search?q=depot`);
    expect(api.items.length).toBeGreaterThan(0);
    await expect.poll(() => page.getByText(api.items[0].title).first().isVisible(), { timeout: 60_000 }).toBe(true);
    await screenshot(page, 'screen-search');
    await page.close();
  });

  it('shows settings, runs, pruning, tasks and the admin screens to the roles that may use them', async () => {
    const page = await browser.newPage();
    await signIn(page, server.url, 'admin@demo.linkloom.test');
    for (const [path, name, text] of [
      [`/doc-sets/${docSetId}/settings`, 'screen-settings', /damping/i],
      [`/doc-sets/${docSetId}/runs`, 'screen-runs', /import|nightly|manual/i],
      [`/doc-sets/${docSetId}/pruning`, 'screen-pruning', /never deletes|retention/i],
      ['/tasks', 'screen-tasks', /task/i],
      ['/admin/users', 'screen-users', /editor@demo\.linkloom\.test/],
      ['/admin/mail', 'screen-mail', /mailbox/i],
      ['/admin/schedule', 'screen-schedule', /02:00/],
      ['/', 'screen-doc-sets', /demo/i],
    ] as const) {
      await page.goto(`${server.url}${path}`);
      await expect
        .poll(
          async () =>
            text.test(
              await page
                .locator('main')
                .innerText()
                .catch(() => ''),
            ),
          { timeout: 60_000 },
        )
        .toBe(true);
      await screenshot(page, name);
    }
    await page.close();
  });
});
