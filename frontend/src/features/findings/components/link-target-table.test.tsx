import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { linkTargetGroupListSchema, type LinkTargetGroup } from '@linkloom/shared';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { pagedList, parsed, signInAs } from '../../../testing/fixtures.js';
import { FINDINGS_VIEWS } from './findings-views.js';
import { LinkTargetTable, sourcesSummary } from './link-target-table.js';

afterEach(() => vi.unstubAllGlobals());

// The links route's `groupBy=target` answer, typed from and parsed by the shared schema: the table once read
// `count` and `sources` that the server never sent, and crashed; a renamed field now fails here first.
const DERAILLEUR: LinkTargetGroup = {
  targetPath: 'gears/derailleur.md',
  linkCount: 7,
  sourcePageCount: 5,
  sources: [
    { sourcePath: 'gears/cables.md', line: 9, column: 1 },
    { sourcePath: 'gears/index.md', line: 12, column: 4 },
    { sourcePath: 'index.md', line: 4, column: 7 },
    { sourcePath: 'tools/chain-tool.md', line: 30, column: 2 },
    { sourcePath: 'tools/stand.md', line: 2, column: 1 },
  ],
};
const VISE_IMAGE: LinkTargetGroup = {
  targetPath: '../img/vise.png',
  linkCount: 1,
  sourcePageCount: 1,
  sources: [{ sourcePath: 'tools/stand.md', line: 10, column: 1 }],
};
const GROUPS = parsed(linkTargetGroupListSchema, { ...pagedList([DERAILLEUR, VISE_IMAGE]), groupBy: 'target' });

const broken = FINDINGS_VIEWS.find((v) => v.id === 'broken-links')!.kinds.find((k) => k.status === 'broken')!;
const table = { page: 1, pageSize: 50, sort: '', onPageChange: vi.fn(), onPageSizeChange: vi.fn(), onSortChange: vi.fn() };

function render() {
  const fake = fakeFetch({ 'GET /api/doc-sets/d1/runs/r1/links': () => ({ body: GROUPS }) });
  vi.stubGlobal('fetch', fake.fn);
  renderWithProviders(<LinkTargetTable docSetId="d1" runId="r1" kind={broken} table={table} label="Broken links: Missing target" />);
  return fake;
}

describe('broken links by missing target', () => {
  it('asks for the grouped links and shows each target with its link and page counts and the pages that link to it', async () => {
    signInAs('viewer');
    const fake = render();
    const row = (await screen.findByText('gears/derailleur.md')).closest('tr')!;
    expect(within(row).getByRole('cell', { name: '7' })).toBeTruthy();
    expect(within(row).getByRole('cell', { name: '5' })).toBeTruthy();
    expect(within(row).getByText('gears/cables.md:9, gears/index.md:12, index.md:4 and 2 more pages')).toBeTruthy();
    expect(screen.getByText('tools/stand.md:10')).toBeTruthy();
    const call = fake.calls.find((c) => c.url.pathname.endsWith('/links'))!;
    expect(Object.fromEntries(call.url.searchParams)).toEqual({ status: 'broken', groupBy: 'target', page: '1', pageSize: '50' });
  });

  it('counts the pages not listed from sourcePageCount, not from the listed sources', () => {
    // The server lists at most LINK_TARGET_SOURCES pages; the rest are only counted.
    expect(sourcesSummary({ ...DERAILLEUR, sourcePageCount: 140, sources: DERAILLEUR.sources.slice(0, 2) })).toBe(
      'gears/cables.md:9, gears/index.md:12 and 138 more pages',
    );
    expect(sourcesSummary(VISE_IMAGE)).toBe('tools/stand.md:10');
  });

  it('lets editors export the selected targets but not make tasks of them', async () => {
    // A task holds exactly the links it was made from, and a row here stands for links it does not list one
    // by one (only the first link of each page): tasks are made from the one-row-per-link view instead.
    signInAs('editor');
    render();
    const user = userEvent.setup();
    await user.click(await screen.findByRole('checkbox', { name: 'Select row gears/derailleur.md' }));
    const actions = screen.getByRole('region', { name: 'Actions on selected rows' });
    expect(within(actions).getByRole('button', { name: 'Export selected' })).toBeTruthy();
    expect(within(actions).queryByRole('button', { name: 'Create tasks' })).toBeNull();
  });
});
