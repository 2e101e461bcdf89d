import { Box, Card, CardContent, Paper, Table, TableBody, TableCell, TableRow, Typography } from '@mui/material';
import { pageFlags, type PageDetail } from '@linkloom/shared';
import { FlagChips } from './flag-chips.js';
import { formatCount, formatScore, formatTimesAverage } from './format.js';

/** A labelled figure; the shared StatCard formats integers only, and scores are small fractions. */
function Metric({ label, value, hint }: { label: string; value: string; hint?: string }) {
  return (
    <Card>
      <CardContent>
        <Typography variant="body2" color="text.secondary" component="h3">
          {label}
        </Typography>
        <Typography variant="h4" component="p" sx={{ fontWeight: 500, my: 0.5 }}>
          {value}
        </Typography>
        {hint && (
          <Typography variant="caption" color="text.secondary">
            {hint}
          </Typography>
        )}
      </CardContent>
    </Card>
  );
}

function frontMatterValue(value: unknown): string {
  if (value == null) return '';
  if (typeof value === 'string') return value;
  if (Array.isArray(value) && value.every((v) => typeof v !== 'object')) return value.join(', ');
  return JSON.stringify(value);
}

/** The page's own front matter as written (`raw`), not the fields Linkloom derived from it. */
function frontMatterEntries(frontMatter: PageDetail['frontMatter']): [string, unknown][] {
  const fields = (frontMatter ?? {}) as Record<string, unknown>;
  const raw = fields.raw;
  const source = raw && typeof raw === 'object' && !Array.isArray(raw) ? (raw as Record<string, unknown>) : fields;
  return Object.entries(source);
}

function headingText(h: NonNullable<PageDetail['headings']>[number]): string {
  return typeof h === 'string' ? h : `${'  '.repeat(Math.max(0, (h.depth ?? 1) - 1))}${h.text ?? h.slug ?? ''}`;
}

/** Scores and counts as cards, then front matter and headings. */
export function PageSummary({ page }: { page: PageDetail }) {
  const frontMatter = frontMatterEntries(page.frontMatter);
  return (
    <Box sx={{ display: 'grid', gap: 2 }}>
      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: 'repeat(auto-fill, minmax(160px, 1fr))' }}>
        <Metric label="Stationary score" value={formatScore(page.stationaryScore)} hint="Share of a random reader's visits" />
        <Metric label="Times the average" value={formatTimesAverage(page.timesAverage)} />
        <Metric label="Rank" value={formatCount(page.rank)} hint="1 is the highest score" />
        <Metric label="Inbound pages" value={formatCount(page.inboundCount)} />
        <Metric label="Outbound pages" value={formatCount(page.outboundCount)} />
        <Metric
          label="Click depth"
          value={formatCount(page.depth)}
          hint={page.reachable ? undefined : 'Not reachable from an entry page'}
        />
        <Metric label="Words" value={formatCount(page.wordCount)} />
      </Box>
      <FlagChips flags={pageFlags(page)} />
      <Box sx={{ display: 'grid', gap: 2, gridTemplateColumns: { xs: '1fr', lg: '1fr 1fr' } }}>
        <Paper variant="outlined" sx={{ p: 2 }} component="section" aria-labelledby="front-matter-title">
          <Typography id="front-matter-title" variant="h3" component="h2" gutterBottom>
            Front matter
          </Typography>
          {frontMatter.length === 0 ? (
            <Typography variant="body2" color="text.secondary">
              This page has no front matter.
            </Typography>
          ) : (
            <Table size="small" aria-labelledby="front-matter-title">
              <TableBody>
                {frontMatter.map(([key, value]) => (
                  <TableRow key={key}>
                    <TableCell component="th" scope="row" sx={{ width: '30%' }}>
                      {key}
                    </TableCell>
                    <TableCell sx={{ wordBreak: 'break-word' }}>{frontMatterValue(value)}</TableCell>
                  </TableRow>
                ))}
              </TableBody>
            </Table>
          )}
        </Paper>
        <Paper variant="outlined" sx={{ p: 2 }} component="section" aria-labelledby="headings-title">
          <Typography id="headings-title" variant="h3" component="h2" gutterBottom>
            Headings
          </Typography>
          {(page.headings ?? []).length === 0 ? (
            <Typography variant="body2" color="text.secondary">
              No headings.
            </Typography>
          ) : (
            <Box component="pre" sx={{ m: 0, fontFamily: 'inherit', fontSize: '0.875rem', whiteSpace: 'pre-wrap' }}>
              {(page.headings ?? []).map(headingText).join('\n')}
            </Box>
          )}
        </Paper>
      </Box>
    </Box>
  );
}
