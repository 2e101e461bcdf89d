import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import type { Run } from '@linkloom/shared';
import { counts, docSet, pagedList, run, signInAs } from '../../../testing/fixtures.js';
import OverviewRoute from './overview-route.js';

afterEach(() => vi.unstubAllGlobals());

function api(runs: Run[], distributionStatus = 404) {
  return fakeFetch({
    'GET /api/doc-sets/d1': () => ({ body: docSet('d1', 'Operator handbook') }),
    'GET /api/doc-sets/d1/runs': () => ({ body: pagedList(runs, 1, 500) }),
    'GET /api/doc-sets/d1/snapshots': () => ({ body: pagedList([], 1, 100) }),
    'GET /api/doc-sets/d1/runs/r2/pages': () => ({ body: { ...pagedList([], 1, 10), runId: 'r2' } }),
    'GET /api/doc-sets/d1/runs/r2/score-distribution': () => ({
      status: distributionStatus,
      body: { statusCode: distributionStatus, code: 'NOT_FOUND', message: 'no' },
    }),
  });
}

const render = () => renderWithProviders(<OverviewRoute />, { route: '/doc-sets/d1', path: '/doc-sets/:docSetId' });

describe('overview', () => {
  it('shows headline counts with the change since the previous finished run', async () => {
    signInAs('viewer');
    // Newest first after sorting; r3 is still running and must not count as "latest".
    const fake = api([
      run('r1', 1, { counts: counts({ brokenLinks: 12 }) }),
      run('r2', 2),
      run('r3', 3, { status: 'running', counts: null, finishedAt: null }),
    ]);
    vi.stubGlobal('fetch', fake.fn);
    render();
    const card = (await screen.findByText('−3 since the previous run')).closest('.MuiCard-root') as HTMLElement;
    expect(within(card).getByText('Broken links')).toBeTruthy();
    expect(within(card).getByText('9')).toBeTruthy();
    // Viewers get no upload button; the missing score-distribution route leaves no error behind.
    expect(screen.queryByRole('button', { name: 'Upload archive' })).toBeNull();
    expect(await screen.findByText('Most important pages')).toBeTruthy();
    expect(screen.queryByText(/score distribution could not be loaded/)).toBeNull();
    expect(fake.calls.some((c) => c.url.pathname.endsWith('/score-distribution'))).toBe(true);
  });

  it('tells an editor what to do when nothing has been analysed', async () => {
    signInAs('editor');
    vi.stubGlobal('fetch', api([]).fn);
    render();
    expect((await screen.findAllByText(/No snapshot yet: upload a zip of your Markdown/)).length).toBeGreaterThan(0);
    expect(screen.getByText('No analysis yet')).toBeTruthy();
    expect(screen.getAllByRole('button', { name: 'Upload archive' }).length).toBeGreaterThan(0);
  });
});
