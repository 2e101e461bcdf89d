import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { pagedList, signInAs } from '../../../testing/fixtures.js';
import TasksRoute from './tasks-route.js';

afterEach(() => vi.unstubAllGlobals());

function api() {
  return fakeFetch({
    'GET /api/tasks': () => ({ body: pagedList([]) }),
    'GET /api/tasks/assignees': () => ({ body: pagedList([], 1, 0) }),
    'GET /api/doc-sets': () => ({ body: pagedList([], 1, 500) }),
  });
}

describe('tasks screen by role', () => {
  it('lets a viewer read all tasks, without "My tasks" and without hints about creating tasks', async () => {
    signInAs('viewer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<TasksRoute />, { route: '/tasks' });
    expect(await screen.findByRole('heading', { name: 'Tasks' })).toBeTruthy();
    expect(screen.queryByRole('tab', { name: 'My tasks' })).toBeNull();
    expect(await screen.findByText('No tasks match these filters.')).toBeTruthy();
    expect(screen.queryByText(/Create tasks/)).toBeNull();
    const query = fake.calls.find((c) => c.url.pathname === '/api/tasks')!.url.searchParams;
    expect(query.get('assignee')).toBeNull();
  });

  it('gives an editor both lists and the hint where tasks come from', async () => {
    signInAs('editor');
    vi.stubGlobal('fetch', api().fn);
    renderWithProviders(<TasksRoute />, { route: '/tasks?view=all' });
    expect(await screen.findByRole('tab', { name: 'My tasks' })).toBeTruthy();
    expect(await screen.findByText('Create tasks from a page or from the findings lists.')).toBeTruthy();
  });
});
