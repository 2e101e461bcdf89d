import type { ReactNode } from 'react';
import { Box, Card, CardContent, Skeleton, Typography } from '@mui/material';
import ArrowUpward from '@mui/icons-material/ArrowUpward';
import ArrowDownward from '@mui/icons-material/ArrowDownward';

interface StatCardProps {
  label: string;
  value: number | null | undefined;
  /** Value in the previous run; omit when there is none. */
  previous?: number | null;
  /** Whether a rise is good news (pages) or bad news (broken links). Decided by the caller. */
  upIs: 'better' | 'worse' | 'neutral';
  hint?: ReactNode;
  loading?: boolean;
  onClick?: () => void;
}

const nf = new Intl.NumberFormat();

export function changeTone(change: number, upIs: StatCardProps['upIs']): 'success.main' | 'error.main' | 'text.secondary' {
  if (change === 0 || upIs === 'neutral') return 'text.secondary';
  const better = change > 0 === (upIs === 'better');
  return better ? 'success.main' : 'error.main';
}

/** A headline count with its change since the previous run. */
export function StatCard({ label, value, previous, upIs, hint, loading, onClick }: StatCardProps) {
  const change = value != null && previous != null ? value - previous : null;
  return (
    <Card sx={{ height: '100%', cursor: onClick ? 'pointer' : undefined }} onClick={onClick}>
      <CardContent>
        <Typography variant="body2" color="text.secondary" component="h3">
          {label}
        </Typography>
        {loading ? (
          <Skeleton width={80} height={40} />
        ) : (
          <Typography variant="h4" component="p" sx={{ fontWeight: 500, my: 0.5 }}>
            {value == null ? '—' : nf.format(value)}
          </Typography>
        )}
        {change !== null && !loading && (
          <Box sx={{ display: 'flex', alignItems: 'center', gap: 0.5, color: changeTone(change, upIs) }}>
            {change > 0 && <ArrowUpward sx={{ fontSize: 16 }} aria-hidden />}
            {change < 0 && <ArrowDownward sx={{ fontSize: 16 }} aria-hidden />}
            <Typography variant="caption">
              {change === 0
                ? 'no change since the previous run'
                : `${change > 0 ? '+' : '−'}${nf.format(Math.abs(change))} since the previous run`}
            </Typography>
          </Box>
        )}
        {hint && (
          <Typography variant="caption" color="text.secondary" component="p" sx={{ mt: 0.5 }}>
            {hint}
          </Typography>
        )}
      </CardContent>
    </Card>
  );
}
