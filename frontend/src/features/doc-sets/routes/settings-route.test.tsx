import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { docSet, pagedList, run, signInAs } from '../../../testing/fixtures.js';
import SettingsRoute from './settings-route.js';

afterEach(() => vi.unstubAllGlobals());

function api() {
  return fakeFetch({
    'GET /api/doc-sets/d1': () => ({ body: docSet('d1', 'Operator handbook') }),
    'PATCH /api/doc-sets/d1': () => ({ body: docSet('d1', 'Operator handbook') }),
    'POST /api/doc-sets/d1/runs': () => ({
      status: 202,
      body: { run: run('r9', 9, { status: 'queued', counts: null, finishedAt: null }) },
    }),
    'GET /api/doc-sets/d1/tokens': () => ({ body: pagedList([]) }),
  });
}

const render = () =>
  renderWithProviders(<SettingsRoute />, {
    route: '/doc-sets/d1/settings',
    path: '/doc-sets/:docSetId/settings',
    extraRoutes: [{ path: '/doc-sets/:docSetId/runs', element: <p>runs list</p> }],
  });

describe('settings', () => {
  it('refuses an out-of-range damping factor without calling the server', async () => {
    signInAs('editor');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    render();
    const damping = await screen.findByLabelText('Damping factor');
    fireEvent.change(damping, { target: { value: '1.2' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByText('must be below 1')).toBeTruthy();
    expect(fake.calls.some((c) => c.method === 'PATCH')).toBe(false);
  });

  it('saves the changed settings, then starts a run', async () => {
    signInAs('editor');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    render();
    fireEvent.change(await screen.findByLabelText('Entry pages'), { target: { value: 'index.md\nstart/here.md' } });
    await userEvent.click(screen.getByRole('button', { name: 'Save and re-analyse' }));
    expect(await screen.findByText('runs list')).toBeTruthy();
    const patch = fake.calls.find((c) => c.method === 'PATCH');
    expect((patch?.body as { settings: { entryPages: string[] } }).settings.entryPages).toEqual(['index.md', 'start/here.md']);
    const order = fake.calls.filter((c) => c.method !== 'GET').map((c) => c.method);
    expect(order).toEqual(['PATCH', 'POST']);
  });

  it('shows viewers the settings without save buttons or tokens', async () => {
    signInAs('viewer');
    vi.stubGlobal('fetch', api().fn);
    render();
    expect(await screen.findByText(/You can read these settings/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Save' })).toBeNull();
    expect(screen.queryByText('API tokens')).toBeNull();
    await waitFor(() => expect(screen.getByLabelText('Damping factor').hasAttribute('readonly')).toBe(true));
  });
});
