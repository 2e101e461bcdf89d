import { useState, type FormEvent } from 'react';
import { Link as RouterLink } from 'react-router';
import { Alert, Box, Button, Link, Paper, Stack, TextField, Typography } from '@mui/material';
import { PageHeader } from '../../../components/ui/page-header.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { errorMessage } from '../../../lib/api-client.js';
import { useSession } from '../../../lib/session.js';
import { useChangePassword } from '../api/change-password.js';

/** Mirrors the server's rule (shared/src/schemas/users.ts): 8 to 256 characters. */
export function newPasswordProblem(next: string, repeat: string, current: string): string | null {
  if (next.length < 8) return 'The new password needs at least 8 characters.';
  if (next.length > 256) return 'The new password can have at most 256 characters.';
  if (next === current) return 'Choose a password different from the current one.';
  if (next !== repeat) return 'The two new passwords differ.';
  return null;
}

export default function AccountRoute() {
  const session = useSession();
  const change = useChangePassword();
  const { notify } = useNotifier();
  const [current, setCurrent] = useState('');
  const [next, setNext] = useState('');
  const [repeat, setRepeat] = useState('');
  const [problem, setProblem] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const found = current ? newPasswordProblem(next, repeat, current) : 'Enter your current password.';
    setProblem(found);
    if (found) return;
    change.mutate(
      { currentPassword: current, newPassword: next },
      {
        onSuccess: () => {
          notify('Password changed');
          setCurrent('');
          setNext('');
          setRepeat('');
        },
        onError: (error) => setProblem(errorMessage(error)),
      },
    );
  };

  return (
    <Box sx={{ maxWidth: 520 }}>
      <PageHeader
        title="Your account"
        subtitle={session ? `${session.user.name} · ${session.user.email} · ${session.user.role}` : undefined}
      />
      <Paper variant="outlined" sx={{ p: 3 }}>
        <Box component="form" noValidate onSubmit={submit} aria-label="Change password">
          <Stack spacing={2}>
            {problem && <Alert severity="error">{problem}</Alert>}
            <TextField
              label="Current password"
              type="password"
              autoComplete="current-password"
              value={current}
              onChange={(e) => setCurrent(e.target.value)}
            />
            <TextField
              label="New password"
              type="password"
              autoComplete="new-password"
              value={next}
              onChange={(e) => setNext(e.target.value)}
              helperText="At least 8 characters; a short sentence is easy to remember and hard to guess."
            />
            <TextField
              label="Repeat new password"
              type="password"
              autoComplete="new-password"
              value={repeat}
              onChange={(e) => setRepeat(e.target.value)}
            />
            <Button type="submit" variant="contained" disabled={change.isPending} sx={{ alignSelf: 'flex-start' }}>
              Change password
            </Button>
          </Stack>
        </Box>
      </Paper>
      <Typography variant="body2" color="text.secondary" sx={{ mt: 2 }}>
        Which e-mails you get, and the time zone of their dates:{' '}
        <Link component={RouterLink} to="/account/notifications">
          Notifications
        </Link>
      </Typography>
    </Box>
  );
}
