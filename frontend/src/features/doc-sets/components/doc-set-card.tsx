import { Link as RouterLink } from 'react-router';
import { Box, Card, CardActionArea, CardContent, Chip, Skeleton, Typography } from '@mui/material';
import { SparkLineChart } from '@mui/x-charts/SparkLineChart';
import type { DocSet } from '@linkloom/shared';
import { isRunBusy, latestFinished, useRuns } from '../../runs/api/get-runs.js';
import { brand } from '../../../lib/theme.js';
import { CountChange } from './count-change.js';

/** One doc set: its latest run's headline counts, change since the run before, and a broken-link trend. */
export function DocSetCard({ docSet }: { docSet: DocSet }) {
  const runs = useRuns(docSet.id);
  const { latest, previous } = latestFinished(runs.data);
  const busy = runs.data?.some(isRunBusy);
  const trend = (runs.data ?? [])
    .filter((r) => r.status === 'finished' && r.counts)
    .reverse()
    .map((r) => r.counts!.brokenLinks);
  return (
    <Card sx={{ height: '100%' }}>
      <CardActionArea
        component={RouterLink}
        to={`/doc-sets/${encodeURIComponent(docSet.id)}`}
        sx={{ height: '100%', alignItems: 'stretch' }}
      >
        <CardContent>
          <Box sx={{ display: 'flex', alignItems: 'center', gap: 1, mb: 0.5 }}>
            <Typography variant="h3" component="h2" sx={{ flex: 1 }}>
              {docSet.name}
            </Typography>
            {busy && <Chip size="small" color="secondary" label="analysing" />}
          </Box>
          <Typography variant="body2" color="text.secondary" sx={{ mb: 2, minHeight: 20 }} noWrap>
            {docSet.description || ' '}
          </Typography>
          {runs.isLoading && <Skeleton variant="rounded" height={64} />}
          {runs.isError && (
            <Typography variant="body2" color="error">
              Runs could not be loaded.
            </Typography>
          )}
          {runs.isSuccess && !latest && (
            <Typography variant="body2" color="text.secondary">
              No finished run yet: open it and upload a zip of your Markdown.
            </Typography>
          )}
          {latest?.counts && (
            <>
              <Box sx={{ display: 'grid', gridTemplateColumns: 'repeat(4, 1fr)', gap: 1 }}>
                <CountChange label="Pages" value={latest.counts.pages} previous={previous?.counts?.pages} upIs="better" />
                <CountChange label="Broken links" value={latest.counts.brokenLinks} previous={previous?.counts?.brokenLinks} upIs="worse" />
                <CountChange label="Orphans" value={latest.counts.orphans} previous={previous?.counts?.orphans} upIs="worse" />
                <CountChange label="Dead ends" value={latest.counts.deadEnds} previous={previous?.counts?.deadEnds} upIs="worse" />
              </Box>
              {trend.length > 1 && (
                <Box sx={{ mt: 1 }} aria-label={`Broken links over the last ${trend.length} runs: ${trend.join(', ')}`} role="img">
                  <SparkLineChart data={trend} height={40} curve="linear" color={brand.saffron} />
                </Box>
              )}
              <Typography variant="caption" color="text.secondary">
                Last analysed {latest.finishedAt ? new Date(latest.finishedAt).toLocaleString() : '—'}
              </Typography>
            </>
          )}
        </CardContent>
      </CardActionArea>
    </Card>
  );
}
