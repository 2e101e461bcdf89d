import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import type { TaskItem } from '@linkloom/shared';
import { docSet, pagedList, signInAs, task } from '../../../testing/fixtures.js';
import DocSetsRoute from './doc-sets-route.js';

afterEach(() => vi.unstubAllGlobals());

// Tasks and doc sets as the server answers them, parsed by the shared schemas like real answers.
const item = (id: string, title: string, outcome: 'reopened' | null) =>
  task(id, {
    docSetName: 'Harbour guides',
    pagePath: `${id}.md`,
    kind: 'repair-broken-links',
    title,
    assignee: { id: 'u1', name: 'Ada', email: 'ada@example.test' },
    check: outcome ? { runId: 'r5', runNumber: 5, at: '2026-12-02T02:00:00Z', outcome, items: [] } : null,
  });

function api(tasks: TaskItem[]) {
  return fakeFetch({
    'GET /api/doc-sets': () => ({
      body: pagedList([docSet('d1', 'Harbour guides')], 1, 500),
    }),
    'GET /api/tasks': () => ({ body: pagedList(tasks) }),
  });
}

describe('home screen', () => {
  it('shows a writer their open tasks first, reopened ones at the top, before the doc sets', async () => {
    signInAs('writer');
    const fake = api([item('a', 'Link the tide tables', null), item('b', 'Repair the crane links', 'reopened')]);
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<DocSetsRoute />);
    const panel = await screen.findByRole('region', { name: 'Your open tasks' });
    const titles = await within(panel).findAllByRole('link', { name: /Link the|Repair the/ });
    expect(titles.map((t) => t.textContent)).toEqual(['Repair the crane links', 'Link the tide tables']);
    expect(within(panel).getByText('Reopened by run 5')).toBeTruthy();
    const heading = await screen.findByRole('heading', { name: 'Doc sets' });
    // The doc sets come after the tasks: the heading follows the panel in the page.
    expect(panel.compareDocumentPosition(heading) & Node.DOCUMENT_POSITION_FOLLOWING).toBeTruthy();
    const query = fake.calls.find((c) => c.url.pathname === '/api/tasks')!.url.searchParams;
    expect([query.get('assignee'), query.get('status')]).toEqual(['me', 'open,in-progress']);
  });

  it('shows viewers no task panel, and editors one only when they have open tasks', async () => {
    signInAs('viewer');
    vi.stubGlobal('fetch', api([]).fn);
    const { unmount } = renderWithProviders(<DocSetsRoute />);
    expect(await screen.findByText('Harbour guides')).toBeTruthy();
    expect(screen.queryByRole('region', { name: 'Your open tasks' })).toBeNull();
    unmount();
    signInAs('editor');
    renderWithProviders(<DocSetsRoute />);
    expect(await screen.findByText('Harbour guides')).toBeTruthy();
    await vi.waitFor(() => expect(screen.queryByRole('region', { name: 'Your open tasks' })).toBeNull());
  });
});
