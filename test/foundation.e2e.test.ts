import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { launchBrowser, screenshot, signIn } from './support/browser.js';
import { type RunningServer, startServer } from './support/server.js';

describe('the product, started as a user would start it', () => {
  let server: RunningServer;
  let browser: BrowserContext;
  beforeAll(async () => {
    server = await startServer({ DEMO_CONTENT: 'false' });
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    const ended = await server?.stop('SIGTERM');
    // Nest closes everything, then re-raises SIGTERM; a clean stop also removes the data-folder lock.
    expect([0, 'SIGTERM']).toContain(ended);
    expect(existsSync(join(server.dataDir, 'linkloom.lock'))).toBe(false);
    expect(server.output()).not.toMatch(/Unhandled|Error:/);
    server?.cleanup();
  });

  it('serves the front end and the API on one port', async () => {
    const page = await fetch(`${server.url}/doc-sets/anything`);
    expect(page.status).toBe(200);
    expect(await page.text()).toContain('<div id="root">');
    const health = await (await fetch(`${server.url}/api/health`)).json();
    expect(health).toMatchObject({ status: 'ok', database: 'pglite', demo: true });
  });

  it('signs in as the demo editor and shows the app shell with the demo notice', async () => {
    const page = await browser.newPage();
    await signIn(page, server.url, 'editor@demo.linkloom.test');
    await expect
      .poll(
        () =>
          page
            .getByText(/demo data/i)
            .first()
            .isVisible(),
        { timeout: 20_000 },
      )
      .toBe(true);
    expect(await page.getByRole('button', { name: /Account menu for Edda Editor/ }).count()).toBe(1);
    expect(await page.evaluate(() => document.fonts.check('16px Roboto'))).toBe(true);
    await screenshot(page, 'foundation-shell-editor');
    // Editors have no user administration.
    await page.goto(`${server.url}/admin/users`);
    await expect
      .poll(
        () =>
          page
            .getByText(/not open to your role/i)
            .first()
            .isVisible(),
        { timeout: 20_000 },
      )
      .toBe(true);
    await page.close();
  });

  it('refuses a second server on the same data folder, naming the first one', async () => {
    const second = await startServer({ DEMO_CONTENT: 'false' }, { dataDir: server.dataDir, timeoutMs: 30_000 }).catch((e: Error) => e);
    expect(second).toBeInstanceOf(Error);
    expect(String(second)).toContain('DATA_DIR_LOCKED');
    expect(String(second)).toContain(String(server.process.pid));
  });
});
