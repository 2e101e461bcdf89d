import { Link as RouterLink } from 'react-router';
import { Chip, Link, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { EmptyState } from '../../../components/ui/empty-state.js';
import type { ScheduleStatus } from '@linkloom/shared';

/** Which doc sets the nightly job covers, and how: a server folder is re-read, else the latest snapshot re-analysed. */
export function NightlyDocSets({ docSets }: { docSets: ScheduleStatus['docSets'] }) {
  if (docSets.length === 0) {
    return (
      <Paper variant="outlined">
        <EmptyState title="No doc sets yet" hint="Create a doc set on the Doc sets page; then turn on nightly runs in its settings." />
      </Paper>
    );
  }
  return (
    <Paper variant="outlined">
      <Typography variant="h3" component="h2" sx={{ p: 2, pb: 0 }}>
        Doc sets
      </Typography>
      <Table size="small" aria-label="Doc sets and nightly runs">
        <TableHead>
          <TableRow>
            <TableCell>Doc set</TableCell>
            <TableCell>Nightly</TableCell>
            <TableCell>Server folder</TableCell>
            <TableCell>Settings</TableCell>
          </TableRow>
        </TableHead>
        <TableBody>
          {docSets.map((d) => (
            <TableRow key={d.id}>
              <TableCell>{d.name}</TableCell>
              <TableCell>
                <Chip size="small" label={d.nightly ? 'on' : 'off'} color={d.nightly ? 'success' : 'default'} variant="outlined" />
              </TableCell>
              <TableCell>
                {d.sourceFolder ? (
                  <code>{d.sourceFolder}</code>
                ) : (
                  <Typography variant="body2" color="text.secondary">
                    none: the latest snapshot is re-analysed
                  </Typography>
                )}
              </TableCell>
              <TableCell>
                <Link component={RouterLink} to={`/doc-sets/${encodeURIComponent(d.id)}/settings`}>
                  Change
                </Link>
              </TableCell>
            </TableRow>
          ))}
        </TableBody>
      </Table>
    </Paper>
  );
}
