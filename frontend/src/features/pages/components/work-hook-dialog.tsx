// HOOK POINT, not a finished feature by itself: <PageActions> and <BulkActionBar> take handlers
// (`onCreateTask` / `onNominate`, `onCreateTasks`) that the tasks and pruning features pass in. Where no
// handler is passed, the button opens this dialog, which only says what the action will do; nothing here
// calls the API.
import { Button, Dialog, DialogActions, DialogContent, DialogContentText, DialogTitle } from '@mui/material';

/** Task kinds of docs/api.md "Work", chosen from the finding so the task says what to fix. */
export type FixTaskKind = 'add-inbound-links' | 'repair-broken-links' | 'add-outbound-links' | 'make-reachable' | 'other';

export interface FixTaskRequest {
  pagePaths: string[];
  kind: FixTaskKind;
}

export interface PendingAction {
  title: string;
  /** What the finished feature will do, in a sentence or two. */
  body: string;
}

export function describeTaskRequest({ pagePaths, kind }: FixTaskRequest): PendingAction {
  const what = kind.replace(/-/g, ' ');
  const pages = pagePaths.length === 1 ? pagePaths[0] : `${pagePaths.length} pages`;
  return {
    title: pagePaths.length === 1 ? 'Create fix task' : 'Create tasks',
    body:
      `This will create a "${what}" task for ${pages}, which you can assign to a writer with a due date. ` +
      'Task creation arrives with the tasks screen; nothing has been created yet.',
  };
}

export function describeNomination(pagePath: string): PendingAction {
  return {
    title: 'Nominate for pruning',
    body:
      `This will put ${pagePath} on the pruning list with your note, where an editor approves, rejects or keeps it. ` +
      'The pruning list arrives in a later release; nothing has been nominated yet.',
  };
}

export function PendingActionDialog({ action, onClose }: { action: PendingAction | null; onClose: () => void }) {
  return (
    <Dialog open={action !== null} onClose={onClose} aria-labelledby="pending-action-title" maxWidth="xs" fullWidth>
      <DialogTitle id="pending-action-title">{action?.title}</DialogTitle>
      <DialogContent>
        <DialogContentText>{action?.body}</DialogContentText>
      </DialogContent>
      <DialogActions>
        <Button onClick={onClose} variant="contained">
          Close
        </Button>
      </DialogActions>
    </Dialog>
  );
}

/** The task a page most needs, from its worst finding. */
export function taskKindFor(page: { brokenLinkCount?: number; reachable?: boolean; orphan?: boolean; deadEnd?: boolean }): FixTaskKind {
  if ((page.brokenLinkCount ?? 0) > 0) return 'repair-broken-links';
  if (page.reachable === false) return 'make-reachable';
  if (page.orphan) return 'add-inbound-links';
  if (page.deadEnd) return 'add-outbound-links';
  return 'other';
}
