import { describe, expect, it } from 'vitest';
import { runCounts } from './run-counts.js';

describe('runCounts', () => {
  it('splits broken page links from broken assets and counts every status once', () => {
    const counts = runCounts(
      4,
      [
        { status: 'ok', targetIsAsset: false, count: 10 },
        { status: 'ok', targetIsAsset: true, count: 2 },
        { status: 'broken', targetIsAsset: false, count: 3 },
        { status: 'broken', targetIsAsset: true, count: 1 },
        { status: 'external', targetIsAsset: false, count: 5 },
        { status: 'unsafe', targetIsAsset: false, count: 1 },
        { status: 'out-of-scope', targetIsAsset: false, count: 2 },
      ],
      { orphans: 1, deadEnds: 2, unreachable: 0, deepPages: 0, islands: 0, sccCount: 4 },
    );
    expect(counts).toMatchObject({
      pages: 4,
      links: 24,
      internalLinks: 16,
      externalLinks: 5,
      brokenLinks: 3,
      brokenAssets: 1,
      unsafeLinks: 1,
      outOfScopeLinks: 2,
      orphans: 1,
      deadEnds: 2,
    });
  });
});
