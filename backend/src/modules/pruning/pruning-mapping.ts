import type { PruningItem } from '@linkloom/shared';
import type { CandidateWithDecision, NominationRow } from './pruning.repository.js';

export type { PruningItem };

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
    decision: d
      ? {
          decision: d.decision,
          note: d.note,
          by: d.decidedByName,
          at: d.decidedAt.toISOString(),
          flagged: !!d.flaggedAt,
          flagReason: d.flagReason,
        }
      : null,
  };
}
