import type { PruningDecision, PruningReason } from '@linkloom/shared';

/** The list's status filter: undecided, one decision, or flagged by a later run. */
export type PruningStatusFilter = '' | 'undecided' | 'approve' | 'reject' | 'keep' | 'flagged';

export const RULE_LABELS: Record<PruningReason['rule'], string> = {
  orphan: 'Orphan',
  unreachable: 'Unreachable',
  'low-score': 'Low score',
  stale: 'Stale',
  thin: 'Thin',
  nominated: 'Nominated',
};

export const DECISION_LABELS: Record<PruningDecision, string> = { approve: 'Approved', reject: 'Rejected', keep: 'Kept (protected)' };
