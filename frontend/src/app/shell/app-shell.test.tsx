import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import { fakeFetch, renderWithProviders } from '../../testing/render.js';
import { docSet, signInAs } from '../../testing/fixtures.js';
import { AppShell } from './app-shell.js';

afterEach(() => vi.unstubAllGlobals());

function api(demo: boolean) {
  return fakeFetch({
    'GET /api/health': () => ({ body: { status: 'ok', database: 'pglite', version: '0.1.0', demo } }),
    'GET /api/doc-sets/d1': () => ({ body: docSet('d1', 'Operator handbook') }),
  });
}

describe('app shell', () => {
  it('lists the open doc set’s sections, marks the current one, and shows the demo notice', async () => {
    signInAs('viewer');
    vi.stubGlobal('fetch', api(true).fn);
    renderWithProviders(<AppShell />, { route: '/doc-sets/d1/runs', path: '/doc-sets/:docSetId/*' });
    const nav = await screen.findByRole('navigation', { name: 'Operator handbook' });
    const labels = within(nav)
      .getAllByRole('link')
      .map((a) => a.textContent);
    expect(labels).toEqual(['Overview', 'Pages', 'Findings', 'Link map', 'Search', 'Runs', 'Settings']);
    expect(within(nav).getByRole('link', { name: 'Runs' }).getAttribute('aria-current')).toBe('page');
    expect(await screen.findByText(/Demo data/)).toBeTruthy();
    // A viewer sees no administration entries, and reads all tasks: never assigned one, they have no "My tasks".
    expect(screen.queryByRole('link', { name: 'Users' })).toBeNull();
    expect(screen.getByRole('link', { name: 'Tasks' }).getAttribute('href')).toBe('/tasks');
    expect(screen.queryByRole('link', { name: 'My tasks' })).toBeNull();
  });

  it('gives writers "My tasks" and not the readers’ "Tasks" entry', async () => {
    signInAs('writer');
    vi.stubGlobal('fetch', api(false).fn);
    renderWithProviders(<AppShell />, { route: '/', path: '/*' });
    expect(await screen.findByRole('link', { name: 'My tasks' })).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Tasks' })).toBeNull();
  });

  it('gives admins the Users entry and hides the demo notice on real data', async () => {
    signInAs('admin');
    const fake = api(false);
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<AppShell />, { route: '/', path: '/*' });
    expect(await screen.findByRole('link', { name: 'Users' })).toBeTruthy();
    await vi.waitFor(() => expect(fake.calls.some((c) => c.url.pathname === '/api/health')).toBe(true));
    expect(screen.queryByText(/Demo data/)).toBeNull();
    expect(screen.queryByRole('navigation', { name: 'Operator handbook' })).toBeNull();
  });
});
