import type { ColumnDef } from '@tanstack/react-table';
import type { TaskItem } from '@linkloom/shared';
import { KIND_LABELS } from './task-labels.js';
import { Typography } from '@mui/material';
import { TaskStatusChips } from './task-chips.js';

/** Sortable ids match the API's sort keys (dueDate, priority, pagePath, status, createdAt). */
export const taskColumns: ColumnDef<TaskItem, unknown>[] = [
  {
    id: 'title',
    header: 'Task',
    enableSorting: false,
    cell: ({ row }) => (
      <Typography variant="body2" sx={{ fontWeight: 500 }}>
        {row.original.title}
      </Typography>
    ),
  },
  {
    id: 'pagePath',
    header: 'Page',
    cell: ({ row }) => (
      <Typography variant="body2" sx={{ wordBreak: 'break-all' }}>
        {row.original.pagePath}
      </Typography>
    ),
  },
  { id: 'kind', header: 'Kind', enableSorting: false, cell: ({ row }) => KIND_LABELS[row.original.kind] },
  { id: 'docSet', header: 'Doc set', enableSorting: false, cell: ({ row }) => row.original.docSetName ?? '' },
  { id: 'assignee', header: 'Assignee', enableSorting: false, cell: ({ row }) => row.original.assignee?.name ?? '—' },
  { id: 'priority', header: 'Priority', meta: { sortDescFirst: true }, cell: ({ row }) => row.original.priority },
  { id: 'dueDate', header: 'Due', cell: ({ row }) => row.original.dueDate ?? '—' },
  { id: 'status', header: 'Status', cell: ({ row }) => <TaskStatusChips task={row.original} /> },
];
