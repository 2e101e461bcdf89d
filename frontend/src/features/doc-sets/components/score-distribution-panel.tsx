import { Box, Paper, Skeleton, Typography } from '@mui/material';
import { LineChart } from '@mui/x-charts/LineChart';
import { brand } from '../../../lib/theme.js';
import { useScoreDistribution } from '../api/get-score-distribution.js';
import { concentrationCurve, evenShare, topShareSentence } from './overview-model.js';

/**
 * How concentrated importance is: a few hub pages holding most of the stationary score is normal for docs,
 * but when the top 1% hold nearly everything, readers who land elsewhere rarely find their way.
 */
export function ScoreDistributionPanel({ docSetId, runId, totalPages }: { docSetId: string; runId: string | null; totalPages: number }) {
  const distribution = useScoreDistribution(docSetId, runId);
  if (!runId || distribution.data === null) return null; // no run yet, or the back end offers no such route
  if (distribution.isLoading) return <Skeleton variant="rounded" height={300} />;
  if (distribution.isError || !distribution.data) {
    return (
      <Paper variant="outlined" sx={{ p: 2 }}>
        <Typography color="text.secondary">The score distribution could not be loaded.</Typography>
      </Paper>
    );
  }
  const { topShares, buckets } = distribution.data;
  const curve = concentrationCurve(buckets, totalPages);
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Typography variant="h3" component="h2">
        Where importance sits
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
        The stationary score is the share of time an imagined reader, following links, spends on each page.
      </Typography>
      <Box component="ul" sx={{ m: 0, pl: 2.5 }}>
        {(
          [
            [1, topShares.top1],
            [10, topShares.top10],
            [50, topShares.top50],
          ] as const
        ).map(([pct, share]) => (
          <li key={pct}>
            <Typography variant="body2">
              {topShareSentence(pct, share)}{' '}
              <Typography component="span" variant="caption" color="text.secondary">
                (an even spread would be {Math.round(evenShare(pct) * 100)}%)
              </Typography>
            </Typography>
          </li>
        ))}
      </Box>
      {curve.length > 2 && (
        <LineChart
          height={240}
          xAxis={[{ data: curve.map((p) => p.pages * 100), label: '% of pages, most important first', min: 0, max: 100 }]}
          yAxis={[{ min: 0, max: 100, label: '% of all score' }]}
          series={[
            { data: curve.map((p) => p.score * 100), label: 'This doc set', showMark: false, color: brand.ink },
            { data: curve.map((p) => p.pages * 100), label: 'Even spread', showMark: false, color: brand.saffron },
          ]}
        />
      )}
    </Paper>
  );
}
