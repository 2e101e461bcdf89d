import { Alert, AlertTitle, Button } from '@mui/material';
import { ApiError, errorMessage } from '../../lib/api-client.js';

interface ErrorPanelProps {
  error: unknown;
  onRetry?: () => void;
  title?: string;
}

/** What to try next for the common failure kinds; the server's own message comes first. */
function nextStep(error: unknown): string | null {
  if (!(error instanceof ApiError)) return null;
  if (error.status === 0) return 'Check your connection, then retry.';
  if (error.status === 403) return 'Ask an admin for a role that allows this.';
  if (error.status === 404) return 'It may have been removed; go back and pick another one.';
  if (error.status >= 500) return 'The server hit a problem. Retry; if it persists, tell your admin the time it happened.';
  return null;
}

export function ErrorPanel({ error, onRetry, title = 'This could not be loaded' }: ErrorPanelProps) {
  const hint = nextStep(error);
  return (
    <Alert
      severity="error"
      variant="outlined"
      action={
        onRetry ? (
          <Button color="inherit" size="small" onClick={onRetry}>
            Retry
          </Button>
        ) : undefined
      }
    >
      <AlertTitle>{title}</AlertTitle>
      {errorMessage(error)}
      {hint && <> {hint}</>}
    </Alert>
  );
}
