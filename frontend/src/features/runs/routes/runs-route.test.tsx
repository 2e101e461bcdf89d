import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { run, signInAs } from '../../../testing/fixtures.js';
import RunsRoute from './runs-route.js';

afterEach(() => vi.unstubAllGlobals());

function api() {
  return fakeFetch({
    'GET /api/doc-sets/d1': () => ({ body: { id: 'd1', name: 'Handbook', settings: {} } }),
    'GET /api/doc-sets/d1/runs': () => ({ body: { items: [run('r1', 1), run('r3', 3), run('r2', 2)], total: 3, page: 1, pageSize: 500 } }),
    'GET /api/doc-sets/d1/runs/r3/diff': () => ({
      body: {
        runId: 'r3',
        againstRunId: 'r1',
        kinds: {
          brokenLinks: {
            appeared: { total: 1, items: [{ sourcePath: 'guide/a.md', line: 4, href: 'gone.md' }] },
            disappeared: { total: 0, items: [] },
          },
          orphans: { appeared: { total: 0, items: [] }, disappeared: { total: 0, items: [] } },
        },
        scoreMoves: [{ path: 'index.md', title: 'Welcome', before: 0.05, after: 0.08 }],
      },
    }),
    'POST /api/doc-sets/d1/runs': () => ({ status: 202, body: { run: { id: 'r4' } } }),
  });
}

const render = () => renderWithProviders(<RunsRoute />, { route: '/doc-sets/d1/runs', path: '/doc-sets/:docSetId/runs' });

describe('runs', () => {
  it('compares two selected runs, newer against older', async () => {
    signInAs('viewer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const user = userEvent.setup();
    render();
    await user.click(await screen.findByRole('checkbox', { name: 'Select row r1' }));
    await user.click(screen.getByRole('checkbox', { name: 'Select row r3' }));
    await user.click(screen.getByRole('button', { name: 'Compare selected' }));
    expect(await screen.findByText('guide/a.md:4 → gone.md', { exact: false })).toBeTruthy();
    const diffCall = fake.calls.find((c) => c.url.pathname.endsWith('/diff'));
    expect(diffCall?.url.searchParams.get('against')).toBe('r1');
    expect(screen.getByText('Welcome')).toBeTruthy();
    // Kinds with no change either way are left out of the table.
    expect(screen.queryByText('Orphan pages')).toBeNull();
    // Viewers may compare but not start runs.
    expect(screen.queryByRole('button', { name: /Run again/ })).toBeNull();
  });

  it('starts a run with changed damping and refuses an invalid one', async () => {
    signInAs('editor');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const user = userEvent.setup();
    render();
    await user.click(await screen.findByRole('button', { name: /Run again/ }));
    const damping = screen.getByLabelText('Damping factor');
    await user.clear(damping);
    await user.type(damping, '0');
    await user.click(screen.getByRole('button', { name: 'Start run' }));
    expect(await screen.findByText(/damping: must be above 0/)).toBeTruthy();
    await user.clear(damping);
    await user.type(damping, '0.7');
    await user.click(screen.getByRole('button', { name: 'Start run' }));
    await screen.findByText('A new run has started');
    const post = fake.calls.find((c) => c.method === 'POST');
    expect(post?.body).toEqual({ settings: { damping: 0.7, teleport: 'uniform', entryPages: [], depthThreshold: 3 } });
  });
});
