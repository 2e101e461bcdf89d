import { useState, type FormEvent } from 'react';
import type { TaskEventItem } from '@linkloom/shared';
import { Box, Button, List, ListItem, ListItemText, Stack, TextField, Typography } from '@mui/material';
import { errorMessage } from '../../../lib/api-client.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { useAddTaskComment } from '../api/add-task-comment.js';

const FIELD_NAMES: Record<string, string> = { assigneeId: 'assignee', dueDate: 'due date' };

/** Field changes in words; people are named in the task itself, so ids are not repeated here. */
const describeChange = (changes: TaskEventItem['changes']) =>
  Object.entries(changes)
    .filter(([, { from, to }]) => from !== to)
    .map(([field, { from, to }]) =>
      field === 'assigneeId' ? (to ? 'assignee set' : 'assignee cleared') : `${FIELD_NAMES[field] ?? field}: ${from ?? '—'} → ${to ?? '—'}`,
    )
    .join('; ');

/** Comments and history in one time line, oldest first; the comment box only for those who may comment. */
export function TaskThread({ taskId, events, canComment }: { taskId: string; events: TaskEventItem[]; canComment: boolean }) {
  const [body, setBody] = useState('');
  const add = useAddTaskComment();
  const { notify } = useNotifier();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!body.trim()) return;
    add.mutate({ taskId, body: body.trim() }, { onSuccess: () => setBody(''), onError: (e) => notify(errorMessage(e), 'error') });
  };
  return (
    <Box>
      <Typography variant="h3" sx={{ mb: 1 }}>
        Comments and history
      </Typography>
      <List dense aria-label="Comments and history">
        {events.map((e) => (
          <ListItem key={e.id} disableGutters alignItems="flex-start">
            <ListItemText
              primary={e.type === 'comment' ? e.body : [e.body, describeChange(e.changes)].filter(Boolean).join(' ')}
              secondary={`${e.actor.name} · ${new Date(e.at).toLocaleString()}${e.type === 'change' ? ' · change' : ''}`}
              slotProps={{ primary: { sx: { whiteSpace: 'pre-wrap', fontStyle: e.type === 'change' ? 'italic' : 'normal' } } }}
            />
          </ListItem>
        ))}
      </List>
      {canComment && (
        <Stack component="form" onSubmit={submit} spacing={1} aria-label="Add a comment">
          <TextField label="Comment" value={body} onChange={(e) => setBody(e.target.value)} multiline minRows={2} />
          <Box>
            <Button type="submit" variant="outlined" disabled={add.isPending || !body.trim()}>
              Add comment
            </Button>
          </Box>
        </Stack>
      )}
    </Box>
  );
}
