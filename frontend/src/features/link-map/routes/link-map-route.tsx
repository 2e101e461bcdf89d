import { useMemo, useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { Alert, AlertTitle, Paper, Stack, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import type { ElementDefinition, LayoutOptions } from 'cytoscape';
import { PageHeader } from '../../../components/ui/page-header.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { useUrlState } from '../../../components/ui/use-url-state.js';
import { useRun } from '../../pages/api/get-run.js';
import { isNoAnalysis, NoAnalysisYet } from '../../pages/components/analysis-error.js';
import { pageDetailHref } from '../../pages/components/format.js';
import { FindingLegend } from '../../pages/components/finding-legend.js';
import { useGraph } from '../api/get-graph.js';
import { GraphCanvas } from '../components/graph-canvas.js';
import { MapToolbar } from '../components/map-toolbar.js';
import { MapNodeList } from '../components/map-node-list.js';
import { findNode, mapElements } from '../components/map-model.js';

// Force-directed (cytoscape's built-in CoSE); no animation, so large maps settle before the first paint.
const LAYOUT = { name: 'cose', animate: false, nodeDimensionsIncludeLabels: true, padding: 24 } as LayoutOptions;

export default function LinkMapRoute() {
  const { docSetId = '' } = useParams();
  const navigate = useNavigate();
  const [state, setState] = useUrlState({ run: 'latest', folder: '', folderDepth: 1, limit: 300 });
  const runId = state.run || 'latest';
  const run = useRun(docSetId, runId);
  const graph = useGraph(docSetId, runId, { folder: state.folder, folderDepth: state.folderDepth, limit: state.limit });
  const [highlight, setHighlight] = useState<string | null>(null);
  const [view, setView] = useState<'picture' | 'list'>('picture');
  const elements = useMemo(() => (graph.data ? (mapElements(graph.data) as ElementDefinition[]) : []), [graph.data]);
  const nodes = graph.data?.nodes ?? [];
  const open = (id: string) => {
    const node = nodes.find((n) => n.id === id);
    if (!node) return;
    if (node.pageCount != null) setState({ folder: node.path });
    else navigate(pageDetailHref(docSetId, node.path, runId));
  };

  const header = (
    <PageHeader
      title="Link map"
      subtitle="The doc set's link graph. Large doc sets start with one circle per folder; click a folder to open it, a page to see its detail."
    />
  );
  if (run.error && isNoAnalysis(run.error))
    return (
      <>
        {header}
        <NoAnalysisYet docSetId={docSetId} />
      </>
    );
  let body;
  if (graph.isLoading) body = <LoadingSkeleton variant="chart" />;
  else if (graph.error && isNoAnalysis(graph.error)) {
    body = (
      <Alert severity="info" variant="outlined">
        <AlertTitle>The link map is not available yet</AlertTitle>
        This server does not draw link maps yet. Meanwhile, each page's detail shows its neighbourhood picture, and the Pages list sorts by
        score.
      </Alert>
    );
  } else if (graph.error) body = <ErrorPanel error={graph.error} onRetry={() => graph.refetch()} />;
  else if (nodes.length === 0)
    body = <EmptyState title="Nothing to draw here" hint="This folder holds no pages. Go back up with the breadcrumb." />;
  else {
    body = (
      <Stack spacing={1.5}>
        {nodes.length >= state.limit && (
          <Alert severity="warning" variant="outlined">
            The map shows the {state.limit} highest-scored {graph.data?.level === 'folders' ? 'folders' : 'pages'} only. Open a folder, or
            raise "Most nodes", to see more.
          </Alert>
        )}
        <Stack direction="row" sx={{ alignItems: 'center', gap: 2 }}>
          <Typography variant="body2" color="text.secondary" sx={{ flex: 1 }}>
            {nodes.length} {graph.data?.level === 'folders' ? 'folders' : 'pages'}
            {state.folder ? ` in ${state.folder}` : ''}. Drag to pan, scroll or use the buttons to zoom.
          </Typography>
          <ToggleButtonGroup size="small" exclusive value={view} onChange={(_, v) => v && setView(v)} aria-label="Show the map as">
            <ToggleButton value="picture">Picture</ToggleButton>
            <ToggleButton value="list">List</ToggleButton>
          </ToggleButtonGroup>
        </Stack>
        {view === 'picture' ? (
          <>
            <GraphCanvas
              elements={elements}
              layout={LAYOUT}
              onNodeOpen={open}
              highlightId={highlight}
              height={620}
              label={`Link map of ${nodes.length} nodes; the List view holds the same nodes`}
            />
            <FindingLegend
              sizeNote={
                graph.data?.level === 'folders'
                  ? 'Larger circles hold more stationary score; thicker lines carry more links.'
                  : 'Larger circles have a higher stationary score.'
              }
            />
          </>
        ) : (
          <Paper variant="outlined">
            <MapNodeList nodes={nodes} docSetId={docSetId} runId={runId} onOpenFolder={(folder) => setState({ folder })} />
          </Paper>
        )}
      </Stack>
    );
  }
  return (
    <>
      {header}
      <MapToolbar
        folder={state.folder}
        folderDepth={state.folderDepth}
        limit={state.limit}
        onChange={(patch) => {
          setHighlight(null);
          setState(patch);
        }}
        onFind={(words) => {
          const node = findNode(nodes, words);
          setHighlight(node?.id ?? null);
          if (node) setView('picture');
          return node !== null;
        }}
      />
      {body}
    </>
  );
}
