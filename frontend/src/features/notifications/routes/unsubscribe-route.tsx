import { useParams } from 'react-router';
import { Alert, Box, Button, Paper, Stack, Typography } from '@mui/material';
import { LogoMark } from '../../../components/brand/logo-mark.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { useConfirmUnsubscribe } from '../api/confirm-unsubscribe.js';
import { useUnsubscribeLink } from '../api/get-unsubscribe-link.js';

/**
 * Where the unsubscribe link of an e-mail leads, signed in or not. Opening it changes nothing (mail
 * scanners open links); the button does.
 */
export default function UnsubscribeRoute() {
  const { token = '' } = useParams();
  const link = useUnsubscribeLink(token);
  const confirm = useConfirmUnsubscribe();
  const done = confirm.data;
  return (
    <Box sx={{ minHeight: '100vh', display: 'grid', placeItems: 'center', bgcolor: 'background.default', p: 2 }}>
      <Paper variant="outlined" sx={{ p: 4, maxWidth: 520, width: '100%' }}>
        <Stack spacing={2}>
          <Stack direction="row" spacing={1} sx={{ alignItems: 'center' }}>
            <LogoMark />
            <Typography variant="h2" component="h1">
              Unsubscribe
            </Typography>
          </Stack>
          {link.isLoading && <LoadingSkeleton count={2} />}
          {link.error && <ErrorPanel error={link.error} title="This link does not work" />}
          {link.data && !done && (
            <>
              <Typography>
                Stop e-mails of the kind <strong>“{link.data.kindLabel}”</strong> to {link.data.maskedEmail}?
              </Typography>
              {!link.data.subscribed && <Alert severity="info">These e-mails are already switched off for this address.</Alert>}
              {confirm.error && <ErrorPanel error={confirm.error} title="Nothing was changed" />}
              <Box>
                <Button variant="contained" onClick={() => confirm.mutate(token)} disabled={confirm.isPending}>
                  Unsubscribe
                </Button>
              </Box>
            </>
          )}
          {done && (
            <Alert severity="success" role="status">
              {done.message}
            </Alert>
          )}
          <Typography variant="body2" color="text.secondary">
            Other e-mails stay as they are. Signed in, you choose every kind under the account menu, Notifications.
          </Typography>
        </Stack>
      </Paper>
    </Box>
  );
}
