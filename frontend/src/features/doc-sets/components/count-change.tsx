import { Typography } from '@mui/material';
import { changeTone } from '../../../components/ui/stat-card.js';

const nf = new Intl.NumberFormat();

/** A count with a small signed change, coloured by whether a rise is good news. */
export function CountChange({
  label,
  value,
  previous,
  upIs,
}: {
  label: string;
  value: number;
  previous?: number | null;
  upIs: 'better' | 'worse';
}) {
  const change = previous == null ? null : value - previous;
  return (
    <div>
      <Typography variant="caption" color="text.secondary" component="div">
        {label}
      </Typography>
      <Typography variant="h3" component="div">
        {nf.format(value)}
        {change !== null && change !== 0 && (
          <Typography component="span" variant="caption" sx={{ ml: 0.5, color: changeTone(change, upIs) }}>
            {change > 0 ? '+' : '−'}
            {nf.format(Math.abs(change))}
          </Typography>
        )}
      </Typography>
    </div>
  );
}
