import { useState } from 'react';
import { useParams } from 'react-router';
import { Box, Button, Stack } from '@mui/material';
import CloudUploadOutlined from '@mui/icons-material/CloudUploadOutlined';
import { PageHeader } from '../../../components/ui/page-header.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { useDocSet } from '../api/get-doc-set.js';
import { isRunBusy, latestFinished, useRuns } from '../../runs/api/get-runs.js';
import { HeadlineStats } from '../components/headline-stats.js';
import { TrendChart } from '../components/trend-chart.js';
import { ScoreDistributionPanel } from '../components/score-distribution-panel.js';
import { TopPagesPanel } from '../components/top-pages-panel.js';
import { HistoryPanel } from '../components/history-panel.js';
import { UploadArchiveDialog } from '../components/upload-archive-dialog.js';
import { DocSetNotificationsCard } from '../../notifications/index.js';

export default function OverviewRoute() {
  const { docSetId = '' } = useParams();
  const docSet = useDocSet(docSetId);
  const runs = useRuns(docSetId);
  const canUpload = useRoleAtLeast('editor');
  const [uploading, setUploading] = useState(false);
  const { latest, previous } = latestFinished(runs.data);
  const running = runs.data?.some(isRunBusy);

  if (docSet.isError) return <ErrorPanel error={docSet.error} onRetry={() => docSet.refetch()} />;
  const uploadButton = canUpload && (
    <Button variant="contained" startIcon={<CloudUploadOutlined />} onClick={() => setUploading(true)}>
      Upload archive
    </Button>
  );
  return (
    <>
      <PageHeader
        title={docSet.data?.name ?? 'Overview'}
        subtitle={running ? 'An analysis is running; the numbers refresh when it finishes.' : (docSet.data?.description ?? undefined)}
        actions={uploadButton}
      />
      <Stack spacing={3}>
        {runs.isError && <ErrorPanel error={runs.error} onRetry={() => runs.refetch()} />}
        {runs.isSuccess && !latest && !running && (
          <EmptyState
            title="No analysis yet"
            hint={
              canUpload
                ? 'No snapshot yet: upload a zip of your Markdown and Linkloom analyses it straight away.'
                : 'An editor needs to upload a zip of the Markdown first.'
            }
            action={uploadButton}
          />
        )}
        {(runs.isLoading || latest) && <HeadlineStats docSetId={docSetId} latest={latest} previous={previous} loading={runs.isLoading} />}
        {latest && (
          <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', lg: '3fr 2fr' } }}>
            <TrendChart runs={runs.data} />
            <TopPagesPanel docSetId={docSetId} runId={latest.id} />
            <ScoreDistributionPanel docSetId={docSetId} runId={latest.id} totalPages={latest.counts?.pages ?? 0} />
          </Box>
        )}
        <HistoryPanel docSetId={docSetId} runs={runs.data} />
        <DocSetNotificationsCard docSetId={docSetId} />
      </Stack>
      {canUpload && <UploadArchiveDialog docSetId={docSetId} open={uploading} onClose={() => setUploading(false)} />}
    </>
  );
}
