import type { PruningReason } from '../../db/schema/work.js';
import type { CandidateWithDecision, NominationRow } from './pruning.repository.js';

export interface PruningItem {
  path: string;
  title: string;
  reasons: PruningReason[];
  inLatestRun: boolean;
  inboundCount: number | null;
  stationaryScore: number | null;
  wordCount: number | null;
  reviewedAt: string | null;
  firstProposedAt: string;
  nominations: { by: string; reason: string; at: string }[];
  decision: null | { decision: 'approve' | 'reject' | 'keep'; note: string; by: string; at: string; flagged: boolean; flagReason: string | null };
}

export function toPruningItem(row: CandidateWithDecision, nominations: NominationRow[]): PruningItem {
  const d = row.decision;
  return {
    path: row.path,
    title: row.title,
    reasons: row.reasons,
    inLatestRun: row.inLatestRun,
    inboundCount: row.inboundCount,
    stationaryScore: row.stationaryScore,
    wordCount: row.wordCount,
    reviewedAt: row.reviewedAt,
    firstProposedAt: row.firstProposedAt.toISOString(),
    nominations: nominations.map((n) => ({ by: n.nominatedByName, reason: n.reason, at: n.at.toISOString() })),
    decision: d ? { decision: d.decision, note: d.note, by: d.decidedByName, at: d.decidedAt.toISOString(), flagged: !!d.flaggedAt, flagReason: d.flagReason } : null,
  };
}
