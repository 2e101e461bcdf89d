import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { runDiffSchema } from '@linkloom/shared';
import { docSet, pagedList, parsed, run, signInAs } from '../../../testing/fixtures.js';
import RunsRoute from './runs-route.js';

afterEach(() => vi.unstubAllGlobals());

const NONE = { total: 0, items: [] };
const NO_CHANGE = { appeared: NONE, disappeared: NONE };

function api() {
  return fakeFetch({
    'GET /api/doc-sets/d1': () => ({ body: docSet('d1', 'Handbook') }),
    'GET /api/doc-sets/d1/runs': () => ({ body: pagedList([run('r1', 1), run('r3', 3), run('r2', 2)], 1, 500) }),
    'GET /api/doc-sets/d1/runs/r3/diff': () => ({
      body: parsed(runDiffSchema, {
        runId: 'r3',
        againstRunId: 'r1',
        kinds: {
          pages: NO_CHANGE,
          orphans: NO_CHANGE,
          deadEnds: NO_CHANGE,
          unreachable: NO_CHANGE,
          deepPages: NO_CHANGE,
          islandPages: NO_CHANGE,
          brokenLinks: { appeared: { total: 1, items: [{ sourcePath: 'guide/a.md', href: 'gone.md' }] }, disappeared: NONE },
          brokenAnchors: NO_CHANGE,
          unsafeLinks: NO_CHANGE,
          ambiguousLinks: NO_CHANGE,
        },
        scoreMoves: [{ path: 'index.md', title: 'Welcome', before: 0.05, after: 0.08, change: 0.03 }],
      }),
    }),
    'POST /api/doc-sets/d1/runs': () => ({
      status: 202,
      body: { run: run('r4', 4, { status: 'queued', counts: null, finishedAt: null }) },
    }),
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
    expect(await screen.findByText('guide/a.md → gone.md', { exact: false })).toBeTruthy();
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
