import { Link as RouterLink } from 'react-router';
import { FormControlLabel, Link, Paper, Stack, Switch, Typography } from '@mui/material';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { SaveState } from './save-state.js';
import { useNotificationChoices } from './use-notification-choices.js';

/** On a doc set's overview: this person's e-mail for this doc set, where they look for it. */
export function DocSetNotificationsCard({ docSetId }: { docSetId: string }) {
  const { shown, saving, saveError, setDocSet } = useNotificationChoices();
  const decides = useRoleAtLeast('editor');
  const choice = shown?.docSets.find((d) => d.docSetId === docSetId);
  if (!shown || !choice) return null;
  const off = [!shown.kinds.digest && 'digests', decides && !shown.kinds['pruning-waiting'] && 'pruning-list e-mails'].filter(Boolean);
  return (
    <Paper variant="outlined" component="section" aria-label="Your e-mail for this doc set" sx={{ p: 2 }}>
      <Typography variant="h3" component="h2" gutterBottom>
        Your e-mail for this doc set
      </Typography>
      <Stack direction={{ xs: 'column', md: 'row' }} spacing={2} sx={{ alignItems: { md: 'center' }, flexWrap: 'wrap' }}>
        <FormControlLabel
          control={<Switch checked={choice.digest} onChange={(e) => setDocSet(docSetId, { digest: e.target.checked })} />}
          label="Digest of what changed"
        />
        <FormControlLabel
          control={
            <Switch
              checked={choice.digest && choice.nothingChanged}
              disabled={!choice.digest}
              onChange={(e) => setDocSet(docSetId, { nothingChanged: e.target.checked })}
            />
          }
          label="Also when nothing changed"
        />
        {decides && (
          <FormControlLabel
            control={<Switch checked={choice.pruningWaiting} onChange={(e) => setDocSet(docSetId, { pruningWaiting: e.target.checked })} />}
            label="Pruning list waiting"
          />
        )}
        <Link component={RouterLink} to="/account/notifications">
          All notification settings
        </Link>
      </Stack>
      {off.length > 0 && (
        <Typography variant="body2" color="warning.main" role="note" sx={{ mt: 1 }}>
          You switched off all {off.join(' and ')} under Notifications, so none are sent until you switch them on there.
        </Typography>
      )}
      {(saving || saveError) && <SaveState pending={saving} error={saveError} />}
    </Paper>
  );
}
