import { Link as RouterLink } from 'react-router';
import { Link, List, ListItem, ListItemText, Paper, Typography } from '@mui/material';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { useTopPages } from '../api/get-top-pages.js';

export function TopPagesPanel({ docSetId, runId }: { docSetId: string; runId: string | null }) {
  const pages = useTopPages(docSetId, runId, 10);
  if (!runId) return null;
  const base = `/doc-sets/${encodeURIComponent(docSetId)}`;
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Typography variant="h3" component="h2">
        Most important pages
      </Typography>
      <Typography variant="body2" color="text.secondary">
        Highest stationary score: where readers following links end up most.
      </Typography>
      {pages.isLoading && <LoadingSkeleton count={6} />}
      {pages.isError && <ErrorPanel error={pages.error} onRetry={() => pages.refetch()} />}
      <List dense>
        {pages.data?.items.map((page) => (
          <ListItem key={page.path} disableGutters>
            <ListItemText
              primary={
                <Link component={RouterLink} to={`${base}/page?path=${encodeURIComponent(page.path)}`}>
                  {page.title || page.path}
                </Link>
              }
              secondary={`#${page.rank} · ${page.timesAverage.toFixed(1)}× the average page · ${page.inboundCount} links in`}
            />
          </ListItem>
        ))}
      </List>
      <Link component={RouterLink} to={`${base}/pages?sort=-stationaryScore`}>
        All pages by score
      </Link>
    </Paper>
  );
}
