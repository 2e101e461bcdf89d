import { useCallback, useMemo } from 'react';
import { useNavigate, useParams } from 'react-router';
import { Button } from '@mui/material';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import type { VisibilityState } from '@tanstack/react-table';
import { DataTable } from '../../../components/ui/data-table.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { PageHeader } from '../../../components/ui/page-header.js';
import { useUrlState } from '../../../components/ui/use-url-state.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { errorMessage } from '../../../lib/api-client.js';
import { usePages, pagesQueryParams } from '../api/get-pages.js';
import { useExportCsv } from '../api/export-csv.js';
import { pageColumns } from '../components/page-columns.js';
import { ExplorerFilters } from '../components/explorer-filters.js';
import { EXPLORER_DEFAULTS, isFiltered, toPagesQuery, type ExplorerState } from '../components/explorer-state.js';
import { AnalysisError, isNoAnalysis } from '../components/analysis-error.js';
import { pageDetailHref } from '../components/format.js';

export default function PageExplorerRoute() {
  const { docSetId = '' } = useParams();
  const navigate = useNavigate();
  const { notify } = useNotifier();
  const [state, setState] = useUrlState({ ...EXPLORER_DEFAULTS, run: 'latest' });
  const runId = state.run || 'latest';
  const query = toPagesQuery(state);
  const pages = usePages(docSetId, runId, query);
  const exportCsv = useExportCsv(docSetId, runId);
  const columns = useMemo(() => pageColumns(docSetId, runId), [docSetId, runId]);
  const onFilterChange = useCallback((patch: Partial<ExplorerState>) => setState(patch), [setState]);
  const visibility: VisibilityState = Object.fromEntries(state.hide.map((id) => [id, false]));

  const download = () =>
    exportCsv.mutate(
      { view: 'pages', filters: pagesQueryParams(query) },
      {
        onError: (error) => notify(`The export failed: ${errorMessage(error)}`, 'error'),
      },
    );
  const exportButton = (
    <Button variant="outlined" startIcon={<FileDownloadOutlined />} onClick={download} disabled={exportCsv.isPending || !pages.data?.total}>
      {exportCsv.isPending ? 'Preparing CSV…' : 'Export CSV'}
    </Button>
  );

  return (
    <>
      <PageHeader
        title="Pages"
        actions={exportButton}
        subtitle="Every page of the doc set with its stationary score (PageRank), links and findings. Click a row for the page's detail."
      />
      {pages.error && isNoAnalysis(pages.error) ? (
        <AnalysisError docSetId={docSetId} error={pages.error} onRetry={() => pages.refetch()} />
      ) : (
        <>
          <ExplorerFilters state={state} onChange={onFilterChange} />
          <DataTable
            label="Pages"
            columns={columns}
            data={pages.data?.items}
            total={pages.data?.total ?? 0}
            page={state.page}
            pageSize={state.pageSize}
            sort={state.sort}
            onPageChange={(page) => setState({ page })}
            onPageSizeChange={(pageSize) => setState({ pageSize })}
            onSortChange={(sort) => setState({ sort })}
            loading={pages.isFetching}
            error={pages.error}
            onRetry={() => pages.refetch()}
            rowId={(r) => r.path}
            columnVisibility={visibility}
            onColumnVisibilityChange={(v) => setState({ hide: Object.keys(v).filter((id) => v[id] === false) })}
            onRowClick={(row) => navigate(pageDetailHref(docSetId, row.path, runId))}
            emptyState={
              isFiltered(state) ? (
                <EmptyState
                  title="No page matches these filters"
                  hint="Loosen a range, switch off a finding chip or clear the text filter."
                />
              ) : (
                <EmptyState
                  title="No pages in this run"
                  hint="The snapshot held no Markdown pages. Check the archive's folder layout on the Overview and upload again."
                />
              )
            }
          />
        </>
      )}
    </>
  );
}
