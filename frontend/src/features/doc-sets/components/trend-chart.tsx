import { useState } from 'react';
import { Paper, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import { LineChart } from '@mui/x-charts/LineChart';
import type { Run } from '@linkloom/shared';
import { chartColors } from '../../../lib/theme.js';
import { HEADLINES, trendRuns } from './overview-model.js';

const GROUPS = {
  links: ['brokenLinks', 'brokenAnchors'],
  structure: ['orphans', 'deadEnds', 'unreachable', 'deepPages', 'islands'],
  size: ['pages'],
} as const;

/** Counts over all finished runs, one chart per group so small numbers are not flattened by page counts. */
export function TrendChart({ runs }: { runs: Run[] | undefined }) {
  const [group, setGroup] = useState<keyof typeof GROUPS>('links');
  const points = trendRuns(runs);
  if (points.length < 2) {
    return (
      <Paper variant="outlined" sx={{ p: 2 }}>
        <Typography variant="h3" component="h2" gutterBottom>
          Trends
        </Typography>
        <Typography variant="body2" color="text.secondary">
          Trends appear after the second finished run.
        </Typography>
      </Paper>
    );
  }
  // One tick per run, keyed by position: runs finished in the same minute would share a date label and
  // a point scale would fold them into one.
  const dates = points.map((r) => new Date(r.finishedAt).toLocaleString(undefined, { dateStyle: 'short', timeStyle: 'short' }));
  const x = points.map((_, i) => i);
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Typography variant="h3" component="h2" sx={{ mb: 1 }}>
        Trends over {points.length} runs
      </Typography>
      <ToggleButtonGroup size="small" exclusive value={group} onChange={(_, v) => v && setGroup(v)} aria-label="Which counts">
        <ToggleButton value="links">Broken links</ToggleButton>
        <ToggleButton value="structure">Structure</ToggleButton>
        <ToggleButton value="size">Pages</ToggleButton>
      </ToggleButtonGroup>
      <LineChart
        height={260}
        colors={chartColors}
        xAxis={[{ data: x, scaleType: 'point', valueFormatter: (i: number) => `Run ${i + 1}, ${dates[i]}` }]}
        series={GROUPS[group].map((key) => ({
          data: points.map((r) => r.counts[key]),
          label: HEADLINES.find((h) => h.key === key)?.label ?? key,
          showMark: points.length < 30,
        }))}
      />
    </Paper>
  );
}
