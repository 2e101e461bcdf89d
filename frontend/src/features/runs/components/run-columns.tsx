import type { ColumnDef } from '@tanstack/react-table';
import type { Run } from '@linkloom/shared';
import { StatusChip } from '../../doc-sets/components/status-chip.js';

const nf = new Intl.NumberFormat();

export function runDuration(run: Pick<Run, 'startedAt' | 'finishedAt' | 'durationMs'>): string {
  const ms = run.durationMs ?? (run.startedAt && run.finishedAt ? Date.parse(run.finishedAt) - Date.parse(run.startedAt) : Number.NaN);
  if (!Number.isFinite(ms) || ms < 0) return '—';
  if (ms < 1000) return `${ms} ms`;
  if (ms < 60_000) return `${(ms / 1000).toFixed(1)} s`;
  return `${Math.floor(ms / 60_000)} min ${Math.round((ms % 60_000) / 1000)} s`;
}

const count = (key: keyof NonNullable<Run['counts']> & string, header: string): ColumnDef<Run, unknown> => ({
  id: key,
  header,
  enableSorting: false,
  meta: { align: 'right' },
  cell: ({ row }) => (row.original.counts ? nf.format(row.original.counts[key]) : '—'),
});

export const runColumns: ColumnDef<Run, unknown>[] = [
  {
    id: 'number',
    header: 'Run',
    enableSorting: false,
    meta: { align: 'right' },
    cell: ({ row }) => (row.original.number ? `#${row.original.number}` : '—'),
  },
  {
    id: 'startedAt',
    header: 'Started',
    enableSorting: false,
    enableHiding: false,
    cell: ({ row }) => (row.original.startedAt ? new Date(row.original.startedAt).toLocaleString() : 'waiting'),
  },
  { accessorKey: 'trigger', header: 'Trigger', enableSorting: false },
  { id: 'status', header: 'Status', enableSorting: false, cell: ({ row }) => <StatusChip status={row.original.status} /> },
  { accessorKey: 'iterations', header: 'Iterations', enableSorting: false, meta: { align: 'right' } },
  {
    id: 'residual',
    header: 'Residual',
    enableSorting: false,
    meta: { align: 'right' },
    cell: ({ row }) => (row.original.residual == null ? '—' : row.original.residual.toExponential(1)),
  },
  { id: 'duration', header: 'Duration', enableSorting: false, meta: { align: 'right' }, cell: ({ row }) => runDuration(row.original) },
  count('pages', 'Pages'),
  count('brokenLinks', 'Broken links'),
  count('brokenAnchors', 'Broken anchors'),
  count('orphans', 'Orphans'),
  count('deadEnds', 'Dead ends'),
  count('unreachable', 'Unreachable'),
];
