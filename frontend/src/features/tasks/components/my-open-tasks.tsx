import { Link as RouterLink } from 'react-router';
import { Link, List, ListItem, ListItemText, Paper, Stack, Typography } from '@mui/material';
import { useTasks } from '../api/get-tasks.js';
import type { TaskItem } from '@linkloom/shared';
import { TaskStatusChips } from './task-chips.js';

const SHOWN = 10;

/** Reopened work first (a run found the problem again), then by due date as the server sorts it. */
export function openTasksFirst(tasks: TaskItem[]): TaskItem[] {
  const reopened = (t: TaskItem) => (t.check?.outcome === 'reopened' ? 0 : 1);
  return [...tasks].sort((a, b) => reopened(a) - reopened(b));
}

/** The home screen's first panel for people who do the fixing: their open tasks. */
export function MyOpenTasks({ hideWhenEmpty = false }: { hideWhenEmpty?: boolean }) {
  const tasks = useTasks({ assignee: 'me', status: ['open', 'in-progress'], page: 1, pageSize: 50, sort: 'dueDate' });
  const items = openTasksFirst(tasks.data?.items ?? []);
  if (hideWhenEmpty && tasks.isSuccess && items.length === 0) return null;
  const total = tasks.data?.total ?? 0;
  return (
    <Paper variant="outlined" component="section" aria-label="Your open tasks" sx={{ p: 2, mb: 3 }}>
      <Stack direction="row" sx={{ alignItems: 'baseline', justifyContent: 'space-between', mb: 1 }}>
        <Typography variant="h3" component="h2">
          Your open tasks{total ? ` (${total})` : ''}
        </Typography>
        <Link component={RouterLink} to="/tasks">
          All your tasks
        </Link>
      </Stack>
      {tasks.isLoading && <Typography variant="body2">Loading…</Typography>}
      {tasks.isSuccess && items.length === 0 && (
        <Typography variant="body2" color="text.secondary">
          Nothing open. Tasks an editor gives you appear here, and so does any task a later run reopens.
        </Typography>
      )}
      <List dense>
        {items.slice(0, SHOWN).map((t) => (
          <ListItem key={t.id} disableGutters secondaryAction={<TaskStatusChips task={t} />}>
            <ListItemText
              primary={
                <Link component={RouterLink} to={`/tasks?task=${encodeURIComponent(t.id)}`}>
                  {t.title}
                </Link>
              }
              secondary={`${t.docSetName ?? ''} · ${t.pagePath}${t.dueDate ? ` · due ${t.dueDate}` : ''}`}
              slotProps={{ secondary: { sx: { pr: 24 } } }}
            />
          </ListItem>
        ))}
      </List>
    </Paper>
  );
}
