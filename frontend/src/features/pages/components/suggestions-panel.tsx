import { Link, List, ListItem, ListItemText, Paper, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import type { PageDetail } from '@linkloom/shared';
import { formatScore, pageDetailHref } from './format.js';

type Props = Pick<PageDetail, 'unlinkedMentions' | 'suggestedSources' | 'stationaryScore'> & { docSetId: string; runId: string };

function gainWords(gain: number, current: number): string {
  const share = current > 0 ? ` (${Math.round((gain / current) * 100)}% more)` : '';
  return `+${formatScore(gain)}${share}`;
}

/** Where new links to this page would help: pages that name it without linking, and the best sources by score gain. */
export function SuggestionsPanel({ unlinkedMentions, suggestedSources, stationaryScore, docSetId, runId }: Props) {
  const open = (path: string) => pageDetailHref(docSetId, path, runId);
  return (
    <Paper variant="outlined" sx={{ p: 2 }} component="section" aria-labelledby="suggestions-title">
      <Typography id="suggestions-title" variant="h3" component="h2" gutterBottom>
        Where to add links to this page
      </Typography>
      <Typography variant="subtitle2" component="h3">
        Suggested source pages
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
        The score gain is how much this page's stationary score would rise if that page added one link to it, recomputed over the whole link
        graph with the link in place.
      </Typography>
      {suggestedSources.length === 0 ? (
        <Typography variant="body2" color="text.secondary">
          No suggestion for this run.
        </Typography>
      ) : (
        <List dense disablePadding>
          {[...suggestedSources]
            .sort((a, b) => b.scoreGain - a.scoreGain)
            .map((s) => (
              <ListItem key={s.path} disableGutters>
                <ListItemText
                  primary={
                    <>
                      <Link component={RouterLink} to={open(s.path)}>
                        {s.title || s.path}
                      </Link>{' '}
                      · gain {gainWords(s.scoreGain, stationaryScore)}
                    </>
                  }
                  secondary={s.reason ? `${s.path} · ${s.reason}` : s.path}
                />
              </ListItem>
            ))}
        </List>
      )}
      <Typography variant="subtitle2" component="h3" sx={{ mt: 2 }}>
        Unlinked mentions
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 1 }}>
        Pages whose text names this page's title but do not link to it.
      </Typography>
      {unlinkedMentions.length === 0 ? (
        <Typography variant="body2" color="text.secondary">
          None found.
        </Typography>
      ) : (
        <List dense disablePadding>
          {unlinkedMentions.map((m) => (
            <ListItem key={m.path} disableGutters>
              <ListItemText
                primary={
                  <Link component={RouterLink} to={open(m.path)}>
                    {m.title || m.path}
                  </Link>
                }
                secondary={m.path}
              />
            </ListItem>
          ))}
        </List>
      )}
    </Paper>
  );
}
