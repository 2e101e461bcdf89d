import { useState, type FormEvent } from 'react';
import {
  Alert,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  FormControlLabel,
  Radio,
  RadioGroup,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { docSetSettingsPatchSchema, type DocSetSettings } from '@linkloom/shared';
import { errorMessage } from '../../../lib/api-client.js';

type Overrides = Pick<DocSetSettings, 'damping' | 'teleport' | 'entryPages' | 'depthThreshold'>;

/** The four overridable settings are checked with the shared patch schema's own rules (all four are given). */
const overridesSchema = docSetSettingsPatchSchema;

export function validateOverrides(input: { damping: string; teleport: string; entryPages: string; depthThreshold: string }) {
  const result = overridesSchema.safeParse({
    damping: input.damping.trim() === '' ? Number.NaN : Number(input.damping),
    teleport: input.teleport,
    entryPages: input.entryPages
      .split(/\r?\n/)
      .map((l) => l.trim())
      .filter(Boolean),
    depthThreshold: input.depthThreshold.trim() === '' ? Number.NaN : Number(input.depthThreshold),
  });
  if (result.success) return { overrides: result.data as Overrides, problem: null };
  const issue = result.error.issues[0];
  return { overrides: null, problem: `${String(issue.path[0] ?? 'settings')}: ${issue.message}` };
}

interface Props {
  open: boolean;
  current: Overrides;
  busy: boolean;
  onClose: () => void;
  onRun: (overrides: Overrides) => Promise<unknown>;
}

/** A one-off run with changed scoring settings; the doc set's saved settings stay as they are. */
export function RunAgainDialog({ open, current, busy, onClose, onRun }: Props) {
  const [damping, setDamping] = useState(String(current.damping));
  const [teleport, setTeleport] = useState<string>(current.teleport);
  const [entryPages, setEntryPages] = useState(current.entryPages.join('\n'));
  const [depthThreshold, setDepthThreshold] = useState(String(current.depthThreshold));
  const [problem, setProblem] = useState<string | null>(null);

  const submit = async (event: FormEvent) => {
    event.preventDefault();
    const { overrides, problem: found } = validateOverrides({ damping, teleport, entryPages, depthThreshold });
    setProblem(found);
    if (!overrides) return;
    try {
      await onRun(overrides);
      onClose();
    } catch (error) {
      setProblem(errorMessage(error));
    }
  };

  return (
    <Dialog open={open} onClose={onClose} fullWidth maxWidth="sm">
      <form noValidate onSubmit={submit} aria-label="Run again with changed settings">
        <DialogTitle>Run again with…</DialogTitle>
        <DialogContent>
          <Stack spacing={2} sx={{ mt: 1 }}>
            <Typography variant="body2" color="text.secondary">
              Try other scoring settings on the latest snapshot. Saved settings do not change.
            </Typography>
            {problem && <Alert severity="error">{problem}</Alert>}
            <TextField
              label="Damping factor"
              type="number"
              value={damping}
              onChange={(e) => setDamping(e.target.value)}
              slotProps={{ htmlInput: { step: 0.01 } }}
              helperText="The chance a reader follows a link rather than jumping elsewhere (between 0 and 1; 0.85 is classic)."
            />
            <RadioGroup value={teleport} onChange={(e) => setTeleport(e.target.value)} aria-label="Where jumps land">
              <FormControlLabel value="uniform" control={<Radio />} label="Jumps land on any page" />
              <FormControlLabel value="entry-pages" control={<Radio />} label="Jumps land on entry pages" />
            </RadioGroup>
            <TextField
              label="Entry pages"
              multiline
              minRows={2}
              value={entryPages}
              onChange={(e) => setEntryPages(e.target.value)}
              helperText="One path per line."
            />
            <TextField
              label="Depth threshold"
              type="number"
              value={depthThreshold}
              onChange={(e) => setDepthThreshold(e.target.value)}
              helperText="Clicks from an entry page beyond which a page counts as deep."
            />
          </Stack>
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={busy}>
            Start run
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}
