import { useParams } from 'react-router';
import { Box } from '@mui/material';
import { PageHeader } from '../../../components/ui/page-header.js';
import { useUrlState } from '../../../components/ui/use-url-state.js';
import { useRun } from '../../pages/api/get-run.js';
import { AnalysisError, isNoAnalysis } from '../../pages/components/analysis-error.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { FindingsNav } from '../components/findings-nav.js';
import { FindingsBody, type LinkGrouping } from '../components/findings-body.js';
import { resolveView } from '../components/findings-views.js';

export default function FindingsRoute() {
  const { docSetId = '', view: viewParam } = useParams();
  const [state, setState] = useUrlState({ run: 'latest', kind: '', group: 'page', page: 1, pageSize: 50, sort: '' });
  const runId = state.run || 'latest';
  const run = useRun(docSetId, runId);
  const { view, kind } = resolveView(viewParam, state.kind);
  // Switching views keeps only the chosen run; paging and sub-kind belong to the old view.
  const keep = state.run !== 'latest' ? `?run=${encodeURIComponent(state.run)}` : '';
  const table = {
    page: state.page,
    pageSize: state.pageSize,
    sort: state.sort,
    onPageChange: (page: number) => setState({ page }),
    onPageSizeChange: (pageSize: number) => setState({ pageSize }),
    onSortChange: (sort: string) => setState({ sort }),
  };

  if (run.error && isNoAnalysis(run.error)) {
    return (
      <>
        <PageHeader title="Findings" />
        <AnalysisError docSetId={docSetId} error={run.error} onRetry={() => run.refetch()} />
      </>
    );
  }
  return (
    <>
      <PageHeader title="Findings" subtitle="What to fix, one need at a time. Select rows to export them or turn them into tasks." />
      {run.error && (
        <Box sx={{ mb: 2 }}>
          <ErrorPanel error={run.error} title="The counts could not be loaded" onRetry={() => run.refetch()} />
        </Box>
      )}
      <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', md: '280px minmax(0, 1fr)' }, alignItems: 'start' }}>
        <FindingsNav docSetId={docSetId} current={view.id} counts={run.data?.counts} loading={run.isLoading} search={keep} />
        <FindingsBody
          docSetId={docSetId}
          runId={runId}
          view={view}
          kind={kind}
          counts={run.data?.counts}
          grouping={state.group === 'target' ? 'target' : 'page'}
          table={table}
          onKindChange={(k) => setState({ kind: k, sort: '' })}
          onGroupingChange={(g: LinkGrouping) => setState({ group: g, sort: '' })}
        />
      </Box>
    </>
  );
}
