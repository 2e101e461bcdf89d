import { Link as RouterLink } from 'react-router';
import { TASK_STATUSES_SET_BY_PEOPLE } from '@linkloom/shared';
import { KIND_LABELS, STATUS_LABELS } from './task-labels.js';
import { Box, Divider, Drawer, IconButton, Link, MenuItem, Stack, TextField, Typography } from '@mui/material';
import CloseOutlined from '@mui/icons-material/CloseOutlined';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { errorMessage } from '../../../lib/api-client.js';
import { useSession } from '../../../lib/session.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { useAssignees } from '../api/get-assignees.js';
import { useTask } from '../api/get-task.js';
import { useUpdateTask, type UpdateTaskInput } from '../api/update-task.js';
import { statusLabel, TaskStatusChips } from './task-chips.js';
import { TaskFindingsList } from './task-findings-list.js';
import { TaskThread } from './task-thread.js';

/** One task with its details, status, assignee, comments and history. */
export function TaskDetailDrawer({ taskId, onClose }: { taskId: string | null; onClose: () => void }) {
  const task = useTask(taskId);
  const me = useSession()?.user.id;
  const isEditor = useRoleAtLeast('editor');
  const isWriter = useRoleAtLeast('writer');
  const assignees = useAssignees(isEditor && !!taskId);
  const update = useUpdateTask();
  const { notify } = useNotifier();
  const data = task.data;
  const own = !!data && data.assignee?.id === me;
  const canWork = isEditor || (isWriter && own);
  const patch = (change: Omit<UpdateTaskInput, 'id'>) =>
    update.mutate(
      { id: data!.id, ...change },
      {
        onSuccess: () => {
          notify('Task updated');
          void task.refetch();
        },
        onError: (e) => notify(errorMessage(e), 'error'),
      },
    );

  return (
    <Drawer anchor="right" open={taskId !== null} onClose={onClose} slotProps={{ paper: { sx: { width: { xs: '100%', md: 560 }, p: 3 } } }}>
      <Box sx={{ display: 'flex', alignItems: 'flex-start', gap: 1, mb: 2 }}>
        <Typography variant="h2" sx={{ flex: 1, wordBreak: 'break-word' }}>
          {data?.title ?? 'Task'}
        </Typography>
        <IconButton aria-label="Close task" onClick={onClose}>
          <CloseOutlined />
        </IconButton>
      </Box>
      {task.isLoading && <LoadingSkeleton variant="cards" count={3} />}
      {task.error && <ErrorPanel error={task.error} onRetry={() => task.refetch()} />}
      {data && (
        <Stack spacing={2}>
          <TaskStatusChips task={data} />
          <Typography variant="body2">
            {KIND_LABELS[data.kind]} · {data.docSetName} ·{' '}
            <Link
              component={RouterLink}
              to={`/doc-sets/${encodeURIComponent(data.docSetId)}/page?path=${encodeURIComponent(data.pagePath)}`}
            >
              {data.pagePath}
            </Link>
          </Typography>
          <Typography variant="body2" color="text.secondary">
            Priority {data.priority}
            {data.dueDate ? ` · due ${data.dueDate}` : ''} · assigned to {data.assignee?.name ?? 'nobody yet'}
          </Typography>
          {data.details && (
            <Typography
              component="pre"
              variant="body2"
              sx={{ whiteSpace: 'pre-wrap', fontFamily: 'inherit', m: 0, p: 1.5, bgcolor: 'action.hover', borderRadius: 1 }}
            >
              {data.details}
            </Typography>
          )}
          <TaskFindingsList task={data} />
          {canWork && (
            <Stack direction={{ xs: 'column', sm: 'row' }} spacing={2}>
              <TextField
                select
                label="Status"
                value={data.status}
                onChange={(e) => patch({ status: e.target.value as (typeof TASK_STATUSES_SET_BY_PEOPLE)[number] })}
                sx={{ flex: 1 }}
              >
                {/* "Fixed and verified" is a run's verdict: shown when it is the status, never offered. */}
                {data.status === 'verified' && (
                  <MenuItem value="verified" disabled>
                    {statusLabel(data)}
                  </MenuItem>
                )}
                {TASK_STATUSES_SET_BY_PEOPLE.map((s) => (
                  <MenuItem key={s} value={s}>
                    {STATUS_LABELS[s]}
                  </MenuItem>
                ))}
              </TextField>
              {isEditor && (
                <TextField
                  select
                  label="Assignee"
                  value={data.assignee?.id ?? ''}
                  onChange={(e) => patch({ assigneeId: e.target.value || null })}
                  sx={{ flex: 1 }}
                >
                  <MenuItem value="">Nobody</MenuItem>
                  {(assignees.data?.items ?? []).map((a) => (
                    <MenuItem key={a.id} value={a.id}>
                      {a.name}
                    </MenuItem>
                  ))}
                </TextField>
              )}
            </Stack>
          )}
          <Divider />
          <TaskThread taskId={data.id} events={data.events} canComment={canWork} />
        </Stack>
      )}
    </Drawer>
  );
}
