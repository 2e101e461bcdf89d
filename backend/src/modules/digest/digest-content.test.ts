import { describe, expect, it } from 'vitest';
import { buildDigestContent, type DigestInput } from './digest-content.js';
import { renderDigest } from './digest-render.js';

const list = (items: Record<string, unknown>[], total = items.length) => ({ total, items });
const none = { appeared: list([]), disappeared: list([]) };
const counts = {
  pages: 4,
  links: 9,
  internalLinks: 9,
  externalLinks: 0,
  brokenLinks: 2,
  brokenAnchors: 1,
  brokenAssets: 0,
  unsafeLinks: 0,
  ambiguousLinks: 0,
  redirectedLinks: 0,
  outOfScopeLinks: 0,
  orphans: 1,
  deadEnds: 0,
  unreachable: 0,
  deepPages: 0,
  islands: 0,
};

// A hand-drawn change between two runs: page d.md removed (with its broken link), one broken link new on a.md,
// one broken anchor fixed; run 7 had 5 pages, run 8 has 4.
const input = (over: Partial<DigestInput> = {}): DigestInput => ({
  docSet: { id: 'd1', name: 'Harbour <ops>\nBcc: x@evil.test' },
  run: { id: 'r8', number: 8, finishedAt: new Date('2026-12-02T01:30:00Z'), pageCount: 4, counts },
  against: { id: 'r7', number: 7, finishedAt: new Date('2026-12-01T01:30:00Z'), pageCount: 5 },
  diff: {
    kinds: {
      brokenLinks: { appeared: list([{ sourcePath: 'a.md', href: 'gone.md' }]), disappeared: list([{ sourcePath: 'd.md', href: 'x.md' }]) },
      brokenAnchors: { appeared: list([]), disappeared: list([{ sourcePath: 'b.md', href: 'c.md#top2' }]) },
      pages: { appeared: list([]), disappeared: list([{ path: 'd.md', title: 'D' }]) },
      orphans: none,
      unreachable: none,
      deadEnds: none,
      deepPages: none,
    },
    // Raw stationary scores (sum 1 per run); "times the average" multiplies by that run's page count.
    scoreMoves: [
      { path: 'a.md', title: 'A', before: 0.2, after: 0.4 },
      { path: 'b.md', title: 'B', before: 0.25, after: 0.25 },
    ],
  },
  tasks: { verified: [{ title: 'Repair x', pagePath: 'b.md', assigneeName: 'Wren', runNumber: 8 }], reopened: [] },
  pruning: { decisions: [], waiting: 0 },
  ...over,
});

describe('digest content', () => {
  it('keeps only kinds that changed, with the diff’s totals, and says when a finding went with its page', () => {
    const content = buildDigestContent(input());
    expect(content.sections.map((s) => [s.label, s.appeared.total, s.disappeared.total])).toEqual([
      ['Broken links', 1, 1],
      ['Broken anchors', 0, 1],
      ['Pages', 0, 1],
    ]);
    expect(content.sections[0].disappeared.items).toEqual(['d.md → x.md (page removed)']);
    expect(content.sections[2].disappeared.items).toEqual(['d.md']);
    expect(content.nothingChanged).toBe(false);
  });

  it('shows score moves as times the average of each run’s own page count, leaving out moves that are noise', () => {
    // a.md: 0.2 x 5 pages = 1.00 before, 0.4 x 4 pages = 1.60 after; b.md: 1.25 -> 1.00 is kept, a real move.
    expect(buildDigestContent(input()).scoreMovers.map((m) => [m.path, m.before, m.after])).toEqual([
      ['a.md', 1, 1.6],
      ['b.md', 1.25, 1],
    ]);
  });

  it('counts nothing changed only when no finding, score, task or pruning decision moved', () => {
    const quiet = input({ diff: { kinds: {}, scoreMoves: [] }, tasks: { verified: [], reopened: [] } });
    expect(buildDigestContent(quiet).nothingChanged).toBe(true);
    expect(
      buildDigestContent({
        ...quiet,
        pruning: { decisions: [{ path: 'old.md', decision: 'approve', by: 'Eve', at: new Date() }], waiting: 0 },
      }).nothingChanged,
    ).toBe(false);
  });
});

describe('digest text and HTML', () => {
  const mail = renderDigest(buildDigestContent(input()), 'Europe/Berlin', {
    findings: 'https://ll.example/f',
    compare: 'https://ll.example/c',
  });
  const text = mail.text.join('\n');
  const html = mail.body.map((b) => b.html).join('');

  it('carries the same numbers in the subject, the text and the HTML', () => {
    for (const line of ['Broken links: 1 new, 1 fixed', 'Broken anchors: 0 new, 1 fixed', 'Pages: 0 added, 1 removed']) {
      expect(text).toContain(line);
      expect(html).toContain(line);
    }
    expect(mail.subject).toContain('Broken links: 1 new, 1 fixed');
    expect(text).toContain('Tasks fixed and verified: 1');
    expect(text).toContain('Totals now: pages 4, broken links 2, broken anchors 1');
  });

  it('writes times in the reader’s zone (Berlin is UTC+1 in December, IANA time zone database)', () => {
    expect(text).toContain('since run 7 of Tue, 1 Dec 2026, 02:30 (Europe/Berlin), up to run 8 of Wed, 2 Dec 2026, 02:30 (Europe/Berlin)');
  });

  it('keeps a doc-set name on one line in the text and escaped in the HTML', () => {
    expect(text).not.toContain('\nBcc:');
    expect(html).toContain('Harbour &lt;ops&gt; Bcc: x@evil.test');
    expect(html).not.toContain('<ops>');
  });
});
