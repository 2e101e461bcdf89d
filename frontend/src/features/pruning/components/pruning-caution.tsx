import { Alert, AlertTitle } from '@mui/material';

/** Shown on the pruning screen at all times: Linkloom proposes, people decide, and deletion happens elsewhere. */
export function PruningCaution() {
  return (
    <Alert severity="warning" sx={{ mb: 2 }} role="note" aria-label="About pruning">
      <AlertTitle>Linkloom never deletes documentation</AlertTitle>
      This list only records your team’s decisions. Approved pages are exported for your own deletion process. Before removing anything,
      check your organisation’s records-retention and compliance rules: some pages must be kept, archived or handed over rather than
      deleted.
    </Alert>
  );
}
