import { FormControlLabel, Stack, Switch, Typography } from '@mui/material';
import { MAIL_KIND_LABELS, MAIL_KINDS, type MailKind, type NotificationSettings } from '@linkloom/shared';

const HINTS: Record<MailKind, string> = {
  digest: 'What changed in the doc sets you follow (chosen per doc set below), after each nightly run.',
  'task-assigned': 'When an editor gives you a fix task.',
  'task-reopened': 'When a run finds again what one of your verified tasks had fixed.',
  'pruning-waiting': 'When a run proposes pages for pruning that wait for your decision.',
};

interface Props {
  kinds: NotificationSettings['kinds'];
  /** Kinds that cannot reach this person (e.g. the pruning list for writers) are not offered. */
  offered: MailKind[];
  onChange: (kind: MailKind, on: boolean) => void;
}

/** One switch per kind of mail; off stops every mail of that kind, whatever the doc-set choices say. */
export function MailKindSwitches({ kinds, offered, onChange }: Props) {
  return (
    <Stack spacing={1.5}>
      {MAIL_KINDS.filter((k) => offered.includes(k)).map((kind) => (
        <FormControlLabel
          key={kind}
          sx={{ alignItems: 'flex-start', m: 0, gap: 1 }}
          control={<Switch checked={kinds[kind]} onChange={(e) => onChange(kind, e.target.checked)} />}
          label={
            <span>
              <Typography variant="body1" component="span" sx={{ display: 'block', pt: 1 }}>
                {MAIL_KIND_LABELS[kind]}
              </Typography>
              <Typography variant="body2" color="text.secondary" component="span">
                {HINTS[kind]}
              </Typography>
            </span>
          }
        />
      ))}
    </Stack>
  );
}
