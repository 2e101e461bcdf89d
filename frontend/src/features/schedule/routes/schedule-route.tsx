import { useState } from 'react';
import { Alert, Button, Stack } from '@mui/material';
import PlayArrowOutlined from '@mui/icons-material/PlayArrowOutlined';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { PageHeader } from '../../../components/ui/page-header.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { errorMessage } from '../../../lib/api-client.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { isAwaitingStart, useSchedule, type RunNowPress } from '../api/get-schedule.js';
import { useRunNightlyNow } from '../api/run-nightly-now.js';
import { LastResultTable } from '../components/last-result-table.js';
import { NightlyDocSets } from '../components/nightly-doc-sets.js';
import { ScheduleSummary } from '../components/schedule-summary.js';

export default function ScheduleRoute() {
  const [pressed, setPressed] = useState<RunNowPress | null>(null);
  const canRun = useRoleAtLeast('editor');
  const { notify } = useNotifier();
  const runNow = useRunNightlyNow();
  const schedule = useSchedule(pressed);
  const data = schedule.data;
  // Measured against the last answer, so the button frees itself on the poll that ends the wait.
  const awaitingStart = isAwaitingStart(pressed, data, schedule.dataUpdatedAt);

  const [confirming, setConfirming] = useState(false);
  const start = () => {
    setConfirming(false);
    const baseline = data?.lastStartedAt ?? null;
    runNow.mutate(undefined, {
      onSuccess: (result) => {
        if (!result.started) return;
        setPressed({ at: Date.now(), baseline });
        notify('Nightly job started; this page follows it until it is done.');
      },
      onError: (error) => notify(errorMessage(error), 'error'),
    });
  };
  const busy = runNow.isPending || Boolean(data?.running) || awaitingStart;

  return (
    <>
      <PageHeader
        title="Nightly runs"
        subtitle="Each night Linkloom re-reads the server folder of every doc set with nightly runs on (or re-analyses its latest snapshot) and mails the digests."
        actions={
          canRun && (
            <Button variant="contained" startIcon={<PlayArrowOutlined />} onClick={() => setConfirming(true)} disabled={busy || !data}>
              {busy ? 'Running…' : 'Run now'}
            </Button>
          )
        }
      />
      <ConfirmDialog
        open={confirming}
        title="Run the nightly job now?"
        body={`Every doc set with nightly runs on${data ? ` (${data.docSets.filter((d) => d.nightly).length} now)` : ''} is re-read or re-analysed, and the digests go out to their readers as at ${data?.nightlyTime ?? 'night'}. Each reader's next digest then covers only what changes after this run.`}
        confirmLabel="Run now"
        onConfirm={start}
        onClose={() => setConfirming(false)}
      />
      <Stack spacing={3}>
        {runNow.data && !runNow.data.started && (
          <Alert severity="warning" role="alert" onClose={() => runNow.reset()}>
            Not started: {runNow.data.reason ?? 'the server gave no reason.'}
          </Alert>
        )}
        {schedule.isLoading && <LoadingSkeleton variant="cards" count={4} />}
        {schedule.error && (
          <ErrorPanel error={schedule.error} onRetry={() => schedule.refetch()} title="The schedule could not be loaded" />
        )}
        {data && (
          <>
            <ScheduleSummary status={data} />
            <LastResultTable result={data.lastResult} />
            <NightlyDocSets docSets={data.docSets} />
          </>
        )}
      </Stack>
    </>
  );
}
