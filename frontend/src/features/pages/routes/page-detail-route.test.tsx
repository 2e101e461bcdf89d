import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { signInAs } from '../../../testing/fixtures.js';
import { pageDetail } from '../testing-fixtures.js';
import PageDetailRoute from './page-detail-route.js';

// jsdom has no canvas, so the cytoscape picture is replaced; its list alternative is tested on its own.
vi.mock('../../link-map/components/graph-canvas.js', () => ({ GraphCanvas: () => <div>picture</div> }));
afterEach(() => vi.unstubAllGlobals());

function api() {
  return fakeFetch({
    'GET /api/doc-sets/d1/runs/latest/page': (url) => ({
      body: pageDetail(url.searchParams.get('path') ?? '', {
        title: 'Chain wear',
        // The panel shows every href as text; a scheme the browser would run must not become a link.
        brokenLinks: [
          { href: 'javascript:void(0)', line: 8, column: 2, targetPath: null, anchor: null, status: 'broken', reason: 'No such page' },
        ],
        suggestedSources: [{ path: 'tools.md', title: 'Tools', scoreGain: 0.002, reason: 'Mentions chains' }],
        inbound: [{ path: 'index.md', title: 'Welcome', line: 14 }],
      }),
    }),
  });
}

const render = () =>
  renderWithProviders(<PageDetailRoute />, { route: '/doc-sets/d1/page?path=drive/chain.md', path: '/doc-sets/:docSetId/page' });

describe('page detail', () => {
  it('shows links with line numbers, unsafe hrefs as text, and no actions for viewers', async () => {
    signInAs('viewer');
    vi.stubGlobal('fetch', api().fn);
    render();
    expect(await screen.findByRole('heading', { name: 'Chain wear' })).toBeTruthy();
    const linkedFrom = within(screen.getByRole('table', { name: 'Linked from' }));
    expect(linkedFrom.getByRole('link', { name: 'Welcome' })).toBeTruthy();
    expect(linkedFrom.getByText('14')).toBeTruthy();
    expect(screen.getByText('javascript:void(0)').closest('a')).toBeNull();
    expect(screen.getByText(/gain \+0\.0020 \(20% more\)/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Create fix task' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Nominate for pruning' })).toBeNull();
  });

  it('shows writers "Nominate for pruning" only, which opens the nomination for this page', async () => {
    signInAs('writer');
    vi.stubGlobal('fetch', api().fn);
    const user = userEvent.setup();
    render();
    await user.click(await screen.findByRole('button', { name: 'Nominate for pruning' }));
    const dialog = within(await screen.findByRole('dialog'));
    expect(dialog.getByDisplayValue('drive/chain.md')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Create fix task' })).toBeNull();
  });
});
