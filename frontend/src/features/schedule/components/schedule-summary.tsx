import { Chip, Paper, Stack, Typography } from '@mui/material';
import type { ScheduleStatus } from '@linkloom/shared';

const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString() : 'not yet');

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <Stack spacing={0.25} sx={{ minWidth: 180 }}>
      <Typography variant="caption" color="text.secondary" component="dt">
        {label}
      </Typography>
      <Typography variant="body1" component="dd" sx={{ m: 0 }}>
        {value}
      </Typography>
    </Stack>
  );
}

/** When the nightly job runs and when it last ran. */
export function ScheduleSummary({ status }: { status: ScheduleStatus }) {
  const last = status.lastResult;
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Stack direction="row" spacing={1} sx={{ mb: 2, alignItems: 'center' }}>
        <Typography variant="h3" component="h2">
          Nightly job
        </Typography>
        {status.running ? (
          <Chip size="small" color="info" label="Running now" role="status" />
        ) : (
          last && (
            <Chip size="small" label={last.status === 'skipped' ? `Last run skipped${last.reason ? `: ${last.reason}` : ''}` : 'Idle'} />
          )
        )}
      </Stack>
      <Stack component="dl" direction="row" sx={{ flexWrap: 'wrap', gap: 3, m: 0 }}>
        <Fact label="Every night at" value={`${status.nightlyTime} (${status.timeZone}, the server's time zone)`} />
        <Fact label="Next run" value={when(status.nextRunAt)} />
        <Fact label="Last started" value={when(status.lastStartedAt)} />
        <Fact label="Last finished" value={status.running ? 'still running' : when(status.lastFinishedAt)} />
        {last?.trigger && <Fact label="Last started by" value={TRIGGER_LABEL[last.trigger]} />}
      </Stack>
    </Paper>
  );
}

const TRIGGER_LABEL = { clock: 'the clock', 'run-now': '“Run now”', 'catch-up': 'a catch-up after the server was down' } as const;
