/** Fix tasks and the pruning list as the HTTP contract carries them (API.md "Work"). */
export const TASK_KINDS = [
  'add-inbound-links',
  'repair-broken-links',
  'add-outbound-links',
  'make-reachable',
  'review-pruning',
  'other',
] as const;
export const TASK_STATUSES = ['open', 'in-progress', 'done', 'wont-fix'] as const;
export const TASK_PRIORITIES = ['low', 'normal', 'high'] as const;
export type TaskKind = (typeof TASK_KINDS)[number];
export type TaskStatus = (typeof TASK_STATUSES)[number];
export type TaskPriority = (typeof TASK_PRIORITIES)[number];

/** What a task was made from: the broken hrefs with lines, or the suggested source pages with their gain. */
export interface TaskFinding {
  brokenLinks?: { href: string; line: number; status: string }[];
  suggestedSources?: { path: string; title: string; scoreGain: number }[];
  flags?: string[];
}

export interface TaskItem {
  id: string;
  docSetId: string;
  docSetName: string | null;
  pagePath: string;
  kind: TaskKind;
  title: string;
  details: string;
  finding: TaskFinding;
  assignee: { id: string; name: string; email: string } | null;
  priority: TaskPriority;
  dueDate: string | null;
  overdue: boolean;
  status: TaskStatus;
  verification: 'verified' | 'flagged' | null;
  verifiedAt: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface TaskEventItem {
  id: string;
  type: 'comment' | 'change';
  actor: { id: string | null; name: string };
  body: string;
  changes: Record<string, { from: unknown; to: unknown }>;
  at: string;
}

export type PruningDecision = 'approve' | 'reject' | 'keep';

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
