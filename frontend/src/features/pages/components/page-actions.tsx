import { useState } from 'react';
import { Button } from '@mui/material';
import AssignmentOutlined from '@mui/icons-material/AssignmentOutlined';
import ContentCutOutlined from '@mui/icons-material/ContentCutOutlined';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import type { PageDetail } from '@linkloom/shared';
import {
  describeNomination,
  describeTaskRequest,
  PendingActionDialog,
  taskKindFor,
  type FixTaskRequest,
  type PendingAction,
} from './work-hook-dialog.js';

interface PageActionsProps {
  page: PageDetail;
  /** HOOK POINT: the tasks change passes this; until then the button explains what it will do. */
  onCreateTask?: (request: FixTaskRequest) => void;
  /** HOOK POINT: the pruning change passes this. */
  onNominate?: (pagePath: string) => void;
}

/** Only the buttons the reader's role may use: editors create tasks, writers and up nominate for pruning. */
export function PageActions({ page, onCreateTask, onNominate }: PageActionsProps) {
  const canCreateTask = useRoleAtLeast('editor');
  const canNominate = useRoleAtLeast('writer');
  const [pending, setPending] = useState<PendingAction | null>(null);
  const request: FixTaskRequest = { pagePaths: [page.path], kind: taskKindFor(page) };
  return (
    <>
      {canCreateTask && (
        <Button
          variant="contained"
          startIcon={<AssignmentOutlined />}
          onClick={() => (onCreateTask ? onCreateTask(request) : setPending(describeTaskRequest(request)))}
        >
          Create fix task
        </Button>
      )}
      {canNominate && (
        <Button
          variant="outlined"
          startIcon={<ContentCutOutlined />}
          onClick={() => (onNominate ? onNominate(page.path) : setPending(describeNomination(page.path)))}
        >
          Nominate for pruning
        </Button>
      )}
      <PendingActionDialog action={pending} onClose={() => setPending(null)} />
    </>
  );
}
