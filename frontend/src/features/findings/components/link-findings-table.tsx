import { useMemo } from 'react';
import type { ColumnDef } from '@tanstack/react-table';
import { Chip, Link, Typography } from '@mui/material';
import { Link as RouterLink } from 'react-router';
import { DataTable } from '../../../components/ui/data-table.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { pageDetailHref } from '../../pages/components/format.js';
import { RawHref } from '../../pages/components/broken-links-panel.js';
import { useLinks } from '../api/get-links.js';
import type { LinkItem, LinkStatus } from '@linkloom/shared';
import { BulkActionBar } from './bulk-action-bar.js';
import { downloadCsv, toCsv } from './csv.js';
import type { FindingsTableProps } from './findings-table-props.js';
import { useRowSelection } from './use-row-selection.js';

export const linkId = (l: LinkItem) => `${l.sourcePath}:${l.line}:${l.column}`;

function columns(docSetId: string, runId: string): ColumnDef<LinkItem>[] {
  return [
    {
      id: 'sourcePath',
      header: 'On page',
      accessorKey: 'sourcePath',
      enableHiding: false,
      enableSorting: false,
      cell: ({ row }) => (
        <Link component={RouterLink} to={pageDetailHref(docSetId, row.original.sourcePath, runId)}>
          {row.original.sourcePath}
        </Link>
      ),
    },
    {
      id: 'line',
      header: 'Line:col',
      enableSorting: false,
      accessorKey: 'line',
      cell: ({ row }) => `${row.original.line}:${row.original.column}`,
      meta: { align: 'right' },
    },
    // Unsafe hrefs arrive as null or as text and are only ever shown as text: never an <a>.
    {
      id: 'href',
      header: 'Link as written',
      enableSorting: false,
      cell: ({ row }) => <RawHref href={row.original.href ?? row.original.hrefText} />,
    },
    {
      id: 'targetPath',
      header: 'Resolves to',
      enableSorting: false,
      accessorKey: 'targetPath',
      cell: ({ row }) =>
        row.original.targetPath ? `${row.original.targetPath}${row.original.anchor ? `#${row.original.anchor}` : ''}` : '—',
    },
    {
      id: 'status',
      header: 'Problem',
      enableSorting: false,
      cell: ({ row }) => (
        <>
          <Chip size="small" label={row.original.status} sx={{ mr: 1 }} />
          <Typography variant="body2" component="span">
            {row.original.reason ?? ''}
          </Typography>
        </>
      ),
    },
  ];
}

/** Links of one status, one row per link, in the server's order (by page, then line): the links route has no
 * sort keys, so no column offers to sort. */
export function LinkFindingsTable({ docSetId, runId, kind, table, label }: FindingsTableProps) {
  const status = kind.status as LinkStatus;
  const links = useLinks(docSetId, runId, { status, page: table.page, pageSize: table.pageSize });
  const selection = useRowSelection(linkId);
  const cols = useMemo(() => columns(docSetId, runId), [docSetId, runId]);
  const exportSelected = () =>
    downloadCsv(
      `${status}-links.csv`,
      toCsv(
        ['sourcePath', 'line', 'column', 'href', 'targetPath', 'anchor', 'status', 'reason'],
        selection.rows.map((l) => [l.sourcePath, l.line, l.column, l.hrefText, l.targetPath, l.anchor, l.status, l.reason]),
      ),
    );
  // A task holds exactly the selected links; only broken links and anchors are fix tasks of this kind.
  const repairable = status === 'broken' || status === 'broken-anchor';
  const selected = selection.rows.map((l) => ({ sourcePath: l.sourcePath, href: l.hrefText, line: l.line }));
  const pagePaths = [...new Set(selected.map((l) => l.sourcePath))];
  const taskRequest = repairable ? { kind: 'repair-broken-links' as const, pagePaths, links: selected } : null;
  return (
    <>
      <BulkActionBar count={selection.ids.length} onExport={exportSelected} onClear={selection.clear} taskRequest={taskRequest} />
      <DataTable
        label={label}
        columns={cols}
        data={links.data?.items}
        total={links.data?.total ?? 0}
        page={table.page}
        pageSize={table.pageSize}
        sort={table.sort}
        onPageChange={table.onPageChange}
        onPageSizeChange={table.onPageSizeChange}
        onSortChange={table.onSortChange}
        loading={links.isFetching}
        error={links.error}
        onRetry={() => links.refetch()}
        rowId={linkId}
        selectable
        selectedIds={selection.ids}
        onSelectionChange={(ids) => selection.onSelectionChange(ids, links.data?.items ?? [])}
        emptyState={
          <EmptyState
            title={`No ${kind.label.toLowerCase()} links in this run`}
            hint="Nothing to fix here. Check the other views in the list."
          />
        }
      />
    </>
  );
}
