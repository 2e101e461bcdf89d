import { Switch, Table, TableBody, TableCell, TableHead, TableRow } from '@mui/material';
import type { DocSetNotification } from '@linkloom/shared';

export type DocSetChoice = Partial<Pick<DocSetNotification, 'digest' | 'nothingChanged' | 'pruningWaiting'>>;

interface Props {
  docSets: DocSetNotification[];
  /** Only people who decide on the pruning list are offered its mail. */
  showPruning: boolean;
  onChange: (docSetId: string, change: DocSetChoice) => void;
}

/** Per doc set: its digest (also when nothing changed) and, for editors, its pruning-list mail. */
export function DocSetChoicesTable({ docSets, showPruning, onChange }: Props) {
  return (
    <Table size="small" aria-label="E-mail per doc set">
      <TableHead>
        <TableRow>
          <TableCell>Doc set</TableCell>
          <TableCell>Digest</TableCell>
          <TableCell>Also when nothing changed</TableCell>
          {showPruning && <TableCell>Pruning list waiting</TableCell>}
        </TableRow>
      </TableHead>
      <TableBody>
        {docSets.map((d) => (
          <TableRow key={d.docSetId}>
            <TableCell>{d.docSetName}</TableCell>
            <TableCell>
              <Switch
                checked={d.digest}
                onChange={(e) => onChange(d.docSetId, { digest: e.target.checked })}
                slotProps={{ input: { 'aria-label': `Digest for ${d.docSetName}` } }}
              />
            </TableCell>
            <TableCell>
              <Switch
                checked={d.digest && d.nothingChanged}
                disabled={!d.digest}
                onChange={(e) => onChange(d.docSetId, { nothingChanged: e.target.checked })}
                slotProps={{ input: { 'aria-label': `Also when nothing changed for ${d.docSetName}` } }}
              />
            </TableCell>
            {showPruning && (
              <TableCell>
                <Switch
                  checked={d.pruningWaiting}
                  onChange={(e) => onChange(d.docSetId, { pruningWaiting: e.target.checked })}
                  slotProps={{ input: { 'aria-label': `Pruning list waiting for ${d.docSetName}` } }}
                />
              </TableCell>
            )}
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
