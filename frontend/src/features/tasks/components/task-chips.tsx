import { Chip, Stack, Tooltip } from '@mui/material';
import type { TaskItem } from '@linkloom/shared';
import { STATUS_LABELS } from './task-labels.js';

const STATUS_COLOUR = { open: 'default', 'in-progress': 'info', done: 'default', verified: 'success', 'wont-fix': 'default' } as const;

const byRun = (task: Pick<TaskItem, 'check'>) => (task.check?.runNumber ? ` by run ${task.check.runNumber}` : '');

/** The status in words: "Fixed and verified by run 7" is not the writer's "Done". */
export function statusLabel(task: Pick<TaskItem, 'status' | 'check'>): string {
  return task.status === 'verified' ? `${STATUS_LABELS.verified}${byRun(task)}` : STATUS_LABELS[task.status];
}

/** Status plus what the latest run said (reopened, still found, partly fixed) and whether it is overdue. */
export function TaskStatusChips({ task }: { task: Pick<TaskItem, 'status' | 'verification' | 'overdue' | 'check'> }) {
  const reopened = task.status === 'open' && task.check?.outcome === 'reopened';
  const partly = task.check?.outcome === 'partly-fixed' && task.status !== 'verified';
  return (
    <Stack direction="row" spacing={0.5} sx={{ flexWrap: 'wrap', rowGap: 0.5 }}>
      <Chip
        size="small"
        label={statusLabel(task)}
        color={STATUS_COLOUR[task.status]}
        variant={task.status === 'wont-fix' || task.status === 'done' ? 'outlined' : 'filled'}
      />
      {reopened && (
        <Tooltip title="It had been verified, and a later run found the problem again.">
          <Chip size="small" color="warning" label={`Reopened${byRun(task)}`} />
        </Tooltip>
      )}
      {task.verification === 'flagged' && (
        <Tooltip title="Marked done, but the latest run still finds some of it.">
          <Chip size="small" color="warning" label="Still found" />
        </Tooltip>
      )}
      {partly && <Chip size="small" color="info" variant="outlined" label="Partly fixed" />}
      {task.overdue && <Chip size="small" color="error" variant="outlined" label="Overdue" />}
    </Stack>
  );
}
