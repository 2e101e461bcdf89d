import { useState, type FormEvent } from 'react';
import { TASK_KINDS, TASK_PRIORITIES, type TaskGrouping, type TaskKind, type TaskPriority } from '@linkloom/shared';
import { useParams } from 'react-router';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  FormControlLabel,
  MenuItem,
  Radio,
  RadioGroup,
  Stack,
  TextField,
} from '@mui/material';
import { useNotifier } from '../../../components/ui/notifier.js';
import { errorMessage } from '../../../lib/api-client.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { useAssignees } from '../api/get-assignees.js';
import { useCreateTasks } from '../api/create-tasks.js';
import { SelectedFindings, selectionSize } from './selected-findings.js';
import { KIND_LABELS, type TaskRequest } from './task-labels.js';

export type { TaskRequest };

interface Props {
  /** Open while set: the selected pages or links, and the kind suggested by their finding. */
  request: TaskRequest | null;
  onClose: () => void;
  /** Defaults to the doc set in the address. */
  docSetId?: string;
}

const OWNER = '';

/** "Create tasks": tasks holding exactly the selected findings, one per row or one for them all. */
export function CreateTasksDialog({ request, onClose, docSetId }: Props) {
  const params = useParams();
  const canCreate = useRoleAtLeast('editor');
  if (!canCreate) return null;
  return (
    <Dialog open={request !== null} onClose={onClose} fullWidth maxWidth="sm">
      {/* A new selection starts a fresh form (kind, grouping and title reset with it). */}
      {request && (
        <CreateTasksForm key={JSON.stringify(request)} request={request} onClose={onClose} docSetId={docSetId ?? params.docSetId ?? ''} />
      )}
    </Dialog>
  );
}

function CreateTasksForm({ request, onClose, docSetId: targetDocSet }: { request: TaskRequest; onClose: () => void; docSetId: string }) {
  const assignees = useAssignees(true);
  const create = useCreateTasks();
  const { notify } = useNotifier();
  const [kind, setKind] = useState<TaskKind>(request.kind);
  const [grouping, setGrouping] = useState<TaskGrouping>('per-row');
  const [title, setTitle] = useState('');
  const [assigneeId, setAssigneeId] = useState(OWNER);
  const [priority, setPriority] = useState<TaskPriority>('normal');
  const [dueDate, setDueDate] = useState('');
  const [details, setDetails] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const rows = selectionSize(request);
  const taskCount = grouping === 'grouped' ? 1 : rows;
  const action = taskCount === 1 ? 'Create task' : `Create ${taskCount} tasks`;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const links = request.links ?? [];
    create.mutate(
      {
        docSetId: targetDocSet,
        kind,
        ...(links.length ? { links } : { pagePaths: request.pagePaths }),
        grouping,
        title: taskCount === 1 && title.trim() ? title.trim() : undefined,
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

  return (
    <form noValidate onSubmit={submit} aria-label="Create tasks">
      <DialogTitle>{rows === 1 ? 'Create fix task' : `Create tasks for ${rows} selected findings`}</DialogTitle>
      <DialogContent>
        <Stack spacing={2} sx={{ mt: 1 }}>
          {problem && <Alert severity="error">{problem}</Alert>}
          {<SelectedFindings request={request} />}
          {rows > 1 && (
            <RadioGroup value={grouping} onChange={(e) => setGrouping(e.target.value as TaskGrouping)} aria-label="How many tasks">
              <FormControlLabel value="per-row" control={<Radio />} label={`One task per selected row (${rows} tasks)`} />
              <FormControlLabel value="grouped" control={<Radio />} label="One task listing all of them" />
            </RadioGroup>
          )}
          <TextField select label="Kind" value={kind} onChange={(e) => setKind(e.target.value as TaskKind)}>
            {TASK_KINDS.map((k) => (
              <MenuItem key={k} value={k}>
                {KIND_LABELS[k]}
              </MenuItem>
            ))}
          </TextField>
          {taskCount === 1 && (
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
          {action}
        </Button>
      </DialogActions>
    </form>
  );
}
