import type { ColumnDef } from '@tanstack/react-table';
import { Typography } from '@mui/material';
import type { LinkStatus, LinkTargetGroup } from '@linkloom/shared';
import { DataTable } from '../../../components/ui/data-table.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { RawHref } from '../../pages/components/broken-links-panel.js';
import { useLinksByTarget } from '../api/get-links-by-target.js';
import { BulkActionBar } from './bulk-action-bar.js';
import { downloadCsv, toCsv } from './csv.js';
import type { FindingsTableProps } from './findings-table-props.js';
import { useRowSelection } from './use-row-selection.js';

const targetId = (g: LinkTargetGroup) => g.targetPath;
const sourceText = (s: LinkTargetGroup['sources'][number]) => `${s.sourcePath}:${s.line}`;
const SHOWN_SOURCES = 3;

/** `index.md:4, tools.md:9 and 2 more pages`: the first pages, then how many others link to the target. */
export function sourcesSummary(group: LinkTargetGroup, shown = SHOWN_SOURCES): string {
  const listed = group.sources.slice(0, shown).map(sourceText).join(', ');
  const more = group.sourcePageCount - Math.min(group.sources.length, shown);
  return more > 0 ? `${listed} and ${more} more page${more === 1 ? '' : 's'}` : listed;
}

// The links route has no sort keys; rows come most-linked target first.
const COLUMNS: ColumnDef<LinkTargetGroup>[] = [
  {
    id: 'target',
    header: 'Missing target',
    enableHiding: false,
    enableSorting: false,
    cell: ({ row }) => <RawHref href={row.original.targetPath} />,
  },
  { id: 'linkCount', header: 'Links', accessorKey: 'linkCount', enableSorting: false, meta: { align: 'right' } },
  { id: 'sourcePageCount', header: 'Pages', accessorKey: 'sourcePageCount', enableSorting: false, meta: { align: 'right' } },
  {
    id: 'sources',
    header: 'From pages (page:line)',
    enableSorting: false,
    cell: ({ row }) => <Typography variant="body2">{sourcesSummary(row.original)}</Typography>,
  },
];

/** One row per missing target: fixing (or creating) that one target repairs every link in the row. */
export function LinkTargetTable({ docSetId, runId, kind, table, label }: FindingsTableProps) {
  const status = kind.status as LinkStatus;
  const groups = useLinksByTarget(docSetId, runId, { status, page: table.page, pageSize: table.pageSize });
  const selection = useRowSelection(targetId);
  const exportSelected = () =>
    downloadCsv(
      `${status}-targets.csv`,
      toCsv(
        ['target', 'linkCount', 'sourcePageCount', 'sources'],
        selection.rows.map((g) => [g.targetPath, g.linkCount, g.sourcePageCount, g.sources.map(sourceText).join(' ')]),
      ),
    );
  return (
    <>
      <BulkActionBar
        count={selection.ids.length}
        onExport={exportSelected}
        onClear={selection.clear}
        // A row here stands for links it does not list one by one, and a task must hold exactly the selected
        // links: tasks are made from the one-row-per-link view.
        taskRequest={null}
      />
      <DataTable
        label={label}
        columns={COLUMNS}
        data={groups.data?.items}
        total={groups.data?.total ?? 0}
        page={table.page}
        pageSize={table.pageSize}
        sort={table.sort}
        onPageChange={table.onPageChange}
        onPageSizeChange={table.onPageSizeChange}
        onSortChange={table.onSortChange}
        loading={groups.isFetching}
        error={groups.error}
        onRetry={() => groups.refetch()}
        rowId={targetId}
        selectable
        selectedIds={selection.ids}
        onSelectionChange={(ids) => selection.onSelectionChange(ids, groups.data?.items ?? [])}
        emptyState={<EmptyState title="No missing targets in this run" hint="Nothing to fix here. Check the other views in the list." />}
      />
    </>
  );
}
