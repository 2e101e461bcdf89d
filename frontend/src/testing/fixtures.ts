import type { Run, RunCounts } from '../types/api.js';
import { setSession } from '../lib/session.js';
import type { Role } from '@linkloom/shared';

export function counts(overrides: Partial<RunCounts> = {}): RunCounts {
  return {
    pages: 120,
    links: 900,
    internalLinks: 700,
    externalLinks: 200,
    brokenLinks: 9,
    brokenAnchors: 3,
    brokenAssets: 1,
    unsafeLinks: 0,
    ambiguousLinks: 0,
    redirectedLinks: 0,
    outOfScopeLinks: 0,
    orphans: 7,
    deadEnds: 4,
    unreachable: 2,
    deepPages: 5,
    islands: 1,
    ...overrides,
  };
}

export function run(id: string, day: number, overrides: Partial<Run> = {}): Run {
  const start = `2026-11-${String(day).padStart(2, '0')}T10:00:00Z`;
  return {
    id,
    snapshotId: `s-${id}`,
    status: 'finished',
    trigger: 'import',
    settings: {},
    startedAt: start,
    finishedAt: `2026-11-${String(day).padStart(2, '0')}T10:00:02Z`,
    iterations: 40,
    residual: 1e-9,
    counts: counts(),
    ...overrides,
  };
}

export function signInAs(role: Role): void {
  setSession({
    accessToken: 'test-token',
    expiresAt: '2999-01-01T00:00:00Z',
    user: { id: 'u1', email: 'ada@example.test', name: 'Ada', role },
  });
}
