import { Chip, Stack } from '@mui/material';
import { type PageFlag } from '@linkloom/shared';
import { FLAG_STYLES } from './finding-colours.js';

/** The finding flags of one page as small coloured chips; nothing when the page has none. */
export function FlagChips({ flags }: { flags: PageFlag[] }) {
  if (flags.length === 0) return null;
  return (
    <Stack direction="row" spacing={0.5} sx={{ flexWrap: 'wrap', rowGap: 0.5 }}>
      {flags.map((flag) => (
        <Chip
          key={flag}
          size="small"
          label={FLAG_STYLES[flag].label}
          variant="outlined"
          sx={{ borderColor: FLAG_STYLES[flag].colour, color: 'text.primary', height: 22 }}
        />
      ))}
    </Stack>
  );
}
