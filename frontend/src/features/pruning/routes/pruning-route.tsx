import { useMemo, useState } from 'react';
import { useParams } from 'react-router';
import { Button, Tab, Tabs, Typography } from '@mui/material';
import FileDownloadOutlined from '@mui/icons-material/FileDownloadOutlined';
import { DataTable } from '../../../components/ui/data-table.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { PageHeader } from '../../../components/ui/page-header.js';
import { useUrlState } from '../../../components/ui/use-url-state.js';
import { errorMessage } from '../../../lib/api-client.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { exportPruning } from '../api/export-pruning.js';
import { usePruningList } from '../api/get-pruning-list.js';
import { DecideDialog, type DecisionRequest } from '../components/decide-dialog.js';
import { PruningCaution } from '../components/pruning-caution.js';
import { pruningColumns } from '../components/pruning-columns.js';
import type { PruningDecision } from '@linkloom/shared';
import type { PruningStatusFilter } from '../components/pruning-labels.js';

const FILTERS: { value: PruningStatusFilter; label: string }[] = [
  { value: 'undecided', label: 'Undecided' },
  { value: 'approve', label: 'Approved' },
  { value: 'reject', label: 'Rejected' },
  { value: 'keep', label: 'Kept' },
  { value: 'flagged', label: 'Needs another look' },
  { value: '', label: 'All' },
];

export default function PruningRoute() {
  const { docSetId = '' } = useParams();
  const [state, setState] = useUrlState({ status: 'undecided', page: 1, pageSize: 50 });
  const list = usePruningList(docSetId, { status: state.status as PruningStatusFilter, page: state.page, pageSize: state.pageSize });
  const canDecide = useRoleAtLeast('editor');
  const [selected, setSelected] = useState<string[]>([]);
  const [request, setRequest] = useState<DecisionRequest | null>(null);
  const { notify } = useNotifier();
  const columns = useMemo(
    () => pruningColumns(canDecide, (path: string, decision: PruningDecision) => setRequest({ paths: [path], decision })),
    [canDecide],
  );
  const rules = list.data?.rules;
  const download = (format: 'csv' | 'txt') => exportPruning(docSetId, format).catch((e) => notify(errorMessage(e), 'error'));
  const bulk = (decision: PruningDecision) => setRequest({ paths: selected, decision });

  return (
    <>
      <PageHeader
        title="Pruning list"
        subtitle="Pages each run proposes for removal, with the rules they met. Editors approve, reject or keep them."
        actions={
          <>
            <Button variant="outlined" startIcon={<FileDownloadOutlined />} onClick={() => download('csv')}>
              Export approved (CSV)
            </Button>
            <Button variant="outlined" startIcon={<FileDownloadOutlined />} onClick={() => download('txt')}>
              Export approved paths
            </Button>
          </>
        }
      />
      <PruningCaution />
      {rules && (
        <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
          A page is proposed when at least two signs agree: orphan or unreachable; stationary score in the lowest {rules.lowScorePercentile}
          %; not reviewed for more than {rules.staleDays} days; fewer than {rules.thinWordCount} words. Pages protected in front matter
          {rules.protectGlobs.length ? ` or matching ${rules.protectGlobs.join(', ')}` : ''} are never proposed. Writers and editors can
          also nominate a page.
        </Typography>
      )}
      <Tabs
        value={state.status}
        onChange={(_, status) => {
          setSelected([]);
          setState({ status });
        }}
        sx={{ mb: 2 }}
        aria-label="Decision filter"
        variant="scrollable"
      >
        {FILTERS.map((f) => (
          <Tab key={f.label} value={f.value} label={f.label} />
        ))}
      </Tabs>
      {canDecide && selected.length > 0 && (
        <Typography
          component="div"
          sx={{ mb: 1, display: 'flex', gap: 1, alignItems: 'center' }}
          role="region"
          aria-label="Decide selected pages"
        >
          {selected.length} selected:
          <Button size="small" variant="contained" color="warning" onClick={() => bulk('approve')}>
            Approve selected
          </Button>
          <Button size="small" variant="outlined" onClick={() => bulk('reject')}>
            Reject selected
          </Button>
          <Button size="small" variant="outlined" color="success" onClick={() => bulk('keep')}>
            Keep selected
          </Button>
        </Typography>
      )}
      <DataTable
        label="Pruning candidates"
        columns={columns}
        data={list.data?.items}
        total={list.data?.total ?? 0}
        page={state.page}
        pageSize={state.pageSize}
        sort=""
        onSortChange={() => undefined}
        onPageChange={(page) => setState({ page })}
        onPageSizeChange={(pageSize) => setState({ pageSize })}
        loading={list.isFetching}
        error={list.error}
        onRetry={() => list.refetch()}
        rowId={(i) => i.path}
        selectable={canDecide}
        selectedIds={selected}
        onSelectionChange={setSelected}
        emptyState={
          <EmptyState
            title="Nothing on this list"
            hint="Candidates appear after a run; writers can nominate a page from its detail view."
          />
        }
      />
      <DecideDialog
        docSetId={docSetId}
        version={list.data?.version ?? 0}
        request={request}
        onClose={() => setRequest(null)}
        onDone={() => {
          setRequest(null);
          setSelected([]);
        }}
      />
    </>
  );
}
