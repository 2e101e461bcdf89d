import { describe, expect, it } from 'vitest';
import { isProtected, percentileThreshold, type PruningPage, proposeCandidates } from './pruning-rules.js';

const settings = { lowScorePercentile: 20, staleDays: 365, thinWordCount: 80, protectGlobs: ['legal/**', '**/index.md'] };
const now = new Date('2026-06-01T00:00:00Z');
const page = (path: string, over: Partial<PruningPage> = {}): PruningPage => ({
  path,
  title: path,
  orphan: false,
  reachable: true,
  stationaryScore: 0.5,
  inboundCount: 3,
  wordCount: 500,
  reviewedAt: null,
  protected: false,
  ...over,
});

describe('percentileThreshold (nearest rank)', () => {
  it('matches the worked example of the nearest-rank method', () => {
    // Wikipedia "Percentile", section "The nearest-rank method", worked example (from memory):
    // list 15, 20, 35, 40, 50 -> 5th percentile 15, 30th 20, 40th 20, 50th 35, 100th 50.
    const list = [15, 20, 35, 40, 50];
    expect(percentileThreshold(list, 5)).toBe(15);
    expect(percentileThreshold(list, 30)).toBe(20);
    expect(percentileThreshold(list, 40)).toBe(20);
    expect(percentileThreshold(list, 50)).toBe(35);
    expect(percentileThreshold(list, 100)).toBe(50);
  });

  it('selects nothing at 0 percent or with no pages', () => {
    expect(percentileThreshold([1, 2], 0)).toBe(-Infinity);
    expect(percentileThreshold([], 50)).toBe(-Infinity);
  });
});

describe('proposeCandidates', () => {
  const pages = [
    page('guide/start.md', { stationaryScore: 0.9 }),
    page('guide/old-faq.md', { orphan: true, stationaryScore: 0.01, wordCount: 40, reviewedAt: '2023-01-10' }),
    page('guide/stub.md', { wordCount: 20, stationaryScore: 0.02 }),
    page('guide/lonely.md', { orphan: true, stationaryScore: 0.6 }),
    page('legal/terms.md', { orphan: true, stationaryScore: 0.03, wordCount: 10 }),
    page('team/index.md', { reachable: false, stationaryScore: 0.04, wordCount: 10 }),
    page('guide/frozen.md', { protected: true, orphan: true, wordCount: 5 }),
    page('guide/island.md', { reachable: false, reviewedAt: '2024-01-01', stationaryScore: 0.7 }),
    page('guide/x.md', { stationaryScore: 0.8 }),
    page('guide/y.md', { stationaryScore: 0.85 }),
  ];
  const result = proposeCandidates(pages, settings, now);
  const byPath = new Map(result.map((r) => [r.page.path, r.reasons.map((x) => x.rule)]));

  it('proposes pages where two or more rules agree, and shows every rule that matched', () => {
    expect(byPath.get('guide/old-faq.md')).toEqual(['orphan', 'low-score', 'stale', 'thin']);
    expect(byPath.get('guide/stub.md')).toEqual(['low-score', 'thin']);
    expect(byPath.get('guide/island.md')).toEqual(['unreachable', 'stale']);
  });

  it('does not propose a page on one signal alone', () => {
    expect(byPath.has('guide/lonely.md')).toBe(false);
    expect(byPath.has('guide/start.md')).toBe(false);
  });

  it('never proposes pages protected by front matter or by a glob', () => {
    expect(byPath.has('legal/terms.md')).toBe(false);
    expect(byPath.has('team/index.md')).toBe(false);
    expect(byPath.has('guide/frozen.md')).toBe(false);
    expect(isProtected({ path: 'legal/a/b.md', protected: false }, ['legal/**'])).toBe(true);
    expect(isProtected({ path: 'guide/legal.md', protected: false }, ['legal/**'])).toBe(false);
  });

  it('writes the value and the threshold into each reason', () => {
    const faq = result.find((r) => r.page.path === 'guide/old-faq.md')!;
    expect(faq.reasons.find((r) => r.rule === 'thin')!.detail).toBe('40 words (fewer than 80).');
    expect(faq.reasons.find((r) => r.rule === 'stale')!.detail).toContain('limit 365');
  });
});
