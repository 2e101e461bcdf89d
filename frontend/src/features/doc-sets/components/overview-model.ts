/**
 * Pure helpers for the overview screen: headline counts, trends and the score-concentration curve.
 * The concentration curve is a Lorenz curve read from the top down (M. O. Lorenz, "Methods of measuring the
 * concentration of wealth", Publications of the American Statistical Association 9(70), 1905): after sorting
 * pages by stationary score, descending, it plots the share of all score held by the top x% of pages.
 */
import type { Run, RunCounts, ScoreDistribution } from '@linkloom/shared';

export interface Headline {
  key: keyof RunCounts;
  label: string;
  /** A rise in pages is growth; a rise in any finding is bad news. */
  upIs: 'better' | 'worse';
  hint: string;
}

export const HEADLINES: Headline[] = [
  { key: 'pages', label: 'Pages', upIs: 'better', hint: 'Markdown pages found in the latest snapshot.' },
  { key: 'brokenLinks', label: 'Broken links', upIs: 'worse', hint: 'Links to a page or file that is not there.' },
  { key: 'brokenAnchors', label: 'Broken anchors', upIs: 'worse', hint: 'Links to a heading that the target page lacks.' },
  { key: 'orphans', label: 'Orphan pages', upIs: 'worse', hint: 'No other page links here.' },
  { key: 'deadEnds', label: 'Dead ends', upIs: 'worse', hint: 'Pages with no link onwards.' },
  { key: 'unreachable', label: 'Unreachable', upIs: 'worse', hint: 'Cannot be reached by clicking from an entry page.' },
  { key: 'deepPages', label: 'Deep pages', upIs: 'worse', hint: 'More clicks from an entry page than the depth threshold.' },
  { key: 'islands', label: 'Islands', upIs: 'worse', hint: 'Groups of pages linked among themselves but cut off from the rest.' },
];

/** Finished runs with counts, oldest first: the x axis of every trend. */
export function trendRuns(runs: Run[] | undefined): Array<Run & { counts: RunCounts; finishedAt: string }> {
  return (runs ?? [])
    .filter(
      (r): r is Run & { counts: RunCounts; finishedAt: string } => r.status === 'finished' && r.counts != null && r.finishedAt != null,
    )
    .sort((a, b) => Date.parse(a.finishedAt) - Date.parse(b.finishedAt));
}

export interface CurvePoint {
  /** Share of pages, most important first, 0..1. */
  pages: number;
  /** Share of all stationary score they hold, 0..1. */
  score: number;
}

/**
 * Cumulative points from rank buckets. `totalPages` is the page count of the run; buckets may arrive in any
 * order and need not cover every rank (a missing tail simply leaves the curve short of 1).
 */
export function concentrationCurve(buckets: ScoreDistribution['buckets'], totalPages: number): CurvePoint[] {
  if (totalPages <= 0) return [];
  const sorted = [...buckets].sort((a, b) => a.fromRank - b.fromRank);
  const points: CurvePoint[] = [{ pages: 0, score: 0 }];
  let held = 0;
  for (const bucket of sorted) {
    held += bucket.share;
    points.push({ pages: Math.min(1, bucket.toRank / totalPages), score: Math.min(1, held) });
  }
  return points;
}

/** "The top 10% of pages hold 62% of all score" — the sentence a docs lead reads. */
export function topShareSentence(percentOfPages: number, share: number): string {
  return `The top ${percentOfPages}% of pages hold ${Math.round(share * 100)}% of all score`;
}

/** What an even spread would give, to compare against: the top x% would hold x%. */
export function evenShare(percentOfPages: number): number {
  return percentOfPages / 100;
}
