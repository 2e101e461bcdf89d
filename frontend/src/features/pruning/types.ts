// Shapes of the pruning API (API.md "Work").
export type PruningDecision = 'approve' | 'reject' | 'keep';
export type PruningStatusFilter = '' | 'undecided' | 'approve' | 'reject' | 'keep' | 'flagged';

export interface PruningReason {
  rule: 'orphan' | 'unreachable' | 'low-score' | 'stale' | 'thin' | 'nominated';
  detail: string;
}

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
  decision: null | { decision: PruningDecision; note: string; by: string; at: string; flagged: boolean; flagReason: string | null };
}

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
  orphan: 'Orphan', unreachable: 'Unreachable', 'low-score': 'Low score', stale: 'Stale', thin: 'Thin', nominated: 'Nominated',
};

export const DECISION_LABELS: Record<PruningDecision, string> = { approve: 'Approved', reject: 'Rejected', keep: 'Kept (protected)' };
