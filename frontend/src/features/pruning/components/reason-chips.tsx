import { Chip, Stack, Tooltip } from '@mui/material';
import type { PruningReason } from '@linkloom/shared';
import { RULE_LABELS } from './pruning-labels.js';

/** The rules a candidate met; each chip's tooltip (and accessible name) gives the value and the threshold. */
export function ReasonChips({ reasons }: { reasons: PruningReason[] }) {
  if (reasons.length === 0) return <span>—</span>;
  return (
    <Stack direction="row" spacing={0.5} sx={{ flexWrap: 'wrap', rowGap: 0.5 }}>
      {reasons.map((r, i) => (
        <Tooltip key={`${r.rule}-${i}`} title={r.detail}>
          <Chip
            size="small"
            variant={r.rule === 'nominated' ? 'filled' : 'outlined'}
            label={RULE_LABELS[r.rule]}
            aria-label={`${RULE_LABELS[r.rule]}: ${r.detail}`}
          />
        </Tooltip>
      ))}
    </Stack>
  );
}
