import { describe, expect, it } from 'vitest';
import type { PageFinding } from './run-findings.repository.js';
import { findingPresent, verificationStep } from './task-verification.js';

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

describe('findingPresent', () => {
  it('reads the flag that matches each task kind', () => {
    expect(findingPresent('add-inbound-links', page({ orphan: true }))).toBe(true);
    expect(findingPresent('add-inbound-links', page())).toBe(false);
    expect(findingPresent('repair-broken-links', page({ brokenLinks: [{ href: 'x.md', line: 3, status: 'broken' }] }))).toBe(true);
    expect(findingPresent('repair-broken-links', page())).toBe(false);
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

describe('verificationStep', () => {
  it('verifies (and closes) work whose finding is gone', () => {
    expect(verificationStep({ status: 'in-progress', verification: null }, false)).toMatchObject({
      status: 'done',
      verification: 'verified',
    });
    expect(verificationStep({ status: 'done', verification: null }, false)).toMatchObject({ status: 'done', verification: 'verified' });
  });

  it('reopens a verified task when the finding comes back', () => {
    expect(verificationStep({ status: 'done', verification: 'verified' }, true)).toMatchObject({ status: 'open', verification: null });
  });

  it('flags a task marked done whose finding is still there, once', () => {
    expect(verificationStep({ status: 'done', verification: null }, true)).toMatchObject({ status: 'done', verification: 'flagged' });
    expect(verificationStep({ status: 'done', verification: 'flagged' }, true)).toBeNull();
  });

  it('leaves open work with its finding, won’t-fix tasks and unjudgeable kinds alone', () => {
    expect(verificationStep({ status: 'open', verification: null }, true)).toBeNull();
    expect(verificationStep({ status: 'wont-fix', verification: null }, false)).toBeNull();
    expect(verificationStep({ status: 'open', verification: null }, null)).toBeNull();
    expect(verificationStep({ status: 'done', verification: 'verified' }, false)).toBeNull();
  });
});
