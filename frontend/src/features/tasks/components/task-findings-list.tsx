import { Chip, List, ListItem, ListItemText, Typography } from '@mui/material';
import type { TaskCheckItem, TaskItem } from '@linkloom/shared';

/** The task's findings as the latest run saw them; before any run, as they were when the task was made. */
export function findingItems(task: Pick<TaskItem, 'pagePath' | 'finding' | 'check'>): (TaskCheckItem & { checked: boolean })[] {
  if (task.check) return task.check.items.map((i) => ({ ...i, checked: true }));
  const links = task.finding.brokenLinks ?? [];
  if (links.length)
    return links.map((l) => ({
      pagePath: l.sourcePath ?? task.pagePath,
      href: l.href,
      line: l.line,
      stillFound: true,
      status: l.status,
      checked: false,
    }));
  const pages = task.finding.pages?.map((p) => p.path) ?? [task.pagePath];
  return pages.map((pagePath) => ({ pagePath, href: null, line: null, stillFound: true, status: null, checked: false }));
}

/** One row per link or page of the task, saying which are still found. */
export function TaskFindingsList({ task }: { task: Pick<TaskItem, 'kind' | 'pagePath' | 'finding' | 'check'> }) {
  const items = findingItems(task);
  const run = task.check?.runNumber ? `run ${task.check.runNumber}` : 'the latest run';
  // Runs judge links and page findings; a review or free-form task is judged by people.
  const judged = task.kind !== 'other' && task.kind !== 'review-pruning';
  const state = task.check ? `As ${run} sees them.` : judged ? 'Not checked by a run yet.' : 'Runs do not check tasks of this kind.';
  return (
    <section aria-label="Findings of this task">
      <Typography variant="h3" sx={{ mb: 0.5 }}>
        {items.length === 1 ? 'Finding' : `Findings (${items.length})`}
      </Typography>
      <Typography variant="body2" color="text.secondary">
        {state}
      </Typography>
      <List dense>
        {items.map((i) => (
          <ListItem
            key={`${i.pagePath}\n${i.href ?? ''}`}
            disableGutters
            secondaryAction={
              i.checked ? (
                <Chip
                  size="small"
                  label={i.stillFound ? 'still found' : 'gone'}
                  color={i.stillFound ? 'warning' : 'success'}
                  variant="outlined"
                />
              ) : undefined
            }
          >
            <ListItemText
              primary={i.href ?? i.pagePath}
              secondary={i.href ? `${i.pagePath}, line ${i.line}${i.status ? ` · ${i.status}` : ''}` : undefined}
              slotProps={{ primary: { sx: { wordBreak: 'break-all', pr: 10 } } }}
            />
          </ListItem>
        ))}
      </List>
    </section>
  );
}
