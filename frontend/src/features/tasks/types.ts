// Shapes of the tasks API (API.md "Work"), as GET/POST /api/tasks answer them.
import {
  TASK_KINDS,
  TASK_PRIORITIES,
  TASK_STATUSES,
  type TaskEventItem,
  type TaskItem,
  type TaskKind,
  type TaskPriority,
  type TaskStatus,
} from '@linkloom/shared';

export { TASK_KINDS, TASK_STATUSES };
export type { TaskKind, TaskStatus };
export const PRIORITIES = TASK_PRIORITIES;
export type Priority = TaskPriority;

export const KIND_LABELS: Record<TaskKind, string> = {
  'add-inbound-links': 'Add inbound links',
  'repair-broken-links': 'Repair broken links',
  'add-outbound-links': 'Add outbound links',
  'make-reachable': 'Make reachable',
  'review-pruning': 'Review for pruning',
  other: 'Other',
};

export const STATUS_LABELS: Record<TaskStatus, string> = {
  open: 'Open',
  'in-progress': 'In progress',
  done: 'Done',
  'wont-fix': 'Won’t fix',
};

export type Task = TaskItem;
export type TaskEvent = TaskEventItem;

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
