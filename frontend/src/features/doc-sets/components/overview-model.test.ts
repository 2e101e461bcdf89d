import { describe, expect, it } from 'vitest';
import type { Run } from '@linkloom/shared';
import { concentrationCurve, topShareSentence, trendRuns } from './overview-model.js';

describe('concentrationCurve', () => {
  // Lorenz (1905), "Methods of measuring the concentration of wealth", JASA 9(70): with perfect equality the
  // curve is the diagonal, i.e. the first k of n units hold k/n of the total.
  it('is the diagonal when every page holds the same score', () => {
    const buckets = [1, 2, 3, 4].map((r) => ({ fromRank: r, toRank: r, share: 0.25 }));
    expect(concentrationCurve(buckets, 4)).toEqual([
      { pages: 0, score: 0 },
      { pages: 0.25, score: 0.25 },
      { pages: 0.5, score: 0.5 },
      { pages: 0.75, score: 0.75 },
      { pages: 1, score: 1 },
    ]);
  });

  // Same source: with complete concentration one unit holds everything and the curve jumps to 1 at once.
  it('jumps to 1 at the first page when one page holds all score', () => {
    const curve = concentrationCurve(
      [
        { fromRank: 2, toRank: 10, share: 0 },
        { fromRank: 1, toRank: 1, share: 1 },
      ],
      10,
    );
    expect(curve[1]).toEqual({ pages: 0.1, score: 1 });
    expect(curve[2]).toEqual({ pages: 1, score: 1 });
  });

  it('gives nothing for an empty run', () => {
    expect(concentrationCurve([], 0)).toEqual([]);
  });
});

describe('trendRuns and sentences', () => {
  it('keeps finished runs with counts, oldest first', () => {
    const run = (id: string, status: string, finishedAt: string | null, counts: boolean) =>
      ({ id, status, finishedAt, counts: counts ? { pages: 1 } : null }) as unknown as Run;
    const runs = [
      run('c', 'finished', '2026-03-03T00:00:00Z', true),
      run('x', 'running', null, false),
      run('a', 'finished', '2026-03-01T00:00:00Z', true),
      run('f', 'failed', '2026-03-02T00:00:00Z', false),
    ];
    expect(trendRuns(runs).map((r) => r.id)).toEqual(['a', 'c']);
  });

  it('rounds shares to whole percent', () => {
    expect(topShareSentence(10, 0.6249)).toBe('The top 10% of pages hold 62% of all score');
  });
});
