import { useState } from 'react';
import { useParams } from 'react-router';
import { Button, Stack, Typography } from '@mui/material';
import ReplayOutlined from '@mui/icons-material/ReplayOutlined';
import CompareArrowsOutlined from '@mui/icons-material/CompareArrowsOutlined';
import { defaultDocSetSettings } from '@linkloom/shared';
import { DataTable } from '../../../components/ui/data-table.js';
import { PageHeader } from '../../../components/ui/page-header.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { useUrlState } from '../../../components/ui/use-url-state.js';
import { useNotifier } from '../../../components/ui/notifier.js';
import { useRoleAtLeast } from '../../../lib/use-role.js';
import { useDocSet } from '../../doc-sets/api/get-doc-set.js';
import { useRuns } from '../api/get-runs.js';
import { useCreateRun } from '../api/create-run.js';
import { runColumns } from '../components/run-columns.js';
import { RunDiffPanel } from '../components/run-diff-panel.js';
import { RunAgainDialog } from '../components/run-again-dialog.js';

export default function RunsRoute() {
  const { docSetId = '' } = useParams();
  const runs = useRuns(docSetId);
  const docSet = useDocSet(docSetId);
  const createRun = useCreateRun(docSetId);
  const canRun = useRoleAtLeast('editor');
  const { notify } = useNotifier();
  const [state, setState] = useUrlState({ page: 1, pageSize: 25, run: '', against: '' });
  const [selected, setSelected] = useState<string[]>([]);
  const [rerunning, setRerunning] = useState(false);

  const all = runs.data ?? [];
  const shown = all.slice((state.page - 1) * state.pageSize, state.page * state.pageSize);
  const compare = () => {
    // The list is newest first, so the later-listed selection is the older run, the baseline.
    const [newer, older] = [...selected].sort((a, b) => all.findIndex((r) => r.id === a) - all.findIndex((r) => r.id === b));
    setState({ run: newer, against: older });
  };
  const settings = { ...defaultDocSetSettings(), ...docSet.data?.settings };

  return (
    <>
      <PageHeader
        title="Runs"
        subtitle="Each run analyses one snapshot. Pick two finished runs to see what changed."
        actions={
          <>
            <Button variant="outlined" startIcon={<CompareArrowsOutlined />} disabled={selected.length !== 2} onClick={compare}>
              Compare selected
            </Button>
            {canRun && (
              <Button variant="contained" startIcon={<ReplayOutlined />} onClick={() => setRerunning(true)}>
                Run again with…
              </Button>
            )}
          </>
        }
      />
      <Stack spacing={3}>
        <DataTable
          label="Runs"
          columns={runColumns}
          data={runs.data ? shown : undefined}
          total={all.length}
          page={state.page}
          pageSize={state.pageSize}
          sort=""
          onSortChange={() => undefined}
          onPageChange={(page) => setState({ page })}
          onPageSizeChange={(pageSize) => setState({ pageSize })}
          loading={runs.isLoading}
          error={runs.error}
          onRetry={() => runs.refetch()}
          rowId={(r) => r.id}
          selectable
          selectedIds={selected}
          onSelectionChange={(ids) => setSelected(ids.slice(-2))}
          toolbar={
            <Typography variant="body2" color="text.secondary">
              Select two runs to compare them.
            </Typography>
          }
          emptyState={
            <EmptyState
              title="No runs yet"
              hint="No snapshot yet: upload a zip of your Markdown on the overview; the first run starts after the import."
            />
          }
        />
        {state.run && state.against && <RunDiffPanel docSetId={docSetId} runId={state.run} againstId={state.against} />}
      </Stack>
      {canRun && rerunning && (
        <RunAgainDialog
          open
          busy={createRun.isPending}
          onClose={() => setRerunning(false)}
          current={{
            damping: settings.damping,
            teleport: settings.teleport,
            entryPages: settings.entryPages,
            depthThreshold: settings.depthThreshold,
          }}
          onRun={async (overrides) => {
            await createRun.mutateAsync(overrides);
            notify('A new run has started');
          }}
        />
      )}
    </>
  );
}
