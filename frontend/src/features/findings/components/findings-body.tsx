import { Box, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import type { RunCounts } from '@linkloom/shared';
import type { FindingsTableState } from './findings-table-props.js';
import type { FindingsView, SubKind } from './findings-views.js';
import { IslandsList } from './islands-list.js';
import { LinkFindingsTable } from './link-findings-table.js';
import { LinkTargetTable } from './link-target-table.js';
import { PageFindingsTable } from './page-findings-table.js';

export type LinkGrouping = 'page' | 'target';

interface FindingsBodyProps {
  docSetId: string;
  runId: string;
  view: FindingsView;
  kind: SubKind;
  counts: RunCounts | null | undefined;
  grouping: LinkGrouping;
  table: FindingsTableState;
  onKindChange: (kind: string) => void;
  onGroupingChange: (grouping: LinkGrouping) => void;
}

/** The need, the sub-kind and grouping toggles, then the list that fits the view. */
export function FindingsBody({ docSetId, runId, view, kind, counts, grouping, table, onKindChange, onGroupingChange }: FindingsBodyProps) {
  const label = `${view.label}: ${kind.label}`;
  const props = { docSetId, runId, kind, table, label };
  // Grouping by missing target makes sense only where a target is missing.
  const canGroup = view.id === 'broken-links';
  return (
    <Box sx={{ minWidth: 0 }}>
      <Typography variant="h2" sx={{ mb: 0.5 }}>
        {view.label}
      </Typography>
      <Typography variant="body2" color="text.secondary" sx={{ mb: 2 }}>
        {view.need}
      </Typography>
      <Box sx={{ display: 'flex', gap: 2, flexWrap: 'wrap', mb: 2 }}>
        {view.kinds.length > 1 && (
          <ToggleButtonGroup size="small" exclusive value={kind.id} onChange={(_, v) => v && onKindChange(v)} aria-label="Which finding">
            {view.kinds.map((k) => (
              <ToggleButton key={k.id} value={k.id}>
                {k.label}
                {counts ? ` (${k.count(counts)})` : ''}
              </ToggleButton>
            ))}
          </ToggleButtonGroup>
        )}
        {canGroup && (
          <ToggleButtonGroup size="small" exclusive value={grouping} onChange={(_, v) => v && onGroupingChange(v)} aria-label="Group links">
            <ToggleButton value="page">By page</ToggleButton>
            <ToggleButton value="target">By missing target</ToggleButton>
          </ToggleButtonGroup>
        )}
      </Box>
      {view.source === 'islands' && <IslandsList docSetId={docSetId} runId={runId} />}
      {view.source === 'pages' && <PageFindingsTable key={kind.id} {...props} />}
      {view.source === 'links' &&
        (canGroup && grouping === 'target' ? <LinkTargetTable key={kind.id} {...props} /> : <LinkFindingsTable key={kind.id} {...props} />)}
    </Box>
  );
}
