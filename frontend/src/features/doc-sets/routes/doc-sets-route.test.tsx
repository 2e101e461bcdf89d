import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { signInAs } from '../../../testing/fixtures.js';
import DocSetsRoute from './doc-sets-route.js';

afterEach(() => vi.unstubAllGlobals());

const item = (id: string, title: string, outcome: 'reopened' | null) => ({
  id,
  docSetId: 'd1',
  docSetName: 'Harbour guides',
  pagePath: `${id}.md`,
  kind: 'repair-broken-links',
  title,
  details: '',
  finding: {},
  assignee: { id: 'u1', name: 'Ada', email: 'ada@example.test' },
  priority: 'normal',
  dueDate: null,
  overdue: false,
  status: 'open',
  verification: null,
  verifiedAt: null,
  check: outcome ? { runId: 'r5', runNumber: 5, at: '2026-12-02T02:00:00Z', outcome, items: [] } : null,
  createdAt: '2026-12-01T10:00:00Z',
  updatedAt: '2026-12-01T10:00:00Z',
});

function api(tasks: unknown[]) {
  return fakeFetch({
    'GET /api/doc-sets': () => ({
      body: { items: [{ id: 'd1', name: 'Harbour guides', settings: {} }], total: 1, page: 1, pageSize: 500 },
    }),
    'GET /api/tasks': () => ({ body: { items: tasks, total: tasks.length, page: 1, pageSize: 50 } }),
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
