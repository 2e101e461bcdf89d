// Shapes of the pruning API (API.md "Work").
import type { PruningDecision, PruningItem, PruningReason } from '@linkloom/shared';

export type { PruningDecision, PruningItem, PruningReason };
export type PruningStatusFilter = '' | 'undecided' | 'approve' | 'reject' | 'keep' | 'flagged';

export interface PruningList {
  items: PruningItem[];
  total: number;
  page: number;
  pageSize: number;
  version: number;
  runId: string | null;
  rules: { lowScorePercentile: number; staleDays: number; thinWordCount: number; protectGlobs: string[] };
}

export const RULE_LABELS: Record<PruningReason['rule'], string> = {
  orphan: 'Orphan',
  unreachable: 'Unreachable',
  'low-score': 'Low score',
  stale: 'Stale',
  thin: 'Thin',
  nominated: 'Nominated',
};

export const DECISION_LABELS: Record<PruningDecision, string> = { approve: 'Approved', reject: 'Rejected', keep: 'Kept (protected)' };
