import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, signIn } from './support/browser.js';
import { apiAs, waitForDemo } from './support/demo.js';
import { type RunningServer, startServer } from './support/server.js';
import { horizontalOverflow, seriousAxeViolations, VIEWPORTS } from './support/screen-audit.js';

/** Every screen, with text that shows it has loaded its data (not just its loading shell). */
function screens(docSetId: string, topPath: string): [string, string, RegExp][] {
  const base = `/doc-sets/${docSetId}`;
  return [
    ['doc-sets', '/', /demo/i],
    ['overview', base, /pages/i],
    ['pages', `${base}/pages`, /of\s+\d+/],
    ['page-detail', `${base}/page?path=${encodeURIComponent(topPath)}`, /links here|linked from|inbound/i],
    ['worklist', `${base}/findings`, /\d/],
    ['findings-broken', `${base}/findings/broken-links`, /missing target/i],
    ['link-map', `${base}/map`, /map/i],
    ['search', `${base}/search`, /words to find/i],
    ['settings', `${base}/settings`, /damping/i],
    ['runs', `${base}/runs`, /import|nightly|manual/i],
    ['pruning', `${base}/pruning`, /never deletes|retention/i],
    ['tasks', '/tasks', /task/i],
    ['users', '/admin/users', /editor@demo\.linkloom\.test/],
    ['mail', '/admin/mail', /mailbox/i],
    ['schedule', '/admin/schedule', /02:00/],
    ['account', '/account', /password/i],
    ['notifications', '/account/notifications', /time zone/i],
    ['not-found', '/no-such-screen', /nothing lives at this address/i],
  ];
}

async function waitForText(page: Page, text: RegExp): Promise<void> {
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
  // Let the last queries settle so the screenshot and the checks see the finished screen.
  await page.waitForLoadState('networkidle').catch(() => undefined);
}

/**
 * Problems seen and not yet fixed (open work of the screens issue), so that this test fails on anything new
 * while they are worked off. Each entry is `<screen>:<problem>`; `*` matches every screen. Remove an entry
 * when its fix lands: the test also fails when a listed problem no longer occurs, so the list stays true.
 */
const KNOWN_OPEN = new Set([
  'phone/mail:overflow', // the outbox card's toolbar is 47 px too wide at 390 px
  '*:label-content-name-mismatch', // a button whose visible text is not the start of its accessible name
  'findings-broken:list', // a <ul> holding something other than <li>
  'worklist:list',
  'tasks:scrollable-region-focusable', // the tasks table's scroll box cannot be reached by keyboard
]);

function isKnown(viewport: string, screen: string, problem: string): string | undefined {
  return [`${viewport}/${screen}:${problem}`, `${screen}:${problem}`, `*:${problem}`].find((key) => KNOWN_OPEN.has(key));
}

// Drives an already running Linkloom when SCREENS_BASE_URL is set (quick iteration), else boots its own.
const externalUrl = process.env.SCREENS_BASE_URL;

describe('every screen at phone and desktop size: no sideways scrolling, no serious accessibility violation', () => {
  let server: RunningServer | undefined;
  let baseUrl: string;
  let browser: BrowserContext;
  let list: [string, string, RegExp][];

  beforeAll(async () => {
    if (externalUrl) baseUrl = externalUrl;
    else {
      server = await startServer();
      baseUrl = server.url;
    }
    const { docSetId } = await waitForDemo(baseUrl);
    const get = await apiAs(baseUrl, 'admin@demo.linkloom.test');
    const top = (await get(`/api/doc-sets/${docSetId}/runs/latest/pages?sort=-stationaryScore&pageSize=1`)).items[0];
    list = screens(docSetId, top.path);
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.stop('SIGTERM');
    server?.cleanup();
  });

  for (const viewport of VIEWPORTS) {
    it(`at ${viewport.width}x${viewport.height} (${viewport.name})`, async () => {
      const page = await browser.newPage();
      await page.setViewportSize({ width: viewport.width, height: viewport.height });
      await page.goto(`${baseUrl}/sign-in`);
      await page.evaluate(() => window.localStorage.setItem('linkloom.tour.dismissed', '1'));
      await screenshot(page, `responsive-${viewport.name}-sign-in`);
      const problems: string[] = [];
      const seenKnown = new Set<string>();
      const report = (screen: string, problem: string, text: string) => {
        const known = isKnown(viewport.name, screen, problem);
        if (known) seenKnown.add(known);
        else problems.push(text);
      };
      const signInOverflow = await horizontalOverflow(page);
      if (signInOverflow.overflow > 0) report('sign-in', 'overflow', `sign-in scrolls sideways by ${signInOverflow.overflow}px`);
      await signIn(page, baseUrl, 'admin@demo.linkloom.test');
      await page.evaluate(() => window.localStorage.setItem('linkloom.tour.dismissed', '1'));
      for (const [name, path, text] of list) {
        await page.goto(`${baseUrl}${path}`);
        await waitForText(page, text);
        await screenshot(page, `responsive-${viewport.name}-${name}`);
        const { overflow, culprits } = await horizontalOverflow(page);
        // Common practice (responsive design): the page itself never scrolls sideways; wide content scrolls inside its card.
        if (overflow > 0) report(name, 'overflow', `${name} scrolls sideways by ${overflow}px: ${culprits.join(', ')}`);
        for (const v of await seriousAxeViolations(page)) {
          report(name, v.id, `${name}: axe ${v.impact} ${v.id} (${v.help}) at ${v.targets.join(' | ')}`);
        }
      }
      expect(problems).toEqual([]);
      const stillListed = [...KNOWN_OPEN].filter((key) => !key.includes('/') || key.startsWith(`${viewport.name}/`));
      // A listed problem that no longer shows at this size has been fixed: take it off KNOWN_OPEN.
      if (viewport.name === 'phone') expect(stillListed.filter((key) => !seenKnown.has(key))).toEqual([]);
      await page.close();
    });
  }
});
