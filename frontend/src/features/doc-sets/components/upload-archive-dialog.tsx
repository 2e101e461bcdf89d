import { useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { Alert, Box, Button, Dialog, DialogActions, DialogContent, DialogTitle, LinearProgress, Typography } from '@mui/material';
import { errorMessage } from '../../../lib/api-client.js';
import { useUploadArchive } from '../api/upload-archive.js';
import { useSnapshot } from '../api/get-snapshot.js';
import { isSnapshotBusy } from '../api/get-snapshots.js';
import { docSetQueryKey } from '../api/get-doc-set.js';
import { ArchiveDropZone } from './archive-drop-zone.js';
import { ImportReport } from './import-report.js';

const MAX_BYTES = 512 * 1024 * 1024;

/** Upload (real XHR progress) -> import (server progress) -> report, in one dialog. */
export function UploadArchiveDialog({ docSetId, open, onClose }: { docSetId: string; open: boolean; onClose: () => void }) {
  const [sent, setSent] = useState(0);
  const [problem, setProblem] = useState<string | null>(null);
  const [snapshotId, setSnapshotId] = useState<string | null>(null);
  const upload = useUploadArchive(docSetId, setSent);
  const snapshot = useSnapshot(docSetId, snapshotId);
  const queryClient = useQueryClient();

  const start = (file: File) => {
    if (!/\.zip$/i.test(file.name)) return setProblem('Linkloom reads .zip archives. Zip the folder holding your Markdown and try again.');
    if (file.size > MAX_BYTES) return setProblem('This archive is over 512 MB. Leave out build output and large media, then try again.');
    setProblem(null);
    setSent(0);
    upload.mutate(file, {
      onSuccess: ({ snapshot: s }) => setSnapshotId(s.id),
      onError: (error) => setProblem(errorMessage(error)),
    });
  };

  const close = () => {
    if (snapshotId) void queryClient.invalidateQueries({ queryKey: docSetQueryKey(docSetId) });
    setSnapshotId(null);
    setProblem(null);
    upload.reset();
    onClose();
  };

  const s = snapshot.data;
  const importing = Boolean(snapshotId) && (!s || isSnapshotBusy(s));
  const total = s?.progress?.total ?? 0;
  return (
    <Dialog open={open} onClose={upload.isPending ? undefined : close} fullWidth maxWidth="sm">
      <DialogTitle>Upload archive</DialogTitle>
      <DialogContent>
        {problem && (
          <Alert severity="error" sx={{ mb: 2 }}>
            {problem}
          </Alert>
        )}
        {!upload.isPending && !snapshotId && <ArchiveDropZone onFile={start} />}
        {upload.isPending && (
          <Box>
            <Typography gutterBottom>Uploading… {Math.round(sent * 100)}%</Typography>
            <LinearProgress variant="determinate" value={sent * 100} aria-label="Upload progress" />
          </Box>
        )}
        {importing && (
          <Box>
            <Typography gutterBottom>Importing… {total ? `${s!.progress.done} of ${total} files` : 'unpacking the archive'}</Typography>
            <LinearProgress
              variant={total ? 'determinate' : 'indeterminate'}
              value={total ? (s!.progress.done / total) * 100 : undefined}
              aria-label="Import progress"
            />
          </Box>
        )}
        {snapshot.isError && <Alert severity="error">{errorMessage(snapshot.error)}</Alert>}
        {s && !isSnapshotBusy(s) && <ImportReport snapshot={s} />}
      </DialogContent>
      <DialogActions>
        <Button onClick={close} disabled={upload.isPending}>
          {s && !isSnapshotBusy(s) ? 'Done' : importing ? 'Close (import continues)' : 'Cancel'}
        </Button>
      </DialogActions>
    </Dialog>
  );
}
