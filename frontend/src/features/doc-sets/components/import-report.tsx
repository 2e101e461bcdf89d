import { Alert, Box, List, ListItem, ListItemText, Typography } from '@mui/material';
import type { Snapshot } from '@linkloom/shared';

/** What an import found, with each warning named by file so a writer can fix it. */
export function ImportReport({ snapshot }: { snapshot: Snapshot }) {
  if (snapshot.status === 'failed') {
    return <Alert severity="error">The import failed: {snapshot.error ?? 'no reason given'}. Fix the archive and upload it again.</Alert>;
  }
  const warnings = snapshot.warnings ?? [];
  return (
    <Box>
      <Alert severity={warnings.length ? 'warning' : 'success'} sx={{ mb: 1 }}>
        Imported {snapshot.pageCount ?? 0} pages, {snapshot.linkCount ?? 0} links and {snapshot.assetCount ?? 0} other files.
        {warnings.length ? ` ${warnings.length} files need a look.` : ' Nothing needed attention.'} The analysis starts on its own.
      </Alert>
      {warnings.length > 0 && (
        <>
          <Typography variant="subtitle2">Warnings</Typography>
          <List dense sx={{ maxHeight: 240, overflow: 'auto' }}>
            {warnings.map((w, i) => (
              <ListItem key={`${w.path}-${i}`} disableGutters>
                <ListItemText primary={w.path} secondary={`${w.message} (${w.code})`} />
              </ListItem>
            ))}
          </List>
        </>
      )}
    </Box>
  );
}
