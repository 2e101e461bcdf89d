// Shapes of the tasks API (API.md "Work"), as GET/POST /api/tasks answer them.
export const TASK_KINDS = ['add-inbound-links', 'repair-broken-links', 'add-outbound-links', 'make-reachable', 'review-pruning', 'other'] as const;
export const TASK_STATUSES = ['open', 'in-progress', 'done', 'wont-fix'] as const;
export const PRIORITIES = ['low', 'normal', 'high'] as const;
export type TaskKind = (typeof TASK_KINDS)[number];
export type TaskStatus = (typeof TASK_STATUSES)[number];
export type Priority = (typeof PRIORITIES)[number];

export const KIND_LABELS: Record<TaskKind, string> = {
  'add-inbound-links': 'Add inbound links',
  'repair-broken-links': 'Repair broken links',
  'add-outbound-links': 'Add outbound links',
  'make-reachable': 'Make reachable',
  'review-pruning': 'Review for pruning',
  other: 'Other',
};

export const STATUS_LABELS: Record<TaskStatus, string> = { open: 'Open', 'in-progress': 'In progress', done: 'Done', 'wont-fix': 'Won’t fix' };

export interface Task {
  id: string;
  docSetId: string;
  docSetName: string | null;
  pagePath: string;
  kind: TaskKind;
  title: string;
  details: string;
  finding: {
    brokenLinks?: { href: string; line: number; status: string }[];
    suggestedSources?: { path: string; title: string; scoreGain: number }[];
    flags?: string[];
  };
  assignee: { id: string; name: string; email: string } | null;
  priority: Priority;
  dueDate: string | null;
  overdue: boolean;
  status: TaskStatus;
  verification: 'verified' | 'flagged' | null;
  verifiedAt: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface TaskEvent {
  id: string;
  type: 'comment' | 'change';
  actor: { id: string | null; name: string };
  body: string;
  changes: Record<string, { from: unknown; to: unknown }>;
  at: string;
}

export interface TaskDetail extends Task {
  events: TaskEvent[];
}

export interface Assignee {
  id: string;
  name: string;
  email: string;
  role: string;
}

export interface TaskFilters {
  assignee?: string;
  status?: string[];
  kind?: string;
  docSetId?: string;
  overdue?: boolean;
  pagePath?: string;
  page: number;
  pageSize: number;
  sort?: string;
}
