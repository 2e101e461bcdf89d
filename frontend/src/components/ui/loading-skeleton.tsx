import { Box, Skeleton, Stack } from '@mui/material';

interface LoadingSkeletonProps {
  /** `cards` for a grid of stat cards, `lines` for text/table rows. */
  variant?: 'lines' | 'cards' | 'chart';
  count?: number;
}

export function LoadingSkeleton({ variant = 'lines', count = 5 }: LoadingSkeletonProps) {
  if (variant === 'cards') {
    return (
      <Box
        aria-busy="true"
        aria-label="Loading"
        sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'repeat(auto-fill, minmax(200px, 1fr))' }}
      >
        {Array.from({ length: count }, (_, i) => (
          <Skeleton key={i} variant="rounded" height={96} />
        ))}
      </Box>
    );
  }
  if (variant === 'chart') return <Skeleton aria-busy="true" aria-label="Loading" variant="rounded" height={240} />;
  return (
    <Stack aria-busy="true" aria-label="Loading" spacing={1}>
      {Array.from({ length: count }, (_, i) => (
        <Skeleton key={i} variant="text" height={28} />
      ))}
    </Stack>
  );
}
