import { Box, Stack, Typography } from '@mui/material';
import { FLAG_STYLES, FOCUS_COLOUR, HEALTHY_COLOUR } from './finding-colours.js';

function Swatch({ colour, label, title }: { colour: string; label: string; title?: string }) {
  return (
    <Stack direction="row" spacing={0.75} sx={{ alignItems: 'center' }} title={title}>
      <Box aria-hidden sx={{ width: 12, height: 12, borderRadius: '50%', bgcolor: colour, flexShrink: 0 }} />
      <Typography variant="caption">{label}</Typography>
    </Stack>
  );
}

/** The key to node colours; `withFocus` adds the centre page of a neighbourhood picture. */
export function FindingLegend({
  withFocus = false,
  sizeNote = 'Larger circles have a higher stationary score.',
}: {
  withFocus?: boolean;
  sizeNote?: string;
}) {
  return (
    <Box component="figure" aria-label="Legend" sx={{ m: 0, display: 'flex', flexWrap: 'wrap', gap: 1.5, alignItems: 'center' }}>
      {withFocus && <Swatch colour={FOCUS_COLOUR} label="This page" />}
      <Swatch colour={HEALTHY_COLOUR} label="No finding" />
      {Object.values(FLAG_STYLES).map((s) => (
        <Swatch key={s.label} colour={s.colour} label={s.label} title={s.meaning} />
      ))}
      <Typography variant="caption" color="text.secondary">
        {sizeNote}
      </Typography>
    </Box>
  );
}
