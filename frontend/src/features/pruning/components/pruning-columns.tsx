import type { ColumnDef } from '@tanstack/react-table';
import { Button, Chip, Stack, Tooltip, Typography } from '@mui/material';
import type { PruningDecision, PruningItem } from '@linkloom/shared';
import { DECISION_LABELS } from './pruning-labels.js';
import { ReasonChips } from './reason-chips.js';

const DECISION_COLOUR = { approve: 'warning', reject: 'default', keep: 'success' } as const;

export function DecisionCell({ item }: { item: PruningItem }) {
  const d = item.decision;
  if (!d)
    return (
      <Typography variant="body2" color="text.secondary">
        Undecided
      </Typography>
    );
  return (
    <Stack spacing={0.5}>
      <Tooltip title={`${d.by}, ${new Date(d.at).toLocaleString()}${d.note ? `: ${d.note}` : ''}`}>
        <Chip size="small" color={DECISION_COLOUR[d.decision]} label={DECISION_LABELS[d.decision]} />
      </Tooltip>
      {d.flagged && (
        <Tooltip title={d.flagReason ?? ''}>
          <Chip size="small" color="error" variant="outlined" label="Needs another look" />
        </Tooltip>
      )}
    </Stack>
  );
}

/** Columns of the pruning list; the action column only for editors (viewers see no buttons they cannot use). */
export function pruningColumns(
  canDecide: boolean,
  decide: (path: string, decision: PruningDecision) => void,
): ColumnDef<PruningItem, unknown>[] {
  const columns: ColumnDef<PruningItem, unknown>[] = [
    {
      id: 'path',
      header: 'Page',
      enableSorting: false,
      cell: ({ row }) => (
        <Stack>
          <Typography variant="body2" sx={{ fontWeight: 500, wordBreak: 'break-all' }}>
            {row.original.path}
          </Typography>
          {row.original.title !== row.original.path && (
            <Typography variant="caption" color="text.secondary">
              {row.original.title}
            </Typography>
          )}
          {!row.original.inLatestRun && (
            <Typography variant="caption" color="text.secondary">
              Not in the latest snapshot
            </Typography>
          )}
        </Stack>
      ),
    },
    { id: 'reasons', header: 'Why proposed', enableSorting: false, cell: ({ row }) => <ReasonChips reasons={row.original.reasons} /> },
    {
      id: 'inboundCount',
      header: 'Inbound',
      enableSorting: false,
      meta: { align: 'right' },
      cell: ({ row }) => row.original.inboundCount ?? '—',
    },
    { id: 'wordCount', header: 'Words', enableSorting: false, meta: { align: 'right' }, cell: ({ row }) => row.original.wordCount ?? '—' },
    { id: 'reviewedAt', header: 'Reviewed', enableSorting: false, cell: ({ row }) => row.original.reviewedAt ?? '—' },
    { id: 'decision', header: 'Decision', enableSorting: false, cell: ({ row }) => <DecisionCell item={row.original} /> },
  ];
  if (!canDecide) return columns;
  return [
    ...columns,
    {
      id: 'actions',
      header: 'Decide',
      enableSorting: false,
      enableHiding: false,
      cell: ({ row }) => (
        <Stack direction="row" spacing={0.5} onClick={(e) => e.stopPropagation()}>
          <Button
            size="small"
            color="warning"
            onClick={() => decide(row.original.path, 'approve')}
            aria-label={`Approve ${row.original.path}`}
          >
            Approve
          </Button>
          <Button size="small" onClick={() => decide(row.original.path, 'reject')} aria-label={`Reject ${row.original.path}`}>
            Reject
          </Button>
          <Button size="small" color="success" onClick={() => decide(row.original.path, 'keep')} aria-label={`Keep ${row.original.path}`}>
            Keep
          </Button>
        </Stack>
      ),
    },
  ];
}
