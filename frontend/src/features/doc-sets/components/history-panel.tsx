import { LinearProgress, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import type { Run } from '@linkloom/shared';
import { useSnapshots } from '../api/get-snapshots.js';
import { StatusChip } from './status-chip.js';

interface Entry {
  at: string;
  what: string;
  status: string;
  detail: string;
  progress: number | null;
}

const when = (iso: string | null | undefined) => (iso ? new Date(iso).toLocaleString() : '—');

/** Imports and runs on one time line, newest first; both lists poll while anything is under way. */
export function HistoryPanel({ docSetId, runs }: { docSetId: string; runs: Run[] | undefined }) {
  const snapshots = useSnapshots(docSetId);
  const entries: Entry[] = [
    ...(snapshots.data ?? []).map((s) => ({
      at: s.createdAt,
      what: 'Import',
      status: s.status,
      detail:
        s.status === 'failed'
          ? (s.error ?? 'failed')
          : s.pageCount != null
            ? `${s.pageCount} pages, ${s.linkCount ?? 0} links, ${s.warnings?.length ?? 0} warnings`
            : '',
      progress: s.status === 'importing' && s.progress?.total ? s.progress.done / s.progress.total : null,
    })),
    ...(runs ?? []).map((r) => ({
      at: r.startedAt ?? r.finishedAt ?? '',
      what: `Run (${r.trigger})`,
      status: r.status,
      detail: r.counts ? `${r.counts.brokenLinks} broken links, ${r.counts.orphans} orphans` : (r.error ?? ''),
      progress: null,
    })),
  ]
    .sort((a, b) => Date.parse(b.at) - Date.parse(a.at))
    .slice(0, 12);

  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Typography variant="h3" component="h2" gutterBottom>
        Imports and runs
      </Typography>
      {snapshots.isLoading && <LoadingSkeleton count={4} />}
      {snapshots.isError && <ErrorPanel error={snapshots.error} onRetry={() => snapshots.refetch()} />}
      {snapshots.isSuccess && entries.length === 0 && (
        <Typography variant="body2" color="text.secondary">
          No snapshot yet: upload a zip of your Markdown.
        </Typography>
      )}
      {entries.length > 0 && (
        <Table size="small" aria-label="Imports and runs">
          <TableHead>
            <TableRow>
              <TableCell>When</TableCell>
              <TableCell>What</TableCell>
              <TableCell>Status</TableCell>
              <TableCell>Result</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {entries.map((e, i) => (
              <TableRow key={`${e.what}-${e.at}-${i}`}>
                <TableCell>{when(e.at)}</TableCell>
                <TableCell>{e.what}</TableCell>
                <TableCell>
                  <StatusChip status={e.status} />
                </TableCell>
                <TableCell>
                  {e.progress !== null ? (
                    <LinearProgress variant="determinate" value={e.progress * 100} aria-label="Import progress" />
                  ) : (
                    e.detail
                  )}
                </TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </Paper>
  );
}
