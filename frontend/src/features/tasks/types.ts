// Shapes of the tasks API (docs/mail-and-work.md), inferred from the shared contracts, and their labels.
import {
  TASK_KINDS,
  TASK_PRIORITIES,
  TASK_STATUSES,
  TASK_STATUSES_SET_BY_PEOPLE,
  type SelectedLink,
  type TaskCheck,
  type TaskCheckItem,
  type TaskDetail,
  type TaskEventItem,
  type TaskGrouping,
  type TaskItem,
  type TaskKind,
  type TaskPriority,
  type TaskStatus,
} from '@linkloom/shared';

export { TASK_KINDS, TASK_STATUSES, TASK_STATUSES_SET_BY_PEOPLE };
export type { SelectedLink, TaskCheck, TaskCheckItem, TaskDetail, TaskGrouping, TaskKind, TaskStatus };
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
  verified: 'Fixed and verified',
  'wont-fix': 'Won’t fix',
};

export type Task = TaskItem;
export type TaskEvent = TaskEventItem;

/** What "Create tasks" starts from: the selected pages, or the selected links (then `pagePaths` are their pages). */
export interface TaskRequest {
  kind: TaskKind;
  pagePaths: string[];
  links?: SelectedLink[];
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
