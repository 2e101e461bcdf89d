import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { runPageListSchema } from '@linkloom/shared';
import { pagedList, parsed, signInAs } from '../../../testing/fixtures.js';
import { pageRow } from '../testing-fixtures.js';
import PageExplorerRoute from './page-explorer-route.js';

afterEach(() => vi.unstubAllGlobals());

function api() {
  return fakeFetch({
    'GET /api/doc-sets/d1/runs/latest/pages': (url) => ({
      body: parsed(runPageListSchema, {
        ...pagedList(
          url.searchParams.get('flags') === 'orphan'
            ? [pageRow('brakes/pads.md', { orphan: true, inboundCount: 0 })]
            : [pageRow('index.md', { rank: 1 }), pageRow('brakes/pads.md', { orphan: true, inboundCount: 0 })],
        ),
        runId: 'r1',
      }),
    }),
  });
}

const render = (route = '/doc-sets/d1/pages') => renderWithProviders(<PageExplorerRoute />, { route, path: '/doc-sets/:docSetId/pages' });

describe('page explorer', () => {
  it('writes a flag filter to the URL, back on page 1, and sends it to the server', async () => {
    signInAs('viewer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const user = userEvent.setup();
    const { router } = render('/doc-sets/d1/pages?page=3');
    await screen.findByRole('link', { name: 'index' });

    await user.click(screen.getByRole('button', { name: 'Orphan' }));
    await waitFor(() => expect(router.state.location.search).toContain('flags=orphan'));
    // A new filter means new rows: back to page 1, which is the default and so leaves the URL.
    expect(router.state.location.search).not.toContain('page=');
    expect(screen.getByRole('button', { name: 'Orphan' }).getAttribute('aria-pressed')).toBe('true');
    await waitFor(() => {
      const last = fake.calls.filter((c) => c.url.pathname.endsWith('/pages')).at(-1)!;
      expect(last.url.searchParams.get('flags')).toBe('orphan');
      expect(last.url.searchParams.get('page')).toBe('1');
    });
  });

  it('writes the debounced text filter and a depth range to the URL and sends them to the server', async () => {
    signInAs('viewer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const user = userEvent.setup();
    const { router } = render('/doc-sets/d1/pages?flags=orphan');
    await screen.findByRole('link', { name: 'pads' });
    await user.type(screen.getByLabelText('Filter by path or title'), 'brakes');
    await waitFor(() => expect(router.state.location.search).toContain('q=brakes'));
    await user.type(screen.getByLabelText('Depth from'), '2');
    await waitFor(() => expect(router.state.location.search).toContain('minDepth=2'));

    await waitFor(() => {
      const last = fake.calls.filter((c) => c.url.pathname.endsWith('/pages')).at(-1)!;
      expect(last.url.searchParams.get('flags')).toBe('orphan');
      expect(last.url.searchParams.get('q')).toBe('brakes');
      expect(last.url.searchParams.get('minDepth')).toBe('2');
      expect(last.url.searchParams.get('sort')).toBe('-stationaryScore');
    });
    // The debounce holds back keystrokes: no request was made for a partial word such as "br".
    expect(fake.calls.some((c) => c.url.searchParams.get('q') === 'br')).toBe(false);
  });

  it('reads filters from a shared URL and sorts by a clicked column', async () => {
    signInAs('viewer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const user = userEvent.setup();
    const { router } = render('/doc-sets/d1/pages?flags=orphan&q=pads');
    expect(await screen.findByRole('link', { name: 'pads' })).toBeTruthy();
    expect(screen.getByLabelText('Filter by path or title')).toHaveProperty('value', 'pads');
    await user.click(screen.getByRole('button', { name: 'Inbound' }));
    await waitFor(() => expect(router.state.location.search).toContain('sort=-inboundCount'));
    expect(router.state.location.search).toContain('flags=orphan');
  });

  it('says what to do when there is no analysis yet', async () => {
    signInAs('viewer');
    vi.stubGlobal('fetch', fakeFetch({}).fn);
    render();
    expect(await screen.findByText('No analysis yet')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Go to the Overview' }).getAttribute('href')).toBe('/doc-sets/d1');
  });
});
