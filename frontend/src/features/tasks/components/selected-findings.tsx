import { List, ListItem, ListItemText, Typography } from '@mui/material';
import type { TaskRequest } from './task-labels.js';

const SHOWN = 8;

/** How many rows were selected: links when links were selected, else pages. */
export const selectionSize = (request: TaskRequest) => request.links?.length || request.pagePaths.length;

/** The selected rows, so the editor sees exactly what the tasks will hold. */
export function SelectedFindings({ request }: { request: TaskRequest }) {
  const rows = request.links?.length
    ? request.links.map((l) => ({
        key: `${l.sourcePath}:${l.line}:${l.href}`,
        primary: l.href,
        secondary: `${l.sourcePath}, line ${l.line}`,
      }))
    : request.pagePaths.map((p) => ({ key: p, primary: p, secondary: undefined }));
  return (
    <div>
      <Typography variant="body2" color="text.secondary">
        {rows.length === 1
          ? 'The task holds this finding; the latest run checks it.'
          : `The tasks hold exactly these ${rows.length} findings.`}
      </Typography>
      <List dense aria-label="Selected findings" sx={{ maxHeight: 200, overflow: 'auto' }}>
        {rows.slice(0, SHOWN).map((r) => (
          <ListItem key={r.key} disableGutters>
            <ListItemText primary={r.primary} secondary={r.secondary} slotProps={{ primary: { sx: { wordBreak: 'break-all' } } }} />
          </ListItem>
        ))}
        {rows.length > SHOWN && (
          <ListItem disableGutters>
            <ListItemText secondary={`and ${rows.length - SHOWN} more`} />
          </ListItem>
        )}
      </List>
    </div>
  );
}
