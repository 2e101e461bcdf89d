import { useEffect, useState, type FormEvent } from 'react';
import { useParams } from 'react-router';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle, Stack, TextField } from '@mui/material';
import { errorMessage } from '../../../lib/api-client.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { useNominatePage } from '../api/nominate-page.js';

/** "Nominate for pruning": puts a page on the list with the reason; an editor decides later. */
export function NominateDialog({ path, onClose, docSetId }: { path: string | null; onClose: () => void; docSetId?: string }) {
  const params = useParams();
  const target = docSetId ?? params.docSetId ?? '';
  const canNominate = useRoleAtLeast('writer');
  const [reason, setReason] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const nominate = useNominatePage();
  const { notify } = useNotifier();
  useEffect(() => {
    setReason('');
    setProblem(null);
  }, [path]);
  if (!canNominate || path === null) return null;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (reason.trim().length < 3) return setProblem('Say briefly why this page could go.');
    nominate.mutate(
      { docSetId: target, path, reason: reason.trim() },
      {
        onSuccess: () => {
          notify('Nominated: an editor will decide');
          onClose();
        },
        onError: (error) => setProblem(errorMessage(error)),
      },
    );
  };
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={submit} aria-label="Nominate for pruning">
        <DialogTitle>Nominate for pruning</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ mt: 1 }}>
            {problem && <Alert severity="error">{problem}</Alert>}
            <TextField label="Page" value={path} disabled />
            <TextField
              label="Reason"
              value={reason}
              onChange={(e) => setReason(e.target.value)}
              multiline
              minRows={2}
              autoFocus
              helperText="Editors see this reason next to the page; it is kept in the audit log."
            />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={nominate.isPending}>
            Nominate
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
