import { describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ColumnDef } from '@tanstack/react-table';
import { renderWithProviders } from '../../testing/render.js';
import { DataTable, type DataTableProps } from './data-table.js';
import { nextSort, parseSort } from './data-table-sort.js';

interface Row {
  path: string;
  title: string;
  inboundCount: number;
}
const columns: ColumnDef<Row, unknown>[] = [
  { accessorKey: 'title', header: 'Title' },
  { accessorKey: 'inboundCount', header: 'Inbound links', meta: { align: 'right', sortDescFirst: true } },
  { accessorKey: 'path', header: 'Path', enableSorting: false },
];
const rows: Row[] = [
  { path: 'guide/install.md', title: 'Install', inboundCount: 12 },
  { path: 'guide/upgrade.md', title: 'Upgrade', inboundCount: 3 },
];

function setup(overrides: Partial<DataTableProps<Row>> = {}) {
  const props: DataTableProps<Row> = {
    label: 'Pages',
    columns,
    data: rows,
    total: 120,
    page: 2,
    pageSize: 50,
    sort: 'title',
    rowId: (r) => r.path,
    onPageChange: vi.fn(),
    onPageSizeChange: vi.fn(),
    onSortChange: vi.fn(),
    ...overrides,
  };
  renderWithProviders(<DataTable {...props} />);
  return props;
}

describe('DataTable', () => {
  it('draws the server page and reports page changes 1-based', async () => {
    const props = setup();
    expect(screen.getByRole('table', { name: 'Pages' })).toBeTruthy();
    expect(screen.getByText('Install')).toBeTruthy();
    expect(screen.getByText('51–100 of 120')).toBeTruthy();
    await userEvent.click(screen.getByRole('button', { name: /next page/i }));
    expect(props.onPageChange).toHaveBeenCalledWith(3);
  });

  it('sorts from the keyboard: flips the active column, starts counts descending, skips unsortable ones', async () => {
    const user = userEvent.setup();
    const props = setup();
    screen.getByRole('button', { name: 'Title' }).focus();
    await user.keyboard('{Enter}');
    expect(props.onSortChange).toHaveBeenLastCalledWith('-title');
    await user.click(screen.getByRole('button', { name: 'Inbound links' }));
    expect(props.onSortChange).toHaveBeenLastCalledWith('-inboundCount');
    expect(screen.queryByRole('button', { name: 'Path' })).toBeNull();
    expect(screen.getByRole('columnheader', { name: /Title/ }).getAttribute('aria-sort')).toBe('ascending');
  });

  it('selects rows and the whole page', async () => {
    const user = userEvent.setup();
    const onSelectionChange = vi.fn();
    setup({ selectable: true, selectedIds: ['guide/install.md'], onSelectionChange });
    await user.click(screen.getByRole('checkbox', { name: 'Select row guide/upgrade.md' }));
    expect(onSelectionChange).toHaveBeenLastCalledWith(['guide/install.md', 'guide/upgrade.md']);
    await user.click(screen.getByRole('checkbox', { name: 'Select all rows on this page' }));
    expect(onSelectionChange).toHaveBeenLastCalledWith(['guide/install.md', 'guide/upgrade.md']);
  });

  it('hides a column from the column chooser', async () => {
    const user = userEvent.setup();
    setup();
    await user.click(screen.getByRole('button', { name: 'Choose columns' }));
    await user.click(within(screen.getByRole('menu')).getByRole('checkbox', { name: 'Path' }));
    await user.keyboard('{Escape}');
    expect(screen.queryByText('guide/install.md')).toBeNull();
    expect(screen.getByText('Install')).toBeTruthy();
  });

  it('shows skeleton rows while the first page loads', () => {
    setup({ data: undefined, loading: true });
    const table = screen.getByRole('table');
    expect(table.getAttribute('aria-busy')).toBe('true');
    // header row + 8 placeholder rows (page size 50 capped at 8)
    expect(within(table).getAllByRole('row')).toHaveLength(9);
  });

  it('shows the empty state slot when the page has no rows', () => {
    setup({ data: [], total: 0, emptyState: <p>No pages match: clear the filters</p> });
    expect(screen.getByText('No pages match: clear the filters')).toBeTruthy();
  });

  it('shows an error a person can act on, with a retry', async () => {
    const onRetry = vi.fn();
    setup({ error: new Error('Server unreachable'), onRetry });
    expect(screen.getByText(/Server unreachable/)).toBeTruthy();
    await userEvent.click(screen.getByRole('button', { name: 'Retry' }));
    expect(onRetry).toHaveBeenCalledOnce();
  });
});

describe('DataTable row opening', () => {
  it('opens a row with Enter as well as a click', async () => {
    const user = userEvent.setup();
    const onRowClick = vi.fn();
    setup({ onRowClick });
    const row = screen.getByText('Upgrade').closest('tr') as HTMLElement;
    row.focus();
    await user.keyboard('{Enter}');
    expect(onRowClick).toHaveBeenCalledWith(rows[1]);
  });
});

describe('sort strings', () => {
  it('parse and cycle like the API (minus = descending)', () => {
    expect(parseSort('-stationaryScore')).toEqual({ key: 'stationaryScore', desc: true });
    expect(parseSort('')).toBeNull();
    expect(nextSort('-rank', 'rank', false)).toBe('rank');
    expect(nextSort('rank', 'title', false)).toBe('title');
    expect(nextSort('rank', 'inboundCount', true)).toBe('-inboundCount');
  });
});
