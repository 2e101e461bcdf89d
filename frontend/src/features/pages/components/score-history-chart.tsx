import { Paper, Typography } from '@mui/material';
import { LineChart } from '@mui/x-charts/LineChart';
import { chartColors } from '../../../lib/theme.js';
import type { ScorePoint } from '@linkloom/shared';
import { formatScore } from './format.js';

/** The page's stationary score in each finished run, oldest first. */
export function ScoreHistoryChart({ history }: { history: ScorePoint[] }) {
  const points = [...history].sort((a, b) => Date.parse(a.finishedAt) - Date.parse(b.finishedAt));
  return (
    <Paper variant="outlined" sx={{ p: 2 }} component="section" aria-labelledby="score-history-title">
      <Typography id="score-history-title" variant="h3" component="h2" gutterBottom>
        Score across runs
      </Typography>
      {points.length < 2 ? (
        <Typography variant="body2" color="text.secondary">
          The history appears after the second finished run that includes this page.
        </Typography>
      ) : (
        <LineChart
          height={220}
          colors={chartColors}
          xAxis={[
            {
              data: points.map((p) => new Date(p.finishedAt).toLocaleString(undefined, { dateStyle: 'short', timeStyle: 'short' })),
              scaleType: 'point',
            },
          ]}
          yAxis={[{ valueFormatter: (v: number) => formatScore(v), width: 70 }]}
          series={[
            {
              data: points.map((p) => p.stationaryScore),
              label: 'Stationary score',
              showMark: points.length < 30,
              valueFormatter: (v) => formatScore(v),
            },
          ]}
        />
      )}
    </Paper>
  );
}
