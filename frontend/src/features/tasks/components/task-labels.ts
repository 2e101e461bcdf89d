import type { SelectedLink, TaskKind, TaskStatus } from '@linkloom/shared';

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

/** What "Create tasks" starts from: the selected pages, or the selected links (then `pagePaths` are their pages). */
export interface TaskRequest {
  kind: TaskKind;
  pagePaths: string[];
  links?: SelectedLink[];
}

/** The task list's filters and paging, as kept in the URL. */
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
