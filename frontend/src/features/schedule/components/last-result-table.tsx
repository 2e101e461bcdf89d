import { Link as RouterLink } from 'react-router';
import { Chip, Link, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { EmptyState } from '../../../components/ui/empty-state.js';
import type { NightlyDocSetResult, NightlyResult } from '@linkloom/shared';

/** A finished run opens on its findings; a failed one on the runs list, where its error is shown. */
function runLink(result: NightlyDocSetResult): string {
  const base = `/doc-sets/${encodeURIComponent(result.docSetId)}`;
  if (result.outcome === 'finished' && result.runId) return `${base}/findings?run=${encodeURIComponent(result.runId)}`;
  return `${base}/runs`;
}

/** "digest sent to 3 people"; a night with no change mails only those who asked for that. */
export function digestText(result: NightlyDocSetResult): string {
  if (result.outcome !== 'finished') return 'no digest: the run did not finish';
  if (result.digestSentTo === undefined) return '—';
  const n = result.digestSentTo;
  return n === 0 ? 'digest sent to nobody (nothing to report, or no readers)' : `digest sent to ${n} ${n === 1 ? 'person' : 'people'}`;
}

/** What the last nightly job did for each doc set. */
export function LastResultTable({ result }: { result: NightlyResult | null }) {
  if (!result || !result.docSets?.length) {
    return (
      <Paper variant="outlined">
        <EmptyState
          title={result ? 'The last nightly job had nothing to do' : 'No nightly job has run yet'}
          hint="Turn on nightly runs in a doc set's settings, then wait for the next night or press “Run now”."
        />
      </Paper>
    );
  }
  return (
    <Paper variant="outlined">
      <Typography variant="h3" component="h2" sx={{ p: 2, pb: 0 }}>
        Last result per doc set
      </Typography>
      <Table size="small" aria-label="Last result per doc set">
        <TableHead>
          <TableRow>
            <TableCell>Doc set</TableCell>
            <TableCell>What it did</TableCell>
            <TableCell>Outcome</TableCell>
            <TableCell>Digest</TableCell>
            <TableCell>Run</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {result.docSets.map((r) => (
            <TableRow key={r.docSetId}>
              <TableCell>{r.name}</TableCell>
              <TableCell>{r.action}</TableCell>
              <TableCell>
                <Chip size="small" label={r.outcome} color={r.outcome === 'failed' ? 'error' : 'success'} variant="outlined" />
                {r.message && (
                  <Typography variant="body2" color={r.outcome === 'failed' ? 'error' : 'text.secondary'} sx={{ mt: 0.5 }}>
                    {r.message}
                  </Typography>
                )}
              </TableCell>
              <TableCell>{digestText(r)}</TableCell>
              <TableCell>
                <Link component={RouterLink} to={runLink(r)}>
                  {r.outcome === 'finished' && r.runId ? `Open findings of run ${r.runNumber ?? ''}`.trim() : 'Open runs'}
                </Link>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Paper>
  );
}
