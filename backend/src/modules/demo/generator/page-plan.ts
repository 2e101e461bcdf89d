import { DEPOTS, EDITOR, HOW_TO, POLICIES, TEAMS, TOOLS, WRITER, humanize } from './scenario.js';
import { intBetween, randomFor } from './prng.js';
import type { PagePlan } from './types.js';
import { VERSION_CHANGES, type HandbookVersion } from './versions.js';

const SEED = 0x5eed_b71;

const HEADINGS: Record<PagePlan['kind'], string[]> = {
  entry: ['## Start here', '## Sections of the handbook', '## Getting help'],
  index: ['## In this section', '## Pages'],
  page: ['## Why this matters', '## What to do', '## Related pages'],
  notes: ['## March meeting', '### Decisions', '## June meeting', '### Decisions', '## October meeting', '### Decisions'],
  policy: ['## Purpose', '## Scope', '## The rules', '## Related policies'],
  'how-to': ['## Before you start', '## Steps', '## If something goes wrong', '## Related'],
  runbook: ['## Symptoms', '## First five minutes', '## Recovery', '## Steps', '## Afterwards'],
  reference: ['## At a glance', '## Details', '## See also'],
  archive: ['## Background', '## What changed'],
};

/** Extra headings that give the demo its custom ids, HTML anchors and headings of its own. */
const SPECIAL_HEADINGS: Record<string, string[]> = {
  'policies/deposit-policy.md': ['## Deposit bands {#deposit-bands}'],
  'policies/lending-policy.md': ['## Late returns', '## Loan lengths {#loan-lengths}'],
  'reference/glossary.md': ['## Depot words', '## Repair words'],
};

const ARCHIVE_TOPICS = [
  '2018-depot-keys',
  '2019-van-rota',
  '2020-fix-night-poster',
  '2019-first-depot-opening',
  '2019-paper-loan-cards',
  '2020-lockdown-click-and-collect',
  '2020-doorstep-returns',
  '2021-volunteer-census',
  '2021-old-fee-bands',
  '2021-spreadsheet-catalogue',
  '2022-hatchbook-migration',
  '2022-van-lease-review',
  '2022-millbrook-flood',
  '2023-tool-amnesty-results',
  '2023-depot-hours-trial',
  '2023-sewing-club-pilot',
  '2024-old-safety-induction',
  '2024-retired-tool-list',
  '2024-north-quarry-move',
  '2019-founding-minutes',
  '2020-grant-report',
  '2021-board-away-day',
  '2022-fix-night-survey',
  '2023-signage-refresh',
];

export function folderOf(path: string): string {
  const i = path.lastIndexOf('/');
  return i < 0 ? '' : path.slice(0, i);
}

export function stemOf(path: string): string {
  return path.slice(path.lastIndexOf('/') + 1).replace(/\.md$/, '');
}

/** All pages of one version of the handbook, in a stable order. */
export function buildPagePlans(version: HandbookVersion): PagePlan[] {
  const changes = VERSION_CHANGES[version];
  const paths: Array<[string, PagePlan['kind'], string?]> = [['index.md', 'entry', 'Brackenridge Handbook']];
  const add = (path: string, kind: PagePlan['kind'], title?: string) => paths.push([path, kind, title]);
  add('onboarding/index.md', 'index', 'Onboarding');
  for (const s of [
    'first-week',
    'meet-the-network',
    'how-we-decide',
    'tool-safety-basics',
    'your-first-steward-shift',
    'using-hatchbook',
    'who-to-ask',
    'depot-tour',
    'buddy-scheme',
    'shadowing',
    'feedback',
    'expenses-quickstart',
  ])
    add(`onboarding/${s}.md`, 'page');
  add('teams/index.md', 'index', 'Teams');
  for (const [team, topics] of Object.entries(TEAMS)) {
    const name = humanize(team);
    add(`teams/${team}/index.md`, 'index', `${name} team`);
    add(`teams/${team}/charter.md`, 'page', `${name} charter`);
    add(`teams/${team}/contacts.md`, 'reference', `${name} contacts`);
    for (const y of [2023, 2024, 2025, 2026]) add(`teams/${team}/meeting-notes-${y}.md`, 'notes', `${name} meeting notes ${y}`);
    for (const t of topics) add(`teams/${team}/${t}.md`, 'page');
  }
  add('policies/index.md', 'index', 'Policies');
  for (const p of POLICIES) add(`policies/${p}.md`, 'policy');
  add('how-to/index.md', 'index', 'How-to guides');
  for (const [area, tasks] of Object.entries(HOW_TO)) {
    add(`how-to/${area}/index.md`, 'index', `How-to: ${humanize(area).toLowerCase()}`);
    for (const t of tasks) add(`how-to/${area}/${t}.md`, 'how-to');
  }
  add('reference/index.md', 'index', 'Reference');
  add('reference/glossary.md', 'reference', 'Glossary');
  add('reference/fee-table.md', 'reference');
  add('reference/depots/index.md', 'index', 'Depot directory');
  for (const d of DEPOTS) add(`reference/depots/${d}.md`, 'reference', `${humanize(d)} depot`);
  add('reference/tools/index.md', 'index', 'Tool sheets');
  for (const t of TOOLS) add(`reference/tools/${t}.md`, 'reference', `Tool sheet: ${humanize(t).toLowerCase()}`);
  for (const k of ['index', 'kiosk-setup', 'kiosk-receipt-printer', 'kiosk-offline-mode'])
    add(`reference/legacy-kiosk/${k}.md`, 'reference', k === 'index' ? 'Self-service kiosk (legacy)' : undefined);
  add('runbooks/index.md', 'index', 'Runbooks');
  add('runbooks/vehicles/van-fleet/index.md', 'index', 'Van fleet runbooks');
  for (const r of ['brake-service', 'brake-service-rear-hub', 'rear-hub-bearing-press'])
    add(`runbooks/vehicles/van-fleet/${r}.md`, 'runbook');
  for (const r of [
    'power-cut',
    'flood-at-depot',
    'hatchbook-down',
    'lost-keys',
    'van-breakdown',
    'fire-alarm',
    'data-breach',
    'stolen-tool',
    'heatwave-opening',
    'snow-closure',
    'volunteer-injury',
    'till-shortfall',
    'card-reader-down',
    'internet-down',
    'it-outage',
    'burst-pipe',
    'gas-smell',
    'break-in',
    'lost-child-at-fix-night',
    'van-accident',
  ])
    add(`runbooks/${r}.md`, 'runbook');
  add('archive/index.md', 'index', 'Archive');
  for (const a of ARCHIVE_TOPICS) add(`archive/${a}.md`, 'archive');
  for (const [p, kind] of changes.addPages) add(p, kind);
  const removed = new Set(changes.removePages);
  const renamed = new Map(changes.renamePages);
  const pages = paths.filter(([p]) => !removed.has(p)).map(([p, kind, title]) => planPage(renamed.get(p) ?? p, kind, title));
  for (const page of pages) {
    Object.assign(page, PAGE_EXTRAS[page.path]);
    // Stale, thin archive orphans are the pruning candidates: old review date, a sentence or two.
    if (page.kind === 'archive' && changes.orphans.includes(page.path)) {
      page.thin = true;
      page.headings = [];
      page.reviewed = page.reviewed.replace(/^\d{4}/, '2019');
    }
  }
  return dedupeTitles(pages);
}

const PAGE_EXTRAS: Record<string, Partial<PagePlan>> = {
  'policies/lending-policy.md': { aliases: ['Loan rules'], redirectFrom: ['/policies/borrowing-rules'], owner: EDITOR },
  'reference/glossary.md': { aliases: ['Jargon buster'] },
  'archive/2019-van-rota.md': { title: 'Swap-run van rota (2019)' },
};

function planPage(path: string, kind: PagePlan['kind'], title?: string): PagePlan {
  const random = randomFor(SEED, path);
  const section = path.includes('/') ? path.slice(0, path.indexOf('/')) : '';
  const stale = kind === 'archive' || random() < 0.15;
  const year = stale ? intBetween(random, 2018, 2022) : intBetween(random, 2025, 2026);
  const month = String(intBetween(random, 1, 12)).padStart(2, '0');
  const day = String(intBetween(random, 1, 28)).padStart(2, '0');
  const ownerRoll = random();
  return {
    path,
    title: title ?? humanize(stemOf(path)),
    section,
    kind,
    owner: ownerRoll < 0.2 ? EDITOR : ownerRoll < 0.4 ? WRITER : undefined,
    tags: [...new Set([section || 'home', kind])],
    reviewed: `${year}-${month}-${day}`,
    headings: [...HEADINGS[kind], ...(SPECIAL_HEADINGS[path] ?? [])],
  };
}

/** Titles must be unique so that title wiki links resolve to one page; clashes get their folder as prefix. */
function dedupeTitles(pages: PagePlan[]): PagePlan[] {
  const count = new Map<string, number>();
  for (const p of pages) count.set(p.title.toLowerCase(), (count.get(p.title.toLowerCase()) ?? 0) + 1);
  for (const p of pages) {
    if ((count.get(p.title.toLowerCase()) ?? 0) > 1) p.title = `${humanize(stemOf(folderOf(p.path)))} ${p.title.toLowerCase()}`;
  }
  return pages;
}
