import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { linkItemSchema, linkListSchema, linkTargetGroupListSchema, runPageListSchema } from '@linkloom/shared';
import { pagedList, parsed, run, signInAs } from '../../../testing/fixtures.js';
import { pageRow } from '../../pages/testing-fixtures.js';
import FindingsRoute from './findings-route.js';

afterEach(() => vi.unstubAllGlobals());

const COUNTS = {
  pages: 80,
  links: 600,
  internalLinks: 500,
  externalLinks: 100,
  brokenLinks: 6,
  brokenAnchors: 2,
  brokenAssets: 1,
  unsafeLinks: 1,
  ambiguousLinks: 2,
  redirectedLinks: 0,
  outOfScopeLinks: 0,
  orphans: 4,
  deadEnds: 3,
  unreachable: 2,
  deepPages: 5,
  islands: 1,
};

const BROKEN_LINK = parsed(linkItemSchema, {
  sourcePath: 'index.md',
  line: 4,
  column: 7,
  href: './gears/derailleur.md',
  hrefText: './gears/derailleur.md',
  targetPath: 'gears/derailleur.md',
  anchor: null,
  kind: 'inline',
  status: 'broken',
  reason: 'No such page',
});

// The server withholds an unsafe href as a link (`href: null`) and sends the text to show.
const UNSAFE_LINK = parsed(linkItemSchema, {
  sourcePath: 'tools.md',
  line: 12,
  column: 3,
  href: null,
  hrefText: 'javascript:alert(1)',
  targetPath: null,
  anchor: null,
  kind: 'inline',
  status: 'unsafe',
  reason: 'Runs script when clicked',
});

function api() {
  return fakeFetch({
    'GET /api/doc-sets/d1/runs/latest': () => ({ body: run('r7', 7, { counts: COUNTS }) }),
    'GET /api/doc-sets/d1/runs/latest/pages': (url) => ({
      body: parsed(runPageListSchema, {
        ...pagedList([
          url.searchParams.get('flags') === 'deep'
            ? pageRow('gears/hub-service.md', { deep: true, depth: 6 })
            : pageRow('gears/cables.md', { orphan: true, inboundCount: 0 }),
        ]),
        runId: 'r7',
      }),
    }),
    'GET /api/doc-sets/d1/runs/latest/links': (url) => ({
      body:
        url.searchParams.get('groupBy') === 'target'
          ? parsed(linkTargetGroupListSchema, {
              ...pagedList([
                {
                  targetPath: 'gears/derailleur.md',
                  linkCount: 3,
                  sourcePageCount: 2,
                  sources: [
                    { sourcePath: 'index.md', line: 4, column: 7 },
                    { sourcePath: 'gears/cables.md', line: 9, column: 1 },
                  ],
                },
              ]),
              groupBy: 'target',
            })
          : parsed(linkListSchema, pagedList([url.searchParams.get('status') === 'unsafe' ? UNSAFE_LINK : BROKEN_LINK])),
    }),
  });
}

const render = (route: string) => renderWithProviders(<FindingsRoute />, { route, path: '/doc-sets/:docSetId/findings/:view?' });

describe('findings', () => {
  it('shows each view with its count from the run and switches views from the side list', async () => {
    signInAs('viewer');
    vi.stubGlobal('fetch', api().fn);
    const user = userEvent.setup();
    const { router } = render('/doc-sets/d1/findings');
    const nav = within(await screen.findByRole('navigation', { name: 'Finding views' }));
    // Needs links = orphans + unreachable + deep = 4 + 2 + 5; broken = 6 + 2; unsafe/ambiguous = 1 + 2.
    await nav.findByLabelText('11 found');
    expect(nav.getByRole('link', { name: /Pages that need links/ }).textContent).toContain('4 orphans · 2 unreachable · 5 deep');
    expect(nav.getByRole('link', { name: /Dead ends/ }).textContent).toContain('3');
    expect(nav.getByRole('link', { name: /Broken links and anchors/ }).textContent).toContain('8');
    expect(nav.getByRole('link', { name: /Unsafe and ambiguous/ }).textContent).toContain('3');
    expect(nav.getByRole('link', { name: /Islands/ }).textContent).toContain('1');
    expect(await screen.findByText('No other page links here.')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Deep (5)' }));
    expect(await screen.findByText('6 clicks from the nearest entry page.')).toBeTruthy();
    expect(router.state.location.search).toBe('?kind=deep');

    await user.click(nav.getByRole('link', { name: /Broken links and anchors/ }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/doc-sets/d1/findings/broken-links'));
    expect(nav.getByRole('link', { name: /Broken links and anchors/ }).getAttribute('aria-current')).toBe('page');
    expect(await screen.findByText('./gears/derailleur.md')).toBeTruthy();
  });

  it('toggles broken links between grouped by page and grouped by missing target', async () => {
    signInAs('viewer');
    vi.stubGlobal('fetch', api().fn);
    const user = userEvent.setup();
    const { router } = render('/doc-sets/d1/findings/broken-links');
    expect(await screen.findByText('./gears/derailleur.md')).toBeTruthy();
    expect(await screen.findByRole('button', { name: 'Missing target (6)' })).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Missing anchor (2)' })).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'By missing target' }));
    expect(await screen.findByText('index.md:4, gears/cables.md:9')).toBeTruthy();
    expect(screen.getByRole('cell', { name: '3' })).toBeTruthy();
    expect(router.state.location.search).toContain('group=target');
  });

  it('opens a view from an Overview alias and shows unsafe hrefs as inert text', async () => {
    signInAs('viewer');
    vi.stubGlobal('fetch', api().fn);
    const user = userEvent.setup();
    render('/doc-sets/d1/findings/unsafe');
    const href = await screen.findByText('javascript:alert(1)');
    expect(href.tagName).toBe('CODE');
    expect(href.closest('a')).toBeNull();
    // Bulk selection: viewers may export but get no "Create tasks".
    await user.click(screen.getByRole('checkbox', { name: 'Select row tools.md:12:3' }));
    const bar = within(screen.getByRole('region', { name: 'Actions on selected rows' }));
    expect(bar.getByText('1 selected')).toBeTruthy();
    expect(bar.getByRole('button', { name: 'Export selected' })).toBeTruthy();
    expect(bar.queryByRole('button', { name: 'Create tasks' })).toBeNull();
  });

  it('offers editors "Create tasks" for the selected pages', async () => {
    signInAs('editor');
    vi.stubGlobal('fetch', api().fn);
    const user = userEvent.setup();
    render('/doc-sets/d1/findings/orphans');
    await user.click(await screen.findByRole('checkbox', { name: 'Select row gears/cables.md' }));
    await user.click(screen.getByRole('button', { name: 'Create tasks' }));
    // The tasks feature owns the dialog; here it only has to open for the one selected page.
    expect(await screen.findByRole('dialog')).toBeTruthy();
    expect(screen.getByText('Create fix task')).toBeTruthy();
  });
});
