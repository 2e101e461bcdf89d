import { mkdirSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { type BrowserContext, chromium, type Page } from 'playwright-core';

export const ARTIFACTS = fileURLToPath(new URL('../../test-artifacts/screenshots', import.meta.url));

/** Debian's chromium, headless, with the flags this machine needs (no background network). */
export async function launchBrowser(): Promise<BrowserContext> {
  mkdirSync(ARTIFACTS, { recursive: true });
  return chromium.launchPersistentContext(mkdtempSync(join(tmpdir(), 'linkloom-chromium-')), {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1440, height: 900 },
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function screenshot(page: Page, name: string): Promise<string> {
  const file = join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

export async function signIn(page: Page, baseUrl: string, email: string, password = 'linkloom-demo'): Promise<void> {
  // Browser tests share one browser profile: drop any earlier session so the sign-in form shows.
  await page.goto(`${baseUrl}/sign-in`);
  await page.evaluate(() => window.localStorage.clear());
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel(/e-?mail/i).fill(email);
  await page.getByLabel(/password/i).fill(password);
  await page.getByRole('button', { name: /sign in/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: 30_000 });
}
