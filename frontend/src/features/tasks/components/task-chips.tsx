import { Chip, Stack, Tooltip } from '@mui/material';
import type { TaskItem } from '@linkloom/shared';
import { STATUS_LABELS } from './task-labels.js';

const STATUS_COLOUR = { open: 'default', 'in-progress': 'info', done: 'success', 'wont-fix': 'default' } as const;

/** Status plus what the latest run said about it (verified / flagged) and whether it is overdue. */
export function TaskStatusChips({ task }: { task: Pick<TaskItem, 'status' | 'verification' | 'overdue'> }) {
  return (
    <Stack direction="row" spacing={0.5}>
      <Chip
        size="small"
        label={STATUS_LABELS[task.status]}
        color={STATUS_COLOUR[task.status]}
        variant={task.status === 'wont-fix' ? 'outlined' : 'filled'}
      />
      {task.verification === 'verified' && (
        <Tooltip title="The latest run no longer shows this finding.">
          <Chip size="small" color="success" variant="outlined" label="Verified" />
        </Tooltip>
      )}
      {task.verification === 'flagged' && (
        <Tooltip title="Marked done, but the latest run still shows the finding.">
          <Chip size="small" color="warning" label="Still found" />
        </Tooltip>
      )}
      {task.overdue && <Chip size="small" color="error" variant="outlined" label="Overdue" />}
    </Stack>
  );
}
