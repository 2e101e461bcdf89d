import { Link, Paper, Table, TableBody, TableCell, TableHead, TableRow, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import type { LinkedPage } from '@linkloom/shared';
import { pageDetailHref } from './format.js';

interface LinkedPagesPanelProps {
  title: string;
  /** Whose line number the table shows: the linking page's (inbound) or this page's (outbound). */
  lineOf: string;
  pages: LinkedPage[];
  empty: string;
  docSetId: string;
  runId: string;
}

export function LinkedPagesPanel({ title, lineOf, pages, empty, docSetId, runId }: LinkedPagesPanelProps) {
  return (
    <Paper variant="outlined" sx={{ p: 2 }} component="section" aria-label={title}>
      <Typography variant="h3" component="h2" gutterBottom>
        {title} ({pages.length})
      </Typography>
      {pages.length === 0 ? (
        <Typography variant="body2" color="text.secondary">
          {empty}
        </Typography>
      ) : (
        <Table size="small" aria-label={title}>
          <TableHead>
            <TableRow>
              <TableCell>Page</TableCell>
              <TableCell align="right">Line ({lineOf})</TableCell>
            </TableRow>
          </TableHead>
          <TableBody>
            {pages.map((p, i) => (
              <TableRow key={`${p.path}:${p.line ?? i}`}>
                <TableCell>
                  <Link component={RouterLink} to={pageDetailHref(docSetId, p.path, runId)}>
                    {p.title || p.path}
                  </Link>
                  <Typography variant="caption" color="text.secondary" component="div">
                    {p.path}
                  </Typography>
                </TableCell>
                <TableCell align="right">{p.line ?? '—'}</TableCell>
              </TableRow>
            ))}
          </TableBody>
        </Table>
      )}
    </Paper>
  );
}
