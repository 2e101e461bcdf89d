import { Typography } from '@mui/material';
import { ErrorPanel } from '../../../components/ui/error-panel.js';

/** Each switch saves at once; this line says whether the last one arrived. */
export function SaveState({ pending, error }: { pending: boolean; error: unknown }) {
  if (error) return <ErrorPanel error={error} title="Your choice was not saved" />;
  return (
    <Typography variant="body2" color="text.secondary" role="status">
      {pending ? 'Saving…' : 'All choices saved.'}
    </Typography>
  );
}
