import { createRequire } from 'node:module';
import { readFileSync } from 'node:fs';
import type { Page } from 'playwright-core';

const require = createRequire(import.meta.url);
const axeSource = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

/** The two sizes every screen must work at: a common phone (390x844) and a common laptop (1440x900). */
export const VIEWPORTS = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'desktop', width: 1440, height: 900 },
] as const;

/** How far the page scrolls sideways: 0 when nothing sticks out past the viewport's right edge. */
export async function horizontalOverflow(page: Page): Promise<{ overflow: number; culprits: string[] }> {
  return page.evaluate(() => {
    const width = document.documentElement.clientWidth;
    const overflow = document.documentElement.scrollWidth - width;
    const culprits: string[] = [];
    if (overflow > 0) {
      for (const el of Array.from(document.body.querySelectorAll<HTMLElement>('*'))) {
        const box = el.getBoundingClientRect();
        if (box.right > width + 1 && box.width > 0 && culprits.length < 5) {
          culprits.push(
            `${el.tagName.toLowerCase()}.${String(el.className).split(' ').slice(0, 2).join('.')} right=${Math.round(box.right)}`,
          );
        }
      }
    }
    return { overflow, culprits };
  });
}

/** The part of an axe-core result this check reads. */
interface RawViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: unknown }[];
}

export interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
}

/**
 * Runs axe-core (Deque Systems, axe-core rule set) on the page for the WCAG 2.0/2.1/2.2 A and AA tags and
 * returns the violations rated serious or critical.
 */
export async function seriousAxeViolations(page: Page): Promise<AxeViolation[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(axeSource); // through the debugging protocol, so the app's CSP does not block it
  return page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run: (ctx: unknown, opts: unknown) => Promise<{ violations: RawViolation[] }> } }).axe;
    const result = await axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'] },
    });
    return result.violations
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map((v) => ({ id: v.id, impact: v.impact, help: v.help, targets: v.nodes.slice(0, 4).map((n) => String(n.target)) }));
  });
}
