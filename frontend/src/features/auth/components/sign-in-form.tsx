import { useState, type FormEvent } from 'react';
import { Alert, Box, Button, Stack, TextField } from '@mui/material';
import { ApiError } from '../../../lib/api-client.js';
import type { SignInInput } from '@linkloom/shared';

interface SignInFormProps {
  onSubmit: (input: SignInInput) => Promise<unknown>;
  busy?: boolean;
}

interface FieldErrors {
  email?: string;
  password?: string;
}

function validate(email: string, password: string): FieldErrors {
  const errors: FieldErrors = {};
  if (!email.trim()) errors.email = 'Enter the e-mail address you were invited with.';
  else if (!/^[^\s@]+@[^\s@]+$/.test(email.trim())) errors.email = 'This does not look like an e-mail address.';
  if (!password) errors.password = 'Enter your password.';
  return errors;
}

/** Plain words for the answers a sign-in can get. */
export function signInErrorText(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.status === 429) return 'Too many sign-in attempts. Wait a minute, then try again.';
    if (error.status === 401) return 'That e-mail and password do not match an active account. Check both and try again.';
    if (error.status === 403) return 'This account is disabled. Ask an admin to enable it.';
    return error.message;
  }
  return 'Signing in failed. Check your connection and try again.';
}

export function SignInForm({ onSubmit, busy }: SignInFormProps) {
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [failure, setFailure] = useState<string | null>(null);

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const found = validate(email, password);
    setErrors(found);
    setFailure(null);
    if (found.email || found.password) return;
    try {
      await onSubmit({ email: email.trim(), password });
    } catch (error) {
      setFailure(signInErrorText(error));
    }
  };

  return (
    <Box component="form" noValidate onSubmit={submit} aria-label="Sign in">
      <Stack spacing={2}>
        {failure && (
          <Alert severity="error" role="alert">
            {failure}
          </Alert>
        )}
        <TextField
          label="E-mail"
          type="email"
          autoComplete="username"
          autoFocus
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          error={Boolean(errors.email)}
          helperText={errors.email}
        />
        <TextField
          label="Password"
          type="password"
          autoComplete="current-password"
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          error={Boolean(errors.password)}
          helperText={errors.password}
        />
        <Button type="submit" variant="contained" size="large" disabled={busy}>
          {busy ? 'Signing in…' : 'Sign in'}
        </Button>
      </Stack>
    </Box>
  );
}
