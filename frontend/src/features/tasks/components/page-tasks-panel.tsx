import { Link as RouterLink } from 'react-router';
import { KIND_LABELS } from './task-labels.js';
import { Link, List, ListItem, ListItemText, Paper, Typography } from '@mui/material';
import { useTasks } from '../api/get-tasks.js';
import { TaskStatusChips } from './task-chips.js';

/** Tasks about one page (every status), shown on the page detail; writers see only theirs. */
export function PageTasksPanel({ docSetId, pagePath }: { docSetId: string; pagePath: string }) {
  const tasks = useTasks({ docSetId, pagePath, page: 1, pageSize: 20, sort: '-createdAt' }, !!pagePath);
  const items = tasks.data?.items ?? [];
  return (
    <Paper variant="outlined" sx={{ p: 2 }} aria-label="Tasks on this page" component="section">
      <Typography variant="h3" sx={{ mb: 1 }}>
        Tasks on this page
      </Typography>
      {items.length === 0 ? (
        <Typography variant="body2" color="text.secondary">
          {tasks.isLoading ? 'Loading…' : 'No tasks for this page yet.'}
        </Typography>
      ) : (
        <List dense>
          {items.map((t) => (
            <ListItem key={t.id} disableGutters secondaryAction={<TaskStatusChips task={t} />}>
              <ListItemText
                primary={
                  <Link component={RouterLink} to={`/tasks?view=all&task=${encodeURIComponent(t.id)}`}>
                    {t.title}
                  </Link>
                }
                secondary={`${KIND_LABELS[t.kind]} · ${t.assignee?.name ?? 'unassigned'}${t.dueDate ? ` · due ${t.dueDate}` : ''}`}
              />
            </ListItem>
          ))}
        </List>
      )}
    </Paper>
  );
}
