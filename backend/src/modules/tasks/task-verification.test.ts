import type { TaskCheckItem } from '@linkloom/shared';
import { describe, expect, it } from 'vitest';
import type { PageFinding } from './run-findings.repository.js';
import { checkItems, checkOutcome, findingPresent, verificationStep } from './task-verification.js';

// Hand-drawn cases: which finding each kind of task is about follows docs/mail-and-work.md ("Fix tasks")
// (orphan = no inbound links, dead end = no outbound links, unreachable from the entry pages).
const page = (over: Partial<PageFinding> = {}): PageFinding => ({
  path: 'guide/a.md',
  title: 'A',
  orphan: false,
  deadEnd: false,
  reachable: true,
  deep: false,
  inboundCount: 2,
  stationaryScore: 0.1,
  wordCount: 300,
  ownerEmail: null,
  reviewedAt: null,
  protected: false,
  brokenLinks: [],
  ...over,
});
const item = (stillFound: boolean, href: string | null = 'x.md'): TaskCheckItem => ({
  pagePath: 'guide/a.md',
  href,
  line: href ? 3 : null,
  stillFound,
  status: stillFound && href ? 'broken' : null,
});

describe('findingPresent', () => {
  it('reads the flag that matches each task kind', () => {
    expect(findingPresent('add-inbound-links', page({ orphan: true }))).toBe(true);
    expect(findingPresent('add-inbound-links', page())).toBe(false);
    expect(findingPresent('add-outbound-links', page({ deadEnd: true }))).toBe(true);
    expect(findingPresent('make-reachable', page({ reachable: false }))).toBe(true);
    expect(findingPresent('make-reachable', page())).toBe(false);
  });

  it('treats a page gone from the run as a finding gone, and cannot judge review or other tasks', () => {
    expect(findingPresent('add-inbound-links', undefined)).toBe(false);
    expect(findingPresent('review-pruning', page())).toBeNull();
    expect(findingPresent('other', undefined)).toBeNull();
  });
});

describe('checkItems', () => {
  const pages = new Map([
    ['guide/a.md', page({ brokenLinks: [{ href: 'gone.md', line: 14, status: 'broken' }] })],
    ['guide/b.md', page({ path: 'guide/b.md', orphan: true })],
  ]);

  it('judges each link of a task on its own page, by href (lines move when text above is edited)', () => {
    const items = checkItems(
      {
        kind: 'repair-broken-links',
        pagePath: 'guide/a.md',
        finding: {
          brokenLinks: [
            { sourcePath: 'guide/a.md', href: 'gone.md', line: 12, status: 'broken' },
            { sourcePath: 'guide/a.md', href: 'fixed.md', line: 20, status: 'broken' },
          ],
        },
      },
      pages,
    );
    expect(items).toEqual([
      { pagePath: 'guide/a.md', href: 'gone.md', line: 14, stillFound: true, status: 'broken' },
      { pagePath: 'guide/a.md', href: 'fixed.md', line: 20, stillFound: false, status: null },
    ]);
  });

  it('judges each page of a grouped page task, and a task of an older shape by its own page', () => {
    const grouped = checkItems(
      {
        kind: 'add-inbound-links',
        pagePath: 'guide/a.md',
        finding: {
          pages: [
            { path: 'guide/a.md', flags: [] },
            { path: 'guide/b.md', flags: [] },
          ],
        },
      },
      pages,
    );
    expect(grouped?.map((i) => [i.pagePath, i.stillFound])).toEqual([
      ['guide/a.md', false],
      ['guide/b.md', true],
    ]);
    expect(checkItems({ kind: 'add-inbound-links', pagePath: 'guide/b.md', finding: {} }, pages)).toEqual([
      { pagePath: 'guide/b.md', href: null, line: null, stillFound: true, status: null },
    ]);
    expect(checkItems({ kind: 'other', pagePath: 'guide/a.md', finding: {} }, pages)).toBeNull();
  });
});

describe('verificationStep', () => {
  it('moves work whose findings are all gone to its own "verified" state, whatever the writer had set', () => {
    for (const status of ['open', 'in-progress', 'done'] as const) {
      expect(verificationStep({ status, verification: null }, [item(false)], 7)).toMatchObject({
        status: 'verified',
        verification: 'verified',
        outcome: 'verified',
        note: 'Run 7 no longer finds this: fixed and verified.',
      });
    }
    expect(verificationStep({ status: 'verified', verification: 'verified' }, [item(false)], 8)).toBeNull();
  });

  it('reopens a verified task when a finding comes back, naming the link', () => {
    const step = verificationStep({ status: 'verified', verification: 'verified' }, [item(true, 'back.md'), item(false, 'ok.md')], 9);
    expect(step).toMatchObject({ status: 'open', verification: null, outcome: 'reopened' });
    expect(step?.note).toBe('Run 9 finds it again, so it is reopened. Still found: 1 of 2: guide/a.md line 3: back.md (broken).');
  });

  it('flags a task marked done that the run still finds, once, with the links still found', () => {
    const step = verificationStep({ status: 'done', verification: null }, [item(true), item(false, 'fine.md')], 3);
    expect(step).toMatchObject({ status: 'done', verification: 'flagged', outcome: 'still-found' });
    expect(step?.note).toBe('Marked done, but run 3 still finds 1 of 2: guide/a.md line 3: x.md (broken).');
    expect(verificationStep({ status: 'done', verification: 'flagged' }, [item(true)], 4)).toBeNull();
  });

  it('leaves open work with its findings and won’t-fix tasks alone, and tells partly fixed from untouched', () => {
    expect(verificationStep({ status: 'open', verification: null }, [item(true)], 2)).toBeNull();
    expect(verificationStep({ status: 'wont-fix', verification: null }, [item(false)], 2)).toBeNull();
    expect(checkOutcome([item(true), item(false)], null)).toBe('partly-fixed');
    expect(checkOutcome([item(true)], null)).toBe('still-found');
  });
});
