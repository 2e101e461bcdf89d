import { Chip } from '@mui/material';

const TONES: Record<string, 'default' | 'success' | 'error' | 'warning' | 'info'> = {
  ready: 'success',
  finished: 'success',
  failed: 'error',
  importing: 'info',
  running: 'info',
  received: 'default',
  queued: 'default',
};

const WORDS: Record<string, string> = {
  received: 'received',
  importing: 'importing',
  ready: 'imported',
  failed: 'failed',
  queued: 'waiting',
  running: 'analysing',
  finished: 'finished',
};

export function StatusChip({ status }: { status: string }) {
  return <Chip size="small" variant="outlined" color={TONES[status] ?? 'default'} label={WORDS[status] ?? status} />;
}
