import { isRouteErrorResponse, Link as RouterLink, useRouteError } from 'react-router';
import { Box, Button, Stack } from '@mui/material';
import { ErrorPanel } from '../components/ui/error-panel.js';

/** One per route: a failing screen keeps the shell and offers a way out. */
export function RouteErrorBoundary() {
  const error = useRouteError();
  const shown = isRouteErrorResponse(error)
    ? new Error(error.status === 404 ? 'There is no page at this address.' : error.statusText)
    : error;
  // A lazily loaded chunk that vanished after a redeploy is fixed by a reload.
  const chunkGone = error instanceof Error && /dynamically imported module|Failed to fetch/i.test(error.message);
  return (
    <Box sx={{ p: 3, maxWidth: 720 }}>
      <ErrorPanel error={shown} title="This screen failed" onRetry={() => window.location.reload()} />
      <Stack direction="row" spacing={1} sx={{ mt: 2 }}>
        <Button component={RouterLink} to="/">
          Back to doc sets
        </Button>
        {chunkGone && <Button onClick={() => window.location.reload()}>Reload Linkloom</Button>}
      </Stack>
    </Box>
  );
}
