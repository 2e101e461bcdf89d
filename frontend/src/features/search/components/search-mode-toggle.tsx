import { Box, ToggleButton, ToggleButtonGroup, Typography } from '@mui/material';
import type { SearchMode } from '@linkloom/shared';

export const MODE_HELP: Record<SearchMode, { label: string; sentence: string }> = {
  blend: {
    label: 'Blend: text match and link score',
    sentence: 'Ranks every matching page by how well its text matches, lifted by how central the page is in the link graph.',
  },
  subgraph: {
    label: 'Link score among matches',
    sentence: 'Keeps only the matching pages and ranks them by the stationary score computed on the links among those pages alone.',
  },
};

export function SearchModeToggle({ mode, onChange }: { mode: SearchMode; onChange: (mode: SearchMode) => void }) {
  return (
    <Box>
      <ToggleButtonGroup size="small" exclusive value={mode} onChange={(_, v) => v && onChange(v)} aria-label="Ranking">
        {(Object.keys(MODE_HELP) as SearchMode[]).map((m) => (
          <ToggleButton key={m} value={m}>
            {MODE_HELP[m].label}
          </ToggleButton>
        ))}
      </ToggleButtonGroup>
      <Box component="ul" sx={{ m: 0, mt: 1, pl: 2.5 }}>
        {(Object.keys(MODE_HELP) as SearchMode[]).map((m) => (
          <Typography key={m} component="li" variant="body2" color={m === mode ? 'text.primary' : 'text.secondary'}>
            <strong>{MODE_HELP[m].label}</strong>: {MODE_HELP[m].sentence}
          </Typography>
        ))}
      </Box>
    </Box>
  );
}
