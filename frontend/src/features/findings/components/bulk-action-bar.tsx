import { useState } from 'react';
import { Button, Paper, Typography } from '@mui/material';
import AssignmentOutlined from '@mui/icons-material/AssignmentOutlined';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { CreateTasksDialog } from '../../tasks/components/create-tasks-dialog.js';
import { PendingActionDialog, type FixTaskRequest, type PendingAction } from '../../pages/components/work-hook-dialog.js';

interface BulkActionBarProps {
  count: number;
  /** The task each selected page would get; null where tasks make no sense (links without a page). */
  taskRequest: FixTaskRequest | null;
  onExport: () => void;
  onClear: () => void;
  /** HOOK POINT: the tasks change passes this; until then "Create tasks" explains what it will do. */
  onCreateTasks?: (request: FixTaskRequest) => void;
}

/** Actions on the selected rows; shown only while something is selected. */
export function BulkActionBar({ count, taskRequest, onExport, onClear, onCreateTasks }: BulkActionBarProps) {
  const canCreateTasks = useRoleAtLeast('editor');
  const [pending, setPending] = useState<PendingAction | null>(null);
  const [taskDialog, setTaskDialog] = useState<FixTaskRequest | null>(null);
  if (count === 0) return null;
  return (
    <Paper
      variant="outlined"
      role="region"
      aria-label="Actions on selected rows"
      sx={{ display: 'flex', gap: 1, alignItems: 'center', p: 1, mb: 1.5, bgcolor: 'action.hover', flexWrap: 'wrap' }}
    >
      <Typography variant="body2" sx={{ flex: 1, minWidth: 120 }}>
        {count} selected
      </Typography>
      {canCreateTasks && taskRequest && (
        <Button
          size="small"
          variant="contained"
          startIcon={<AssignmentOutlined />}
          onClick={() => (onCreateTasks ? onCreateTasks(taskRequest) : setTaskDialog(taskRequest))}
        >
          Create tasks
        </Button>
      )}
      <Button size="small" variant="outlined" startIcon={<FileDownloadOutlined />} onClick={onExport}>
        Export selected
      </Button>
      <Button size="small" onClick={onClear}>
        Clear selection
      </Button>
      <PendingActionDialog action={pending} onClose={() => setPending(null)} />
      <CreateTasksDialog request={taskDialog} onClose={() => setTaskDialog(null)} />
    </Paper>
  );
}
