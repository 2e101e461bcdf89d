import { useEffect, useState } from 'react';
import { Box, Chip, InputAdornment, Stack, TextField } from '@mui/material';
import SearchOutlined from '@mui/icons-material/SearchOutlined';
import { PAGE_FLAGS } from '@linkloom/shared';
import { FLAG_STYLES } from './finding-colours.js';
import { toggleFlag, type ExplorerState } from './explorer-state.js';

/** Typing pauses this long before the URL (and so the server) sees the text. */
export const SEARCH_DEBOUNCE_MS = 300;

interface ExplorerFiltersProps {
  state: ExplorerState;
  onChange: (patch: Partial<ExplorerState>) => void;
}

function DebouncedSearch({ value, onChange }: { value: string; onChange: (q: string) => void }) {
  const [text, setText] = useState(value);
  // Back/forward changes the URL under us; follow it.
  useEffect(() => setText(value), [value]);
  useEffect(() => {
    if (text === value) return undefined;
    const timer = window.setTimeout(() => onChange(text), SEARCH_DEBOUNCE_MS);
    return () => window.clearTimeout(timer);
  }, [text, value, onChange]);
  return (
    <TextField
      size="small"
      label="Filter by path or title"
      value={text}
      onChange={(e) => setText(e.target.value)}
      sx={{ minWidth: 260 }}
      slotProps={{
        input: {
          startAdornment: (
            <InputAdornment position="start">
              <SearchOutlined fontSize="small" />
            </InputAdornment>
          ),
        },
      }}
    />
  );
}

function RangeBox({ label, value, onChange, step }: { label: string; value: string; onChange: (v: string) => void; step: string }) {
  const invalid = value.trim() !== '' && !Number.isFinite(Number(value));
  return (
    <TextField
      size="small"
      label={label}
      value={value}
      onChange={(e) => onChange(e.target.value)}
      error={invalid}
      helperText={invalid ? 'Enter a number' : undefined}
      sx={{ width: 120 }}
      slotProps={{ htmlInput: { inputMode: 'decimal', step } }}
    />
  );
}

/** Text filter, finding chips and score/depth ranges; every change lands in the URL. */
export function ExplorerFilters({ state, onChange }: ExplorerFiltersProps) {
  return (
    <Stack spacing={1.5} sx={{ mb: 2 }}>
      <Box sx={{ display: 'flex', gap: 1.5, flexWrap: 'wrap', alignItems: 'flex-start' }}>
        <DebouncedSearch value={state.q} onChange={(q) => onChange({ q })} />
        <RangeBox label="Score from" step="0.0001" value={state.minScore} onChange={(minScore) => onChange({ minScore })} />
        <RangeBox label="Score to" step="0.0001" value={state.maxScore} onChange={(maxScore) => onChange({ maxScore })} />
        <RangeBox label="Depth from" step="1" value={state.minDepth} onChange={(minDepth) => onChange({ minDepth })} />
        <RangeBox label="Depth to" step="1" value={state.maxDepth} onChange={(maxDepth) => onChange({ maxDepth })} />
      </Box>
      <Box role="group" aria-label="Show only pages that are" sx={{ display: 'flex', gap: 1, flexWrap: 'wrap' }}>
        {PAGE_FLAGS.map((flag) => {
          const on = state.flags.includes(flag);
          return (
            <Chip
              key={flag}
              label={FLAG_STYLES[flag].label}
              title={FLAG_STYLES[flag].meaning}
              clickable
              color={on ? 'primary' : 'default'}
              variant={on ? 'filled' : 'outlined'}
              aria-pressed={on}
              onClick={() => onChange({ flags: toggleFlag(state.flags, flag) })}
            />
          );
        })}
      </Box>
    </Stack>
  );
}
