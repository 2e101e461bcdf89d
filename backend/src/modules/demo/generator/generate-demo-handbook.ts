import { demoAssets } from './demo-assets.js';
import { expectedFindings } from './expected-findings.js';
import { planLinks } from './link-plan.js';
import { buildPagePlans } from './page-plan.js';
import { renderPage } from './render-page.js';
import { BASE_PATH, SITE_URL } from './scenario.js';
import type { DemoDocSet, PagePlan, RenderedLink } from './types.js';
import type { HandbookVersion } from './versions.js';

export const DEMO_SETTINGS = {
  entryPages: ['index.md'],
  basePath: BASE_PATH,
  siteBaseUrls: [SITE_URL],
  depthThreshold: 3,
} as const;

export interface RenderedHandbook {
  pages: PagePlan[];
  links: RenderedLink[];
  files: Record<string, string | Uint8Array>;
}

/** Plans and writes one version; exposed apart from the findings so tests can re-derive them. */
export function renderHandbook(version: HandbookVersion): RenderedHandbook {
  const pages = buildPagePlans(version);
  const planned = planLinks(pages, version);
  const byPath = new Map(pages.map((p) => [p.path, p]));
  const allPaths = pages.map((p) => p.path);
  const files: Record<string, string | Uint8Array> = {};
  const links: RenderedLink[] = [];
  const outgoing = new Map<string, typeof planned>();
  for (const l of planned) outgoing.set(l.source, [...(outgoing.get(l.source) ?? []), l]);
  for (const page of pages) {
    let refs = 0;
    const ctx = { source: page.path, pages: byPath, allPaths, nextRef: () => `r${++refs}` };
    const { text, links: rendered } = renderPage(page, outgoing.get(page.path) ?? [], ctx);
    files[page.path] = text;
    links.push(...rendered);
  }
  Object.assign(files, demoAssets());
  return { pages, links, files };
}

/**
 * The demo doc set: the handbook of the (invented) Brackenridge Tool Library Network at one of three points
 * in time, with the problems seeded into it and the findings an analysis must report.
 */
export function generateDemoHandbook(version: HandbookVersion): DemoDocSet {
  const { pages, links, files } = renderHandbook(version);
  const settings = { ...DEMO_SETTINGS, entryPages: [...DEMO_SETTINGS.entryPages], siteBaseUrls: [...DEMO_SETTINGS.siteBaseUrls] };
  return { files, settings, expected: expectedFindings(pages, links, settings.entryPages, settings.depthThreshold) };
}
