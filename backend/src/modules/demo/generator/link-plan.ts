import { fnv1a, rendezvousPick } from './prng.js';
import { folderOf } from './page-plan.js';
import { specialLinks } from './special-links.js';
import type { LinkForm, PagePlan, PlannedLink } from './types.js';
import { VERSION_CHANGES, type HandbookVersion } from './versions.js';

/** The index page that lists a page: the nearest `index.md` above it (an index is listed by its parent's). */
export function listingParent(path: string, exists: ReadonlySet<string>): string | undefined {
  if (path === 'index.md') return undefined;
  let folder = folderOf(path);
  if (path.endsWith('/index.md')) folder = folderOf(folder);
  for (;;) {
    const candidate = folder ? `${folder}/index.md` : 'index.md';
    if (exists.has(candidate) && candidate !== path) return candidate;
    if (!folder) return undefined;
    folder = folderOf(folder);
  }
}

/** Ordinary links are written in many ways; the way is a stable function of the pair, weighted to relative. */
export function pickForm(source: string, target: PagePlan): LinkForm {
  const roll = fnv1a(`form|${source}|${target.path}`) % 100;
  if (roll < 52) return 'relative';
  if (roll < 62) return 'root-absolute';
  if (roll < 70) return 'wiki';
  if (roll < 74) return 'wiki-label';
  if (roll < 77) return target.title.includes(' ') ? 'wiki-title' : 'wiki';
  if (roll < 82) return 'reference-full';
  if (roll < 84) return 'reference-collapsed';
  if (roll < 86) return 'reference-shortcut';
  if (roll < 93) return 'html';
  if (roll < 95) return 'site-url';
  return 'relative';
}

function pageLink(source: string, target: PagePlan): PlannedLink {
  return { source, form: pickForm(source, target), status: 'page', target: target.path, label: target.title };
}

/** Every link of one version: index listings, way back up, cross-links, islands, deep chains, specials. */
export function planLinks(pages: readonly PagePlan[], version: HandbookVersion): PlannedLink[] {
  const changes = VERSION_CHANGES[version];
  const byPath = new Map(pages.map((p) => [p.path, p]));
  const exists = new Set(byPath.keys());
  const islandPages = new Set(changes.islands.flat());
  const chainTails = new Set(changes.deepChains.flatMap((c) => c.slice(1)));
  const orphans = new Set(changes.orphans);
  const deadEnds = new Set(changes.deadEnds);
  const unlisted = (p: string) => islandPages.has(p) || chainTails.has(p) || orphans.has(p);
  const links: PlannedLink[] = [];
  const pool = pages.filter((p) => p.kind !== 'entry' && !unlisted(p.path)).map((p) => p.path);

  for (const page of pages) {
    const parent = listingParent(page.path, exists);
    if (parent && !unlisted(page.path)) links.push(pageLink(parent, page));
    if (deadEnds.has(page.path) || islandPages.has(page.path) || page.kind === 'entry') continue;
    const up = orphans.has(page.path) ? (parent ?? 'index.md') : parent;
    if (up) links.push(pageLink(page.path, byPath.get(up)!));
    if (orphans.has(page.path) || page.kind === 'index') continue;
    const sameSection = pool.filter((p) => p !== page.path && p.startsWith(`${page.section}/`));
    const anywhere = pool.filter((p) => p !== page.path && !p.startsWith(`${page.section}/`));
    const k = 1 + (fnv1a(`k|${page.path}`) % 3);
    for (const t of [...rendezvousPick(page.path, sameSection, k), ...rendezvousPick(`x|${page.path}`, anywhere, 1)])
      links.push(pageLink(page.path, byPath.get(t)!));
  }
  for (const island of changes.islands) {
    island.forEach((p, i) => links.push(pageLink(p, byPath.get(island[(i + 1) % island.length]!)!)));
    for (const p of island.slice(2)) links.push(pageLink(island[0]!, byPath.get(p)!));
  }
  for (const chain of changes.deepChains) chain.slice(1).forEach((p, i) => links.push(pageLink(chain[i]!, byPath.get(p)!)));
  return [...links, ...specialLinks(version, exists)];
}
