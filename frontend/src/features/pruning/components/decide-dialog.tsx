import { useEffect, useState, type FormEvent } from 'react';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle, Stack, TextField, Typography } from '@mui/material';
import { ApiError, errorMessage } from '../../../lib/api-client.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { useDecidePruning } from '../api/decide-pruning.js';
import type { PruningDecision } from '@linkloom/shared';
import { DECISION_LABELS } from './pruning-labels.js';

export interface DecisionRequest {
  paths: string[];
  decision: PruningDecision;
}

const VERB: Record<PruningDecision, string> = { approve: 'Approve', reject: 'Reject', keep: 'Keep' };

/** One decision with a note for one page or many; sends the list version it was made on. */
export function DecideDialog({
  docSetId,
  version,
  request,
  onClose,
  onDone,
}: {
  docSetId: string;
  version: number;
  request: DecisionRequest | null;
  onClose: () => void;
  onDone: () => void;
}) {
  const [note, setNote] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const decide = useDecidePruning();
  const { notify } = useNotifier();
  useEffect(() => {
    setNote('');
    setProblem(null);
  }, [request]);
  if (!request) return null;
  const count = request.paths.length;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    decide.mutate(
      { docSetId, version, decisions: request.paths.map((path) => ({ path, decision: request.decision, note: note.trim() })) },
      {
        onSuccess: () => {
          notify(`${count} page${count === 1 ? '' : 's'}: ${DECISION_LABELS[request.decision].toLowerCase()}`);
          onDone();
        },
        onError: (error) =>
          setProblem(
            error instanceof ApiError && error.status === 409
              ? 'Someone changed this list while you were deciding. The list has been reloaded: check it and decide again.'
              : errorMessage(error),
          ),
      },
    );
  };
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={submit} aria-label="Decide">
        <DialogTitle>
          {VERB[request.decision]} {count === 1 ? 'this page' : `${count} pages`}
        </DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ mt: 1 }}>
            {problem && <Alert severity="error">{problem}</Alert>}
            <Typography variant="body2" sx={{ wordBreak: 'break-all' }}>
              {request.paths.slice(0, 5).join(', ')}
              {count > 5 ? ` and ${count - 5} more` : ''}
            </Typography>
            <TextField
              label="Note (why)"
              value={note}
              onChange={(e) => setNote(e.target.value)}
              multiline
              minRows={2}
              autoFocus
              helperText="Recorded with the decision in the audit log."
            />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button
            type="submit"
            variant="contained"
            color={request.decision === 'approve' ? 'warning' : 'primary'}
            disabled={decide.isPending}
          >
            {VERB[request.decision]}
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
