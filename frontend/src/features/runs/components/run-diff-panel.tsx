import { Box, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { ErrorPanel } from '../../../components/ui/error-panel.js';
import { LoadingSkeleton } from '../../../components/ui/loading-skeleton.js';
import { useRunDiff, type FindingChange } from '../api/get-run-diff.js';

const KIND_WORDS: Record<FindingChange['kind'], string> = {
  pages: 'Pages added or removed',
  brokenLinks: 'Broken links',
  brokenAnchors: 'Broken anchors',
  unsafeLinks: 'Unsafe links',
  ambiguousLinks: 'Ambiguous links',
  orphans: 'Orphan pages',
  deadEnds: 'Dead ends',
  unreachable: 'Unreachable pages',
  deepPages: 'Deep pages',
  islandPages: 'Pages on islands',
};

/** A page finding names the page; a link finding the page it is on and the href as written. */
function describe(item: FindingChange['appeared'][number]): string {
  return 'href' in item ? `${item.sourcePath} → ${item.href}` : item.path;
}

function KindRow({ change }: { change: FindingChange }) {
  const sample = (items: FindingChange['appeared'], total: number) =>
    items.slice(0, 5).map(describe).join(', ') + (total > 5 ? ` and ${total - Math.min(5, items.length)} more` : '');
  return (
    <TableRow>
      <TableCell>{KIND_WORDS[change.kind]}</TableCell>
      <TableCell align="right" sx={{ color: change.appearedTotal ? 'error.main' : undefined }}>
        +{change.appearedTotal}
      </TableCell>
      <TableCell align="right" sx={{ color: change.disappearedTotal ? 'success.main' : undefined }}>
        −{change.disappearedTotal}
      </TableCell>
      <TableCell sx={{ fontSize: 12, color: 'text.secondary' }}>
        {change.appearedTotal > 0 && <div>New: {sample(change.appeared, change.appearedTotal)}</div>}
        {change.disappearedTotal > 0 && <div>Fixed or gone: {sample(change.disappeared, change.disappearedTotal)}</div>}
      </TableCell>
    </TableRow>
  );
}

export function RunDiffPanel({ docSetId, runId, againstId }: { docSetId: string; runId: string; againstId: string }) {
  const diff = useRunDiff(docSetId, runId, againstId);
  return (
    <Paper variant="outlined" sx={{ p: 2 }}>
      <Typography variant="h3" component="h2" gutterBottom>
        What changed between the two runs
      </Typography>
      {diff.isLoading && <LoadingSkeleton count={6} />}
      {diff.isError && <ErrorPanel error={diff.error} onRetry={() => diff.refetch()} />}
      {diff.data && (
        <Box sx={{ display: 'grid', gap: 3, gridTemplateColumns: { xs: '1fr', lg: '3fr 2fr' } }}>
          <Table size="small" aria-label="Findings that appeared and disappeared">
            <TableHead>
              <TableRow>
                <TableCell>Finding</TableCell>
                <TableCell align="right">Appeared</TableCell>
                <TableCell align="right">Disappeared</TableCell>
                <TableCell>Examples</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {diff.data.findings.map((c) => (
                <KindRow key={c.kind} change={c} />
              ))}
              {diff.data.findings.length === 0 && (
                <TableRow>
                  <TableCell colSpan={4}>No findings changed.</TableCell>
                </TableRow>
              )}
            </TableBody>
          </Table>
          <Table size="small" aria-label="Largest score moves">
            <TableHead>
              <TableRow>
                <TableCell>Page</TableCell>
                <TableCell align="right">Before</TableCell>
                <TableCell align="right">After</TableCell>
              </TableRow>
            </TableHead>
            <TableBody>
              {diff.data.scoreMoves.slice(0, 15).map((m) => (
                <TableRow key={m.path}>
                  <TableCell>{m.title || m.path}</TableCell>
                  <TableCell align="right">{m.before.toFixed(4)}</TableCell>
                  <TableCell align="right" sx={{ color: m.after >= m.before ? 'success.main' : 'error.main' }}>
                    {m.after.toFixed(4)}
                  </TableCell>
                </TableRow>
              ))}
              {diff.data.scoreMoves.length === 0 && (
                <TableRow>
                  <TableCell colSpan={3}>No page moved noticeably.</TableCell>
                </TableRow>
              )}
            </TableBody>
          </Table>
        </Box>
      )}
    </Paper>
  );
}
