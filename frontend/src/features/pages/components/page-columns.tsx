import type { ColumnDef } from '@tanstack/react-table';
import { Box, Link, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { pageFlags, type RunPageItem } from '@linkloom/shared';
import { FlagChips } from './flag-chips.js';
import { formatCount, formatScore, formatTimesAverage, pageDetailHref } from './format.js';

const number = (id: keyof RunPageItem, header: string, format: (v: number) => string = formatCount): ColumnDef<RunPageItem> => ({
  id,
  header,
  accessorKey: id,
  cell: ({ getValue }) => format(getValue() as number),
  meta: { align: 'right', sortDescFirst: true },
});

/** The explorer's columns; each sortable column's id is its API sort key. */
export function pageColumns(docSetId: string, runId: string): ColumnDef<RunPageItem>[] {
  return [
    {
      id: 'title',
      header: 'Page',
      accessorKey: 'title',
      enableHiding: false,
      cell: ({ row }) => (
        <Box sx={{ minWidth: 220, maxWidth: 420 }}>
          <Link component={RouterLink} to={pageDetailHref(docSetId, row.original.path, runId)} onClick={(e) => e.stopPropagation()}>
            {row.original.title || row.original.path}
          </Link>
          <Typography variant="caption" color="text.secondary" component="div" sx={{ wordBreak: 'break-all' }}>
            {row.original.path}
          </Typography>
        </Box>
      ),
    },
    number('stationaryScore', 'Score', formatScore),
    number('timesAverage', '× average', formatTimesAverage),
    { ...number('rank', 'Rank'), meta: { align: 'right', sortDescFirst: false } },
    number('inboundCount', 'Inbound'),
    number('outboundCount', 'Outbound'),
    { ...number('depth', 'Depth'), cell: ({ getValue }) => formatCount(getValue() as number | null), meta: { align: 'right' } },
    { id: 'flags', header: 'Findings', enableSorting: false, cell: ({ row }) => <FlagChips flags={pageFlags(row.original)} /> },
    number('brokenLinkCount', 'Broken links'),
    number('wordCount', 'Words'),
  ];
}
