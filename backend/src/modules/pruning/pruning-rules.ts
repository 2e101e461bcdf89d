// Pruning proposals: rule-based, every rule that matched is kept with the candidate so editors see why.
// Method: a page is proposed when at least two independent weak signals agree (orphan/unreachable, lowest
// stationary-score share, stale review date, thin text); a single signal is too common to act on alone.
// Low-score share uses the nearest-rank percentile: the value at rank ceil(p/100 * N) of the ascending values
// (common practice; e.g. Wikipedia "Percentile", section "The nearest-rank method"; cited from memory).
// Pages protected in front matter or by a picomatch glob never appear.
import picomatch from 'picomatch';
import type { PruningReason } from '../../db/schema/work.js';

export interface PruningPage {
  path: string;
  title: string;
  orphan: boolean;
  reachable: boolean;
  stationaryScore: number;
  inboundCount: number;
  wordCount: number;
  reviewedAt: string | null;
  protected: boolean;
}

export interface PruningRuleSettings {
  lowScorePercentile: number;
  staleDays: number;
  thinWordCount: number;
  protectGlobs: string[];
}

export const MIN_SIGNALS = 2;
const DAY_MS = 86_400_000;

/** The score at the nearest-rank p-th percentile of ascending scores (`-Infinity` when p is 0 or no pages). */
export function percentileThreshold(scores: number[], percentile: number): number {
  if (scores.length === 0 || percentile <= 0) return -Infinity;
  const sorted = [...scores].sort((a, b) => a - b);
  const rank = Math.min(sorted.length, Math.max(1, Math.ceil((percentile / 100) * sorted.length)));
  return sorted[rank - 1];
}

export function isProtected(page: Pick<PruningPage, 'path' | 'protected'>, globs: string[]): boolean {
  if (page.protected) return true;
  return globs.length > 0 && picomatch(globs, { dot: true })(page.path);
}

/** Every rule the page meets, each with a sentence that shows the value and the threshold. */
export function pruningReasons(page: PruningPage, settings: PruningRuleSettings, lowScore: number, now: Date): PruningReason[] {
  const reasons: PruningReason[] = [];
  if (page.orphan) reasons.push({ rule: 'orphan', detail: 'No other page links here.' });
  else if (!page.reachable) reasons.push({ rule: 'unreachable', detail: 'Readers cannot reach it from an entry page.' });
  if (page.stationaryScore <= lowScore) {
    reasons.push({ rule: 'low-score', detail: `Stationary score in the lowest ${settings.lowScorePercentile}% of pages.` });
  }
  const reviewed = page.reviewedAt ? Date.parse(page.reviewedAt) : Number.NaN;
  if (!Number.isNaN(reviewed)) {
    const days = Math.floor((now.getTime() - reviewed) / DAY_MS);
    if (days > settings.staleDays)
      reasons.push({ rule: 'stale', detail: `Last reviewed ${page.reviewedAt} (${days} days ago; limit ${settings.staleDays}).` });
  }
  if (page.wordCount < settings.thinWordCount)
    reasons.push({ rule: 'thin', detail: `${page.wordCount} words (fewer than ${settings.thinWordCount}).` });
  return reasons;
}

/** The candidates of one run: unprotected pages meeting at least MIN_SIGNALS rules. */
export function proposeCandidates(
  pages: PruningPage[],
  settings: PruningRuleSettings,
  now: Date,
): { page: PruningPage; reasons: PruningReason[] }[] {
  const lowScore = percentileThreshold(
    pages.map((p) => p.stationaryScore),
    settings.lowScorePercentile,
  );
  const result: { page: PruningPage; reasons: PruningReason[] }[] = [];
  for (const page of pages) {
    if (isProtected(page, settings.protectGlobs)) continue;
    const reasons = pruningReasons(page, settings, lowScore, now);
    if (reasons.length >= MIN_SIGNALS) result.push({ page, reasons });
  }
  return result;
}
