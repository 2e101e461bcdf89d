import { Accordion, AccordionDetails, AccordionSummary, Link, List, ListItem, ListItemText, Typography } from '@mui/material';
import ExpandMoreOutlined from '@mui/icons-material/ExpandMoreOutlined';
import { Link as RouterLink } from 'react-router';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { pageDetailHref } from '../../pages/components/format.js';
import { useIslands } from '../api/get-islands.js';

const pages = (n: number) => `${n} page${n === 1 ? '' : 's'}`;

/** Each island with its pages, largest first; one link from the main tree to any of them joins it up. */
export function IslandsList({ docSetId, runId }: { docSetId: string; runId: string }) {
  const islands = useIslands(docSetId, runId);
  if (islands.isLoading) return <LoadingSkeleton />;
  if (islands.error) return <ErrorPanel error={islands.error} onRetry={() => islands.refetch()} />;
  const items = [...(islands.data ?? [])].sort((a, b) => b.pageCount - a.pageCount);
  if (items.length === 0)
    return <EmptyState title="No islands" hint="Every page is connected to the entry pages' part of the link graph." />;
  return (
    <div>
      {items.map((island, i) => (
        <Accordion key={island.islandId} disableGutters defaultExpanded={i === 0}>
          <AccordionSummary expandIcon={<ExpandMoreOutlined />}>
            <Typography>
              Island {i + 1}: {pages(island.pageCount)}
            </Typography>
          </AccordionSummary>
          <AccordionDetails>
            <List dense disablePadding>
              {island.pages.map((p) => (
                <ListItem key={p.path} disableGutters>
                  <ListItemText
                    primary={
                      <Link component={RouterLink} to={pageDetailHref(docSetId, p.path, runId)}>
                        {p.title || p.path}
                      </Link>
                    }
                    secondary={p.path}
                  />
                </ListItem>
              ))}
            </List>
            {island.pages.length < island.pageCount && (
              <Typography variant="caption" color="text.secondary">
                Showing {island.pages.length} of {pages(island.pageCount)}.
              </Typography>
            )}
          </AccordionDetails>
        </Accordion>
      ))}
    </div>
  );
}
