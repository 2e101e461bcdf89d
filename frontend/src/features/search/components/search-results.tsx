import { Box, Link, List, ListItem, Stack, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { formatScore, pageDetailHref } from '../../pages/components/format.js';
import type { SearchHit } from '@linkloom/shared';
import { HighlightedText } from './highlighted-text.js';

const figure = (v: number) => (Number.isFinite(v) ? (Math.abs(v) >= 0.01 || v === 0 ? v.toFixed(3) : v.toExponential(2)) : '—');

function Figures({ hit }: { hit: SearchHit }) {
  return (
    <Stack direction="row" spacing={2} sx={{ flexWrap: 'wrap' }} component="dl" aria-label="Scores">
      {(
        [
          ['Text match', figure(hit.textRank)],
          ['Stationary score', formatScore(hit.stationaryScore)],
          ['Combined', figure(hit.score)],
        ] as const
      ).map(([k, v]) => (
        <Box key={k} sx={{ display: 'flex', gap: 0.5 }}>
          <Typography component="dt" variant="caption" color="text.secondary">
            {k}
          </Typography>
          <Typography component="dd" variant="caption" sx={{ m: 0, fontWeight: 500 }}>
            {v}
          </Typography>
        </Box>
      ))}
    </Stack>
  );
}

/** Ranked hits: title (plain text, as React renders it), path, marked snippet, the three figures and the why line. */
export function SearchResults({ hits, docSetId, runId }: { hits: SearchHit[]; docSetId: string; runId: string }) {
  return (
    <List disablePadding aria-label="Search results">
      {hits.map((hit, i) => (
        <ListItem key={hit.path} disableGutters divider sx={{ display: 'block', py: 1.5 }}>
          <Typography variant="h3" component="h2" sx={{ fontSize: '1.05rem' }}>
            <Typography component="span" color="text.secondary" sx={{ mr: 1 }}>
              {i + 1}.
            </Typography>
            <Link component={RouterLink} to={pageDetailHref(docSetId, hit.path, runId)}>
              {hit.title || hit.path}
            </Link>
          </Typography>
          <Typography variant="caption" color="text.secondary" component="div" sx={{ wordBreak: 'break-all' }}>
            {hit.path}
          </Typography>
          <Typography variant="body2" sx={{ my: 0.5 }}>
            <HighlightedText text={hit.snippet ?? ''} />
          </Typography>
          <Figures hit={hit} />
          {hit.why && (
            <Typography variant="caption" color="text.secondary" component="p">
              Why here: {hit.why}
            </Typography>
          )}
        </ListItem>
      ))}
    </List>
  );
}
