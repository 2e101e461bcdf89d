import { useEffect, useState, type FormEvent } from 'react';
import { TASK_KINDS, TASK_PRIORITIES, type TaskKind, type TaskPriority } from '@linkloom/shared';
import { KIND_LABELS } from './task-labels.js';
import { useParams } from 'react-router';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle, MenuItem, Stack, TextField, Typography } from '@mui/material';
import { useNotifier } from '../../../components/ui/notifier.js';
import { errorMessage } from '../../../lib/api-client.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { useAssignees } from '../api/get-assignees.js';
import { useCreateTasks } from '../api/create-tasks.js';

export interface TaskRequest {
  pagePaths: string[];
  kind: TaskKind;
}

interface Props {
  /** Open while set: the pages (one or many) and the kind suggested by their finding. */
  request: TaskRequest | null;
  onClose: () => void;
  /** Defaults to the doc set in the address. */
  docSetId?: string;
}

const OWNER = '';

/** "Create task(s)": one task per page; the server fills in the details from the latest run's findings. */
export function CreateTasksDialog({ request, onClose, docSetId }: Props) {
  const params = useParams();
  const targetDocSet = docSetId ?? params.docSetId ?? '';
  const canCreate = useRoleAtLeast('editor');
  const assignees = useAssignees(canCreate && request !== null);
  const create = useCreateTasks();
  const { notify } = useNotifier();
  const [kind, setKind] = useState<TaskKind>('other');
  const [title, setTitle] = useState('');
  const [assigneeId, setAssigneeId] = useState(OWNER);
  const [priority, setPriority] = useState<TaskPriority>('normal');
  const [dueDate, setDueDate] = useState('');
  const [details, setDetails] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const count = request?.pagePaths.length ?? 0;

  useEffect(() => {
    if (request) {
      setKind(request.kind);
      setTitle('');
      setProblem(null);
    }
  }, [request]);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!request) return;
    create.mutate(
      {
        docSetId: targetDocSet,
        kind,
        pagePaths: request.pagePaths,
        title: count === 1 && title.trim() ? title.trim() : undefined,
        details: details.trim() || undefined,
        assigneeId: assigneeId || undefined,
        priority,
        dueDate: dueDate || undefined,
      },
      {
        onSuccess: ({ items }) => {
          const unassigned = items.filter((t) => !t.assignee).length;
          notify(`${items.length} task${items.length === 1 ? '' : 's'} created${unassigned ? `; ${unassigned} without an assignee` : ''}`);
          onClose();
        },
        onError: (error) => setProblem(errorMessage(error)),
      },
    );
  };

  if (!canCreate) return null;
  return (
    <Dialog open={request !== null} onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={submit} aria-label="Create tasks">
        <DialogTitle>{count === 1 ? 'Create fix task' : `Create ${count} tasks`}</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ mt: 1 }}>
            {problem && <Alert severity="error">{problem}</Alert>}
            <Typography variant="body2" color="text.secondary" sx={{ wordBreak: 'break-all' }}>
              {count === 1 ? request?.pagePaths[0] : `One task for each of ${count} pages.`} The details list what the latest run found.
            </Typography>
            <TextField select label="Kind" value={kind} onChange={(e) => setKind(e.target.value as TaskKind)}>
              {TASK_KINDS.map((k) => (
                <MenuItem key={k} value={k}>
                  {KIND_LABELS[k]}
                </MenuItem>
              ))}
            </TextField>
            {count === 1 && (
              <TextField
                label="Title"
                value={title}
                onChange={(e) => setTitle(e.target.value)}
                helperText="Leave empty for a title made from the finding."
              />
            )}
            <TextField
              select
              label="Assignee"
              value={assigneeId}
              onChange={(e) => setAssigneeId(e.target.value)}
              helperText="By default, the page owner named in its front matter (when that person has an account)."
            >
              <MenuItem value={OWNER}>Page owner</MenuItem>
              {(assignees.data?.items ?? []).map((a) => (
                <MenuItem key={a.id} value={a.id}>
                  {a.name} ({a.role})
                </MenuItem>
              ))}
            </TextField>
            <Stack direction="row" spacing={2}>
              <TextField
                select
                label="Priority"
                value={priority}
                onChange={(e) => setPriority(e.target.value as TaskPriority)}
                sx={{ flex: 1 }}
              >
                {TASK_PRIORITIES.map((p) => (
                  <MenuItem key={p} value={p}>
                    {p}
                  </MenuItem>
                ))}
              </TextField>
              <TextField
                label="Due date"
                type="date"
                value={dueDate}
                onChange={(e) => setDueDate(e.target.value)}
                sx={{ flex: 1 }}
                slotProps={{ inputLabel: { shrink: true } }}
              />
            </Stack>
            <TextField label="Note for the assignee" value={details} onChange={(e) => setDetails(e.target.value)} multiline minRows={2} />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={create.isPending || !targetDocSet}>
            {count === 1 ? 'Create task' : `Create ${count} tasks`}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
