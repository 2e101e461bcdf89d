import { Button, Link, Table, TableBody, TableCell, TableHead, TableRow } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { formatScore, pageDetailHref } from '../../pages/components/format.js';
import type { LinkMapNode } from '@linkloom/shared';

/** The map's nodes as a table, highest score first: the same click-through, by keyboard or screen reader. */
export function MapNodeList({
  nodes,
  docSetId,
  runId,
  onOpenFolder,
}: {
  nodes: LinkMapNode[];
  docSetId: string;
  runId: string;
  onOpenFolder: (path: string) => void;
}) {
  const sorted = [...nodes].sort((a, b) => b.stationaryScore - a.stationaryScore);
  return (
    <Table size="small" aria-label="Nodes of the link map">
      <TableHead>
        <TableRow>
          <TableCell>Page or folder</TableCell>
          <TableCell align="right">Pages</TableCell>
          <TableCell align="right">Score</TableCell>
          <TableCell>Findings</TableCell>
        </TableRow>
      </TableHead>
      <TableBody>
        {sorted.map((n) => (
          <TableRow key={n.id}>
            <TableCell>
              {n.pageCount != null ? (
                <Button size="small" onClick={() => onOpenFolder(n.path)}>
                  {n.label}/
                </Button>
              ) : (
                <Link component={RouterLink} to={pageDetailHref(docSetId, n.path, runId)}>
                  {n.label}
                </Link>
              )}
            </TableCell>
            <TableCell align="right">{n.pageCount ?? 1}</TableCell>
            <TableCell align="right">{formatScore(n.stationaryScore)}</TableCell>
            <TableCell>{n.flags.join(', ')}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
