import { Box, Link, List, ListItem, ListItemText, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import type { NeighbourNode, Neighbourhood } from '@linkloom/shared';
import { normaliseFlag, FLAG_STYLES } from './finding-colours.js';
import { formatScore, pageDetailHref } from './format.js';
import { groupNeighbours } from './neighbourhood-model.js';

interface NeighbourhoodListProps {
  docSetId: string;
  runId: string;
  centrePath: string;
  neighbourhood: Neighbourhood;
}

function flagWords(node: NeighbourNode): string {
  return node.flags
    .map((f) => {
      const k = normaliseFlag(f);
      return k ? FLAG_STYLES[k].label : f;
    })
    .join(', ');
}

function Group({ title, nodes, docSetId, runId }: { title: string; nodes: NeighbourNode[]; docSetId: string; runId: string }) {
  const id = `neighbours-${title.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <Box component="section" aria-labelledby={id}>
      <Typography id={id} variant="subtitle2" component="h3">
        {title} ({nodes.length})
      </Typography>
      {nodes.length === 0 ? (
        <Typography variant="body2" color="text.secondary">
          None.
        </Typography>
      ) : (
        <List dense disablePadding aria-labelledby={id}>
          {nodes.map((n) => (
            <ListItem key={n.path} disableGutters>
              <ListItemText
                primary={
                  <Link component={RouterLink} to={pageDetailHref(docSetId, n.path, runId)}>
                    {n.title || n.path}
                  </Link>
                }
                secondary={`${n.path} · score ${formatScore(n.stationaryScore)}${n.flags.length ? ` · ${flagWords(n)}` : ''}`}
              />
            </ListItem>
          ))}
        </List>
      )}
    </Box>
  );
}

/** The neighbourhood picture as lists: the same pages and directions, readable by keyboard and screen reader. */
export function NeighbourhoodList({ docSetId, runId, centrePath, neighbourhood }: NeighbourhoodListProps) {
  const groups = groupNeighbours(neighbourhood, centrePath);
  return (
    <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', md: 'repeat(3, 1fr)' } }}>
      <Group title="Pages linking here" nodes={groups.linksHere} docSetId={docSetId} runId={runId} />
      <Group title="Pages this page links to" nodes={groups.linkedFromHere} docSetId={docSetId} runId={runId} />
      <Group title="Two steps away" nodes={groups.twoSteps} docSetId={docSetId} runId={runId} />
    </Box>
  );
}
