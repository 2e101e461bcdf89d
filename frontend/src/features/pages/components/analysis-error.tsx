import { Button } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { ApiError } from '../../../lib/api-client.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { ErrorPanel } from '../../../components/ui/error-panel.js';

/** A 404 for a run means no finished analysis yet, which is a next step, not an error. */
export function isNoAnalysis(error: unknown): boolean {
  return error instanceof ApiError && error.status === 404;
}

export function NoAnalysisYet({ docSetId }: { docSetId: string }) {
  return (
    <EmptyState
      title="No analysis yet"
      hint="Upload an archive of your Markdown on the Overview; the first analysis starts as soon as the import finishes."
      action={
        <Button variant="outlined" component={RouterLink} to={`/doc-sets/${encodeURIComponent(docSetId)}`}>
          Go to the Overview
        </Button>
      }
    />
  );
}

/** The error of a per-run query: the empty state for "no run yet", else the error panel with Retry. */
export function AnalysisError({ docSetId, error, onRetry }: { docSetId: string; error: unknown; onRetry: () => void }) {
  if (isNoAnalysis(error)) return <NoAnalysisYet docSetId={docSetId} />;
  return <ErrorPanel error={error} onRetry={onRetry} />;
}
