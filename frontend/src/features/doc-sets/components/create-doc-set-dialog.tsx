import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle, Stack, TextField } from '@mui/material';
import { errorMessage } from '../../../lib/api-client.js';
import { useCreateDocSet } from '../api/create-doc-set.js';

export function CreateDocSetDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const [name, setName] = useState('');
  const [description, setDescription] = useState('');
  const [problem, setProblem] = useState<string | null>(null);
  const create = useCreateDocSet();
  const navigate = useNavigate();

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!name.trim()) return setProblem('Give the doc set a name, e.g. “Operator handbook”.');
    if (name.trim().length > 120) return setProblem('Keep the name under 120 characters.');
    setProblem(null);
    create.mutate(
      { name: name.trim(), description: description.trim() || undefined },
      {
        onSuccess: (docSet) => {
          onClose();
          navigate(`/doc-sets/${encodeURIComponent(docSet.id)}`);
        },
        onError: (error) => setProblem(errorMessage(error)),
      },
    );
  };

  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={submit} aria-label="New doc set">
        <DialogTitle>New doc set</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ mt: 1 }}>
            {problem && <Alert severity="error">{problem}</Alert>}
            <TextField label="Name" value={name} onChange={(e) => setName(e.target.value)} autoFocus required />
            <TextField
              label="Description"
              value={description}
              onChange={(e) => setDescription(e.target.value)}
              multiline
              minRows={2}
              helperText="Optional: who reads these docs, where they are published."
            />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={create.isPending}>
            Create
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
