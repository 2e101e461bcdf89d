import { useMemo, useState } from 'react';
import { useNavigate } from 'react-router';
import { Paper, Stack, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import type { LayoutOptions } from 'cytoscape';
import { GraphCanvas } from '../../link-map/components/graph-canvas.js';
import type { Neighbourhood } from '@linkloom/shared';
import { FindingLegend } from './finding-legend.js';
import { NeighbourhoodList } from './neighbourhood-list.js';
import { neighbourhoodElements } from './neighbourhood-model.js';
import { pageDetailHref } from './format.js';

// Rings by link distance: the page in the centre, one step on the inner ring, two steps outside.
const LAYOUT = {
  name: 'concentric',
  concentric: (node: { data: (k: string) => number }) => 3 - node.data('distance'),
  levelWidth: () => 1,
  minNodeSpacing: 16,
  animate: false,
  padding: 24,
} as unknown as LayoutOptions;

interface NeighbourhoodPanelProps {
  docSetId: string;
  runId: string;
  centrePath: string;
  neighbourhood: Neighbourhood | null | undefined;
}

export function NeighbourhoodPanel({ docSetId, runId, centrePath, neighbourhood }: NeighbourhoodPanelProps) {
  const navigate = useNavigate();
  const [view, setView] = useState<'picture' | 'list'>('picture');
  const elements = useMemo(() => (neighbourhood ? neighbourhoodElements(neighbourhood, centrePath) : []), [neighbourhood, centrePath]);
  const empty = !neighbourhood || neighbourhood.nodes.length <= 1;
  return (
    <Paper variant="outlined" sx={{ p: 2 }} component="section" aria-labelledby="neighbourhood-title">
      <Stack direction="row" sx={{ alignItems: 'center', mb: 1.5, gap: 2, flexWrap: 'wrap' }}>
        <Typography id="neighbourhood-title" variant="h3" component="h2" sx={{ flex: 1 }}>
          Neighbourhood
        </Typography>
        <ToggleButtonGroup size="small" exclusive value={view} onChange={(_, v) => v && setView(v)} aria-label="Show the neighbourhood as">
          <ToggleButton value="picture">Picture</ToggleButton>
          <ToggleButton value="list">List</ToggleButton>
        </ToggleButtonGroup>
      </Stack>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 1.5 }}>
        Pages up to two links away from this one, in either direction. Click a circle to open that page.
      </Typography>
      {empty ? (
        <Typography variant="body2">
          No page links here and this page links nowhere: it stands alone. Add a link from a related page to connect it.
        </Typography>
      ) : view === 'picture' ? (
        <Stack spacing={1}>
          <GraphCanvas
            elements={elements}
            layout={LAYOUT}
            height={440}
            label={`Link picture of ${neighbourhood.nodes.length} pages around ${centrePath}; the List view holds the same pages`}
            onNodeOpen={(path) => path !== centrePath && navigate(pageDetailHref(docSetId, path, runId))}
          />
          <FindingLegend withFocus />
        </Stack>
      ) : (
        <NeighbourhoodList docSetId={docSetId} runId={runId} centrePath={centrePath} neighbourhood={neighbourhood} />
      )}
    </Paper>
  );
}
