import { Link as RouterLink } from 'react-router';
import { Chip, List, ListItemButton, ListItemText, Paper, Skeleton } from '@mui/material';
import type { RunCounts } from '@linkloom/shared';
import { FINDINGS_VIEWS, viewCount, type FindingsViewId } from './findings-views.js';

const nf = new Intl.NumberFormat();

interface FindingsNavProps {
  docSetId: string;
  current: FindingsViewId;
  counts: RunCounts | null | undefined;
  loading: boolean;
  /** Kept when switching views, so a chosen run stays chosen. */
  search: string;
}

/** The side list of views, each with its count from the run. */
export function FindingsNav({ docSetId, current, counts, loading, search }: FindingsNavProps) {
  return (
    <Paper variant="outlined" component="nav" aria-label="Finding views">
      <List disablePadding>
        {FINDINGS_VIEWS.map((view) => {
          const total = counts ? viewCount(view, counts) : null;
          const detail =
            counts && view.kinds.length > 1
              ? view.kinds.map((k) => `${nf.format(k.count(counts))} ${k.label.toLowerCase()}`).join(' · ')
              : undefined;
          return (
            <ListItemButton
              key={view.id}
              component={RouterLink}
              selected={view.id === current}
              aria-current={view.id === current ? 'page' : undefined}
              to={`/doc-sets/${encodeURIComponent(docSetId)}/findings/${view.id}${search}`}
            >
              <ListItemText primary={view.label} secondary={detail} />
              {loading ? (
                <Skeleton width={28} />
              ) : (
                total !== null && (
                  <Chip
                    size="small"
                    label={nf.format(total)}
                    color={total > 0 ? 'secondary' : 'default'}
                    aria-label={`${nf.format(total)} found`}
                  />
                )
              )}
            </ListItemButton>
          );
        })}
      </List>
    </Paper>
  );
}
