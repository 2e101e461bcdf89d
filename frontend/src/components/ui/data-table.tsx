import { useState, type KeyboardEvent, type ReactNode } from 'react';
import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type RowData,
  type VisibilityState,
  type Updater,
} from '@tanstack/react-table';
import {
  Box,
  Checkbox,
  Paper,
  Skeleton,
  Table,
  TableBody,
  TableCell,
  TableContainer,
  TableHead,
  TablePagination,
  TableRow,
  TableSortLabel,
  Toolbar,
  Typography,
} from '@mui/material';
import { ErrorPanel } from './error-panel.js';
import { EmptyState } from './empty-state.js';
import { ColumnChooser } from './data-table-column-chooser.js';
import { nextSort, parseSort } from './data-table-sort.js';

declare module '@tanstack/react-table' {
  // Per-column display hints read by <DataTable>.
  interface ColumnMeta<TData extends RowData, TValue> {
    /** Name in the column chooser when `header` is not a plain string. */
    label?: string;
    align?: 'left' | 'right' | 'center';
    /** First click sorts descending (scores, counts). */
    sortDescFirst?: boolean;
  }
}

export interface DataTableProps<T> {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  columns: ColumnDef<T, any>[];
  data: T[] | undefined;
  total: number;
  /** 1-based, as the API counts pages. */
  page: number;
  pageSize: number;
  /** API sort string: `key`, `-key` or ''. A column's sort key is its id. */
  sort: string;
  onPageChange: (page: number) => void;
  onPageSizeChange: (pageSize: number) => void;
  onSortChange: (sort: string) => void;
  loading?: boolean;
  error?: unknown;
  onRetry?: () => void;
  emptyState?: ReactNode;
  rowId: (row: T) => string;
  selectable?: boolean;
  selectedIds?: string[];
  onSelectionChange?: (ids: string[]) => void;
  columnVisibility?: VisibilityState;
  onColumnVisibilityChange?: (visibility: VisibilityState) => void;
  onRowClick?: (row: T) => void;
  pageSizeOptions?: number[];
  /** Accessible name of the table. */
  label: string;
  toolbar?: ReactNode;
}

/** Server-side table: the server pages and sorts; this draws, and reports what the reader asked for. */
export function DataTable<T>(props: DataTableProps<T>) {
  const { columns, data, total, page, pageSize, sort, loading, error, rowId, selectable, label } = props;
  const [ownVisibility, setOwnVisibility] = useState<VisibilityState>({});
  const visibility = props.columnVisibility ?? ownVisibility;
  const selected = new Set(props.selectedIds ?? []);

  const table = useReactTable<T>({
    data: data ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (row) => rowId(row),
    manualPagination: true,
    manualSorting: true,
    rowCount: total,
    state: { columnVisibility: visibility },
    onColumnVisibilityChange: (updater: Updater<VisibilityState>) => {
      const next = typeof updater === 'function' ? updater(visibility) : updater;
      if (props.onColumnVisibilityChange) props.onColumnVisibilityChange(next);
      else setOwnVisibility(next);
    },
  });

  const rows = table.getRowModel().rows;
  const pageIds = rows.map((r) => r.id);
  const allOnPage = pageIds.length > 0 && pageIds.every((id) => selected.has(id));
  const someOnPage = pageIds.some((id) => selected.has(id));
  const setSelection = (ids: Set<string>) => props.onSelectionChange?.([...ids]);
  const toggleRow = (id: string) => {
    const next = new Set(selected);
    if (next.has(id)) next.delete(id);
    else next.add(id);
    setSelection(next);
  };
  const togglePage = () => {
    const next = new Set(selected);
    for (const id of pageIds) allOnPage ? next.delete(id) : next.add(id);
    setSelection(next);
  };
  const sortSpec = parseSort(sort);
  const visibleCount = table.getVisibleLeafColumns().length + (selectable ? 1 : 0);

  return (
    <Paper variant="outlined">
      <Toolbar variant="dense" sx={{ gap: 1, px: { xs: 1, sm: 1.5 } }}>
        <Box sx={{ flex: 1, display: 'flex', gap: 1, alignItems: 'center', flexWrap: 'wrap' }}>
          {selectable && selected.size > 0 ? <Typography variant="body2">{selected.size} selected</Typography> : props.toolbar}
        </Box>
        <ColumnChooser table={table} />
      </Toolbar>
      {error ? (
        <Box sx={{ p: 2 }}>
          <ErrorPanel error={error} onRetry={props.onRetry} />
        </Box>
      ) : (
        <TableContainer>
          <Table size="small" aria-label={label} aria-busy={loading ? 'true' : 'false'}>
            <TableHead>
              {table.getHeaderGroups().map((group) => (
                <TableRow key={group.id}>
                  {selectable && (
                    <TableCell padding="checkbox">
                      <Checkbox
                        size="small"
                        checked={allOnPage}
                        indeterminate={someOnPage && !allOnPage}
                        onChange={togglePage}
                        slotProps={{ input: { 'aria-label': 'Select all rows on this page' } }}
                      />
                    </TableCell>
                  )}
                  {group.headers.map((header) => {
                    const meta = header.column.columnDef.meta;
                    const content = header.isPlaceholder ? null : flexRender(header.column.columnDef.header, header.getContext());
                    const active = sortSpec?.key === header.column.id;
                    return (
                      <TableCell key={header.id} align={meta?.align} sortDirection={active ? (sortSpec!.desc ? 'desc' : 'asc') : false}>
                        {header.column.getCanSort() ? (
                          <TableSortLabel
                            active={active}
                            direction={active && sortSpec!.desc ? 'desc' : 'asc'}
                            onClick={() => props.onSortChange(nextSort(sort, header.column.id, meta?.sortDescFirst ?? false))}
                          >
                            {content}
                          </TableSortLabel>
                        ) : (
                          content
                        )}
                      </TableCell>
                    );
                  })}
                </TableRow>
              ))}
            </TableHead>
            <TableBody>
              {loading && !data
                ? Array.from({ length: Math.min(pageSize, 8) }, (_, i) => (
                    <TableRow key={`skeleton-${i}`}>
                      {Array.from({ length: visibleCount }, (_, j) => (
                        <TableCell key={j}>
                          <Skeleton variant="text" />
                        </TableCell>
                      ))}
                    </TableRow>
                  ))
                : rows.map((row) => (
                    <TableRow
                      key={row.id}
                      hover
                      selected={selected.has(row.id)}
                      {...(props.onRowClick && {
                        // Clickable rows are reachable and openable from the keyboard too.
                        tabIndex: 0,
                        onClick: () => props.onRowClick!(row.original),
                        onKeyDown: (e: KeyboardEvent) =>
                          e.key === 'Enter' && e.target === e.currentTarget && props.onRowClick!(row.original),
                        sx: { cursor: 'pointer' },
                      })}
                    >
                      {selectable && (
                        <TableCell padding="checkbox" onClick={(e) => e.stopPropagation()}>
                          <Checkbox
                            size="small"
                            checked={selected.has(row.id)}
                            onChange={() => toggleRow(row.id)}
                            slotProps={{ input: { 'aria-label': `Select row ${row.id}` } }}
                          />
                        </TableCell>
                      )}
                      {row.getVisibleCells().map((cell) => (
                        <TableCell key={cell.id} align={cell.column.columnDef.meta?.align}>
                          {flexRender(cell.column.columnDef.cell, cell.getContext())}
                        </TableCell>
                      ))}
                    </TableRow>
                  ))}
              {!loading && data && data.length === 0 && (
                <TableRow>
                  <TableCell colSpan={visibleCount}>
                    {props.emptyState ?? <EmptyState title="Nothing to show" hint="Try fewer filters." />}
                  </TableCell>
                </TableRow>
              )}
            </TableBody>
          </Table>
        </TableContainer>
      )}
      <TablePagination
        component="div"
        count={total}
        page={Math.max(0, page - 1)}
        rowsPerPage={pageSize}
        rowsPerPageOptions={props.pageSizeOptions ?? [25, 50, 100, 250, 500]}
        onPageChange={(_, zeroBased) => props.onPageChange(zeroBased + 1)}
        onRowsPerPageChange={(e) => props.onPageSizeChange(Number(e.target.value))}
      />
    </Paper>
  );
}
