import type { FixtureLink, FixturePage } from './snapshot-writer.js';

/**
 * An invented handbook for a community bike workshop, drawn by hand so every finding has a known answer:
 * a chain four clicks deep, an orphan mentioned by name on another page, two pages linked only to each
 * other, and one link of each problem status.
 */
export const HANDBOOK_PAGES: FixturePage[] = [
  { path: 'index.md', title: 'Workshop handbook', text: 'Welcome to the workshop. Start with the tools guide.' },
  { path: 'tools/setup.md', title: 'Setting up the bench', text: 'Bolt the vise to the bench before truing wheels.' },
  {
    path: 'tools/install.md',
    title: 'Installing the stand',
    text: 'The repair stand clamps the seat post. See the spoke tension log for wheel work.',
  },
  { path: 'tools/advanced.md', title: 'Advanced wheel truing', text: 'Truing wheels needs a dish gauge and patience.' },
  { path: 'tools/deep/hubs.md', title: 'Hub overhaul', text: 'Hub bearings wear out; repack them every season.' },
  { path: 'spoke-log.md', title: 'Spoke tension log', text: 'Readings from the tension meter, wheel by wheel.' },
  { path: 'swap/left.md', title: '=SUM(1+1) swap day', text: 'Parts swap on the left table.' },
  { path: 'swap/right.md', title: 'Swap right', text: 'Parts swap on the right table.' },
  { path: 'notes/100%_done.md', title: 'Done \\ archived', text: 'Finished repairs.' },
];

export const HANDBOOK_LINKS: FixtureLink[] = [
  { from: 'index.md', to: 'tools/setup.md', line: 3 },
  { from: 'index.md', to: 'notes/100%_done.md', line: 4 },
  { from: 'tools/setup.md', to: 'tools/install.md', line: 5 },
  { from: 'tools/install.md', to: 'tools/advanced.md', line: 2 },
  { from: 'tools/advanced.md', to: 'tools/deep/hubs.md', line: 7 },
  { from: 'tools/install.md', to: 'tools/advanced.md', href: 'old-advanced.md', status: 'redirected', line: 9 },
  { from: 'index.md', href: 'missing.md', targetPath: 'missing.md', status: 'broken', reason: 'no such page', line: 11 },
  { from: 'tools/setup.md', href: 'missing.md', targetPath: 'missing.md', status: 'broken', reason: 'no such page', line: 8 },
  { from: 'tools/setup.md', to: 'tools/install.md', href: 'install.md#nowhere', anchor: 'nowhere', status: 'broken-anchor', line: 9 },
  { from: 'tools/install.md', href: 'javascript:alert(1)', status: 'unsafe', line: 4 },
  { from: 'tools/install.md', href: 'https://example.org/parts', status: 'external', line: 6 },
  { from: 'tools/setup.md', href: 'img/vise.png', targetPath: 'img/vise.png', status: 'broken', targetIsAsset: true, line: 10 },
  { from: 'swap/left.md', to: 'swap/right.md', line: 1 },
  { from: 'swap/right.md', to: 'swap/left.md', line: 1 },
];

/** The next snapshot: the broken link on index.md fixed, the log linked, a new broken link on hubs. */
export const HANDBOOK_PAGES_V2 = HANDBOOK_PAGES;
export const HANDBOOK_LINKS_V2: FixtureLink[] = [
  ...HANDBOOK_LINKS.filter((l) => !(l.from === 'index.md' && l.href === 'missing.md')),
  { from: 'index.md', to: 'spoke-log.md', line: 12 },
  { from: 'tools/deep/hubs.md', href: 'bearings.md', targetPath: 'tools/deep/bearings.md', status: 'broken', line: 2 },
];
