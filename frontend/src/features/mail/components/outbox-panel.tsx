import type { ColumnDef } from '@tanstack/react-table';
import { Chip, Stack, Typography } from '@mui/material';
import { DataTable } from '../../../components/ui/data-table.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { OUTBOX_STATUSES, type OutboxMessage, type OutboxStatus } from '@linkloom/shared';
import { useOutbox } from '../api/get-outbox.js';

interface OutboxPanelProps {
  status: OutboxStatus | '';
  onStatusChange: (status: OutboxStatus | '') => void;
  page: number;
  pageSize: number;
  onPageChange: (page: number) => void;
  onPageSizeChange: (pageSize: number) => void;
}

const STATUS_COLOUR = { pending: 'default', sending: 'info', sent: 'success', failed: 'error' } as const;
const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString() : '—');

const columns: ColumnDef<OutboxMessage, unknown>[] = [
  {
    id: 'status',
    header: 'Status',
    enableSorting: false,
    cell: ({ row }) => (
      <Chip
        size="small"
        label={row.original.status}
        color={STATUS_COLOUR[row.original.status]}
        variant={row.original.status === 'failed' ? 'filled' : 'outlined'}
      />
    ),
  },
  { id: 'toAddress', header: 'To', enableSorting: false, cell: ({ row }) => row.original.toAddress },
  { id: 'subject', header: 'Subject', enableSorting: false, cell: ({ row }) => row.original.subject },
  { id: 'kind', header: 'Kind', enableSorting: false, cell: ({ row }) => row.original.kind },
  { id: 'attempts', header: 'Attempts', enableSorting: false, meta: { align: 'right' }, cell: ({ row }) => row.original.attempts },
  {
    id: 'nextAttemptAt',
    header: 'Next attempt',
    enableSorting: false,
    // Only a pending message will be tried again; for the others the stored time means nothing.
    cell: ({ row }) => (row.original.status === 'pending' ? when(row.original.nextAttemptAt) : '—'),
  },
  {
    id: 'lastError',
    header: 'Last error',
    enableSorting: false,
    cell: ({ row }) =>
      row.original.lastError ? (
        <Typography variant="body2" color={row.original.status === 'failed' ? 'error' : 'warning.main'} sx={{ wordBreak: 'break-word' }}>
          {row.original.lastError}
        </Typography>
      ) : (
        '—'
      ),
  },
  { id: 'sentAt', header: 'Sent', enableSorting: false, cell: ({ row }) => when(row.original.sentAt) },
];

/** Every e-mail Linkloom queued, with its delivery state; failed ones stand out in red. */
export function OutboxPanel({ status, onStatusChange, page, pageSize, onPageChange, onPageSizeChange }: OutboxPanelProps) {
  const outbox = useOutbox(status, page, pageSize);
  const chips = (
    <Stack direction="row" spacing={1} role="group" aria-label="Filter by status" sx={{ flexWrap: 'wrap' }}>
      {(['', ...OUTBOX_STATUSES] as const).map((s) => (
        <Chip
          key={s || 'all'}
          label={s || 'all'}
          clickable
          color={s === 'failed' ? 'error' : 'primary'}
          variant={status === s ? 'filled' : 'outlined'}
          aria-pressed={status === s}
          onClick={() => onStatusChange(s)}
        />
      ))}
    </Stack>
  );
  return (
    <DataTable
      label="Outbox"
      columns={columns}
      data={outbox.data?.items}
      total={outbox.data?.total ?? 0}
      page={page}
      pageSize={pageSize}
      sort=""
      onSortChange={() => undefined}
      onPageChange={onPageChange}
      onPageSizeChange={onPageSizeChange}
      loading={outbox.isLoading}
      error={outbox.error}
      onRetry={() => outbox.refetch()}
      rowId={(m) => m.id}
      toolbar={chips}
      emptyState={
        <EmptyState
          title={status ? `No ${status} mail` : 'No mail queued yet'}
          hint={
            status
              ? 'Pick “all” to see every message.'
              : 'Mail is queued when a digest or a task notice is due; it shows up here with its delivery state.'
          }
        />
      }
    />
  );
}
