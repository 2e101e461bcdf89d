import { Link as RouterLink, useParams } from 'react-router';
import { Box, Breadcrumbs, Link, Stack, Typography } from '@mui/material';
import { PageHeader } from '../../../components/ui/page-header.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { useUrlState } from '../../../components/ui/use-url-state.js';
import { usePage } from '../api/get-page.js';
import { AnalysisError } from '../components/analysis-error.js';
import { PageSummary } from '../components/page-summary.js';
import { ScoreHistoryChart } from '../components/score-history-chart.js';
import { LinkedPagesPanel } from '../components/linked-pages-panel.js';
import { BrokenLinksPanel } from '../components/broken-links-panel.js';
import { SuggestionsPanel } from '../components/suggestions-panel.js';
import { NeighbourhoodPanel } from '../components/neighbourhood-panel.js';
import { PageActions } from '../components/page-actions.js';
import { CreateTasksDialog, PageTasksPanel, type TaskRequest } from '../../tasks/index.js';
import { NominateDialog } from '../../pruning/components/nominate-dialog.js';
import { useState } from 'react';

export default function PageDetailRoute() {
  const { docSetId = '' } = useParams();
  const [{ path, run }] = useUrlState({ path: '', run: 'latest' });
  const runId = run || 'latest';
  const page = usePage(docSetId, runId, path);
  const [taskRequest, setTaskRequest] = useState<TaskRequest | null>(null);
  const [nominating, setNominating] = useState<string | null>(null);
  const pagesHref = `/doc-sets/${encodeURIComponent(docSetId)}/pages`;
  const crumbs = (
    <Breadcrumbs aria-label="Breadcrumb" sx={{ mb: 1 }}>
      <Link component={RouterLink} to={pagesHref}>
        Pages
      </Link>
      <Typography color="text.primary" sx={{ wordBreak: 'break-all' }}>
        {path || 'No page chosen'}
      </Typography>
    </Breadcrumbs>
  );

  if (!path) {
    return (
      <>
        {crumbs}
        <EmptyState title="No page chosen" hint="Pick a page in the Pages list to see its links, findings and neighbourhood." />
      </>
    );
  }
  if (page.isLoading)
    return (
      <>
        {crumbs}
        <LoadingSkeleton variant="cards" count={6} />
        <Box sx={{ mt: 2 }}>
          <LoadingSkeleton variant="chart" />
        </Box>
      </>
    );
  if (page.error || !page.data) {
    return (
      <>
        {crumbs}
        <AnalysisError docSetId={docSetId} error={page.error} onRetry={() => page.refetch()} />
      </>
    );
  }
  const data = page.data;
  return (
    <>
      {crumbs}
      <PageHeader
        title={data.title || data.path}
        subtitle={data.path}
        actions={<PageActions page={data} onCreateTask={setTaskRequest} onNominate={setNominating} />}
      />
      <CreateTasksDialog request={taskRequest} onClose={() => setTaskRequest(null)} />
      <NominateDialog path={nominating} onClose={() => setNominating(null)} />
      <Stack spacing={3}>
        <PageSummary page={data} />
        <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', lg: '3fr 2fr' } }}>
          <NeighbourhoodPanel docSetId={docSetId} runId={runId} centrePath={data.path} neighbourhood={data.neighbourhood} />
          <Stack spacing={3}>
            <ScoreHistoryChart history={data.scoreHistory ?? []} />
            <SuggestionsPanel
              docSetId={docSetId}
              runId={runId}
              stationaryScore={data.stationaryScore}
              unlinkedMentions={data.unlinkedMentions ?? []}
              suggestedSources={data.suggestedSources ?? []}
            />
          </Stack>
        </Box>
        <PageTasksPanel docSetId={docSetId} pagePath={data.path} />
        <BrokenLinksPanel links={data.brokenLinks ?? []} anchors={data.anchors ?? []} />
        <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', lg: '1fr 1fr' } }}>
          <LinkedPagesPanel
            title="Linked from"
            lineOf="in the linking page"
            pages={data.inbound ?? []}
            docSetId={docSetId}
            runId={runId}
            empty="No other page links here: this page is an orphan. See the suggestions above."
          />
          <LinkedPagesPanel
            title="Links to"
            lineOf="on this page"
            pages={data.outbound ?? []}
            docSetId={docSetId}
            runId={runId}
            empty="This page links to no other page: a dead end. Add a link onwards to a related page."
          />
        </Box>
      </Stack>
    </>
  );
}
