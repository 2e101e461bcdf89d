import { Box, Paper, Stack, Typography } from '@mui/material';
import type { MailKind } from '@linkloom/shared';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { PageHeader } from '../../../components/ui/page-header.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { DocSetChoicesTable } from '../components/doc-set-choices-table.js';
import { MailKindSwitches } from '../components/mail-kind-switches.js';
import { SaveState } from '../components/save-state.js';
import { TimeZoneField } from '../components/time-zone-field.js';
import { useNotificationChoices } from '../components/use-notification-choices.js';

function Section({ title, hint, children }: { title: string; hint: string; children: React.ReactNode }) {
  return (
    <Paper variant="outlined" component="section" aria-label={title} sx={{ p: 3 }}>
      <Typography variant="h3" component="h2">
        {title}
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
        {hint}
      </Typography>
      {children}
    </Paper>
  );
}

/** Account menu, Notifications: which e-mails this person gets, per kind and per doc set, and in which time zone. */
export default function NotificationsRoute() {
  const { settings, shown, saving, changed, saveError, setKind, setDocSet, setTimeZone } = useNotificationChoices();
  const decides = useRoleAtLeast('editor');
  const assignable = useRoleAtLeast('writer');
  const offered: MailKind[] = [
    'digest',
    ...(assignable ? (['task-assigned', 'task-reopened'] as const) : []),
    ...(decides ? (['pruning-waiting'] as const) : []),
  ];
  return (
    <Box sx={{ maxWidth: 880 }}>
      <PageHeader
        title="Notifications"
        subtitle="Which e-mails Linkloom sends you. Each switch is saved at once; every e-mail also has a one-click unsubscribe link."
      />
      {settings.isLoading && <LoadingSkeleton count={4} />}
      {settings.error && <ErrorPanel error={settings.error} onRetry={() => settings.refetch()} title="Your choices could not be loaded" />}
      {shown && (
        <Stack spacing={3}>
          {changed && <SaveState pending={saving} error={saveError} />}
          <Section title="Kinds of e-mail" hint="Switching a kind off stops every e-mail of that kind.">
            <MailKindSwitches kinds={shown.kinds} offered={offered} onChange={setKind} />
          </Section>
          <Section
            title="Per doc set"
            hint={
              shown.kinds.digest
                ? 'Choose the doc sets whose digest you want.'
                : 'Digests are switched off above; these choices wait until you turn them on again.'
            }
          >
            {shown.docSets.length === 0 ? (
              <EmptyState title="No doc sets yet" hint="Once a doc set exists you can choose here to get its digest." />
            ) : (
              <DocSetChoicesTable docSets={shown.docSets} showPruning={decides} onChange={setDocSet} />
            )}
          </Section>
          <Section title="Dates and times" hint="Dates in your e-mails are written in this time zone.">
            <TimeZoneField value={shown.timeZone} isDefault={shown.timeZoneIsDefault} onChange={setTimeZone} disabled={saving} />
          </Section>
        </Stack>
      )}
    </Box>
  );
}
