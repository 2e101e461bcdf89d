import { useState } from 'react';
import { Button, Paper, Typography } from '@mui/material';
import AssignmentOutlined from '@mui/icons-material/AssignmentOutlined';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { CreateTasksDialog, type TaskRequest } from '../../tasks/index.js';

interface BulkActionBarProps {
  count: number;
  /** The selected findings as a task request; null where these rows cannot become tasks. */
  taskRequest: TaskRequest | null;
  onExport: () => void;
  onClear: () => void;
}

/** Actions on the selected rows; shown only while something is selected. */
export function BulkActionBar({ count, taskRequest, onExport, onClear }: BulkActionBarProps) {
  const canCreateTasks = useRoleAtLeast('editor');
  const [taskDialog, setTaskDialog] = useState<TaskRequest | null>(null);
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
        <Button size="small" variant="contained" startIcon={<AssignmentOutlined />} onClick={() => setTaskDialog(taskRequest)}>
          Create tasks
        </Button>
      )}
      <Button size="small" variant="outlined" startIcon={<FileDownloadOutlined />} onClick={onExport}>
        Export selected
      </Button>
      <Button size="small" onClick={onClear}>
        Clear selection
      </Button>
      <CreateTasksDialog request={taskDialog} onClose={() => setTaskDialog(null)} />
    </Paper>
  );
}
