import { useState, type FormEvent } from 'react';
import { Alert, Button, Dialog, DialogActions, DialogContent, DialogTitle, MenuItem, Stack, TextField } from '@mui/material';
import { ROLES, type Role } from '@linkloom/shared';
import { errorMessage } from '../../../lib/api-client.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { useCreateUser } from '../api/create-user.js';
import { roleHelp } from './role-help.js';

interface Props {
  open: boolean;
  onClose: () => void;
}

const empty = { email: '', name: '', role: 'writer' as Role, password: '' };

export function CreateUserDialog({ open, onClose }: Props) {
  const [form, setForm] = useState(empty);
  const [problem, setProblem] = useState<string | null>(null);
  const create = useCreateUser();
  const { notify } = useNotifier();
  const set = (patch: Partial<typeof empty>) => setForm((f) => ({ ...f, ...patch }));

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!/^[^\s@]+@[^\s@]+$/.test(form.email.trim())) return setProblem('Enter a valid e-mail address.');
    if (!form.name.trim()) return setProblem('Enter the person’s name.');
    if (form.password.length < 8) return setProblem('The initial password needs at least 8 characters.');
    setProblem(null);
    create.mutate(
      { ...form, email: form.email.trim(), name: form.name.trim() },
      {
        onSuccess: () => {
          notify(`${form.name.trim()} can now sign in`);
          setForm(empty);
          onClose();
        },
        onError: (error) => setProblem(errorMessage(error)),
      },
    );
  };

  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={submit} aria-label="New user">
        <DialogTitle>New user</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ mt: 1 }}>
            {problem && <Alert severity="error">{problem}</Alert>}
            <TextField label="E-mail" type="email" value={form.email} onChange={(e) => set({ email: e.target.value })} autoFocus />
            <TextField label="Name" value={form.name} onChange={(e) => set({ name: e.target.value })} />
            <TextField
              select
              label="Role"
              value={form.role}
              onChange={(e) => set({ role: e.target.value as Role })}
              helperText={roleHelp[form.role]}
            >
              {ROLES.map((role) => (
                <MenuItem key={role} value={role}>
                  {role}
                </MenuItem>
              ))}
            </TextField>
            <TextField
              label="Initial password"
              type="password"
              autoComplete="new-password"
              value={form.password}
              onChange={(e) => set({ password: e.target.value })}
              helperText="Share it privately; they can change it under “Change password”."
            />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={create.isPending}>
            Create user
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
