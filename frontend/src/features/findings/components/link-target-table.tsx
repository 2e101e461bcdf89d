import type { ColumnDef } from '@tanstack/react-table';
import { Typography } from '@mui/material';
import { DataTable } from '../../../components/ui/data-table.js';
import { EmptyState } from '../../../components/ui/empty-state.js';
import { RawHref } from '../../pages/components/broken-links-panel.js';
import { useLinksByTarget } from '../api/get-links-by-target.js';
import type { GroupSource, LinkStatus, LinkTargetGroup } from '../types.js';
import { BulkActionBar } from './bulk-action-bar.js';
import { downloadCsv, toCsv } from './csv.js';
import type { FindingsTableProps } from './findings-table-props.js';
import { useRowSelection } from './use-row-selection.js';

const targetId = (g: LinkTargetGroup) => g.targetPath ?? g.href ?? '';
const sourceText = (s: GroupSource) => (typeof s === 'string' ? s : `${s.sourcePath}${s.line ? `:${s.line}` : ''}`);
const SHOWN_SOURCES = 3;

const COLUMNS: ColumnDef<LinkTargetGroup>[] = [
  {
    id: 'target',
    header: 'Missing target',
    enableHiding: false,
    enableSorting: false,
    cell: ({ row }) => <RawHref href={targetId(row.original)} />,
  },
  { id: 'count', header: 'Links', accessorKey: 'count', meta: { align: 'right', sortDescFirst: true } },
  {
    id: 'sources',
    header: 'From pages (page:line)',
    enableSorting: false,
    cell: ({ row }) => {
      const { sources, count } = row.original;
      const more = Math.max(count, sources.length) - Math.min(sources.length, SHOWN_SOURCES);
      return (
        <Typography variant="body2">
          {sources.slice(0, SHOWN_SOURCES).map(sourceText).join(', ')}
          {more > 0 ? ` and ${more} more` : ''}
        </Typography>
      );
    },
  },
];

/** One row per missing target: fixing (or creating) that one target repairs every link in the row. */
export function LinkTargetTable({ docSetId, runId, kind, table, label }: FindingsTableProps) {
  const status = kind.status as LinkStatus;
  const groups = useLinksByTarget(docSetId, runId, { status, page: table.page, pageSize: table.pageSize, sort: table.sort });
  const selection = useRowSelection(targetId);
  const exportSelected = () =>
    downloadCsv(
      `${status}-targets.csv`,
      toCsv(
        ['target', 'count', 'sources'],
        selection.rows.map((g) => [targetId(g), g.count, g.sources.map(sourceText).join(' ')]),
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
