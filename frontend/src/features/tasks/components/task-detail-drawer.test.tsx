import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { TaskDetail } from '@linkloom/shared';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { signInAs } from '../../../testing/fixtures.js';
import { TaskDetailDrawer } from './task-detail-drawer.js';

afterEach(() => vi.unstubAllGlobals());

const task = (over: Partial<TaskDetail> = {}): TaskDetail => ({
  id: 't1',
  docSetId: 'd1',
  docSetName: 'Harbour guides',
  pagePath: 'cranes.md',
  kind: 'repair-broken-links',
  title: 'Repair 2 broken links on cranes.md',
  details: '',
  finding: {
    brokenLinks: [
      { sourcePath: 'cranes.md', href: 'lockout.md', line: 12, status: 'broken' },
      { sourcePath: 'cranes.md', href: 'torque.md#table', line: 40, status: 'broken-anchor' },
    ],
  },
  assignee: { id: 'u1', name: 'Ada', email: 'ada@example.test' },
  priority: 'normal',
  dueDate: null,
  overdue: false,
  status: 'done',
  verification: 'flagged',
  verifiedAt: '2026-12-02T02:00:00Z',
  check: {
    runId: 'r7',
    runNumber: 7,
    at: '2026-12-02T02:00:00Z',
    outcome: 'still-found',
    items: [
      { pagePath: 'cranes.md', href: 'lockout.md', line: 12, stillFound: false, status: null },
      { pagePath: 'cranes.md', href: 'torque.md#table', line: 41, stillFound: true, status: 'broken-anchor' },
    ],
  },
  createdAt: '2026-12-01T10:00:00Z',
  updatedAt: '2026-12-02T02:00:00Z',
  events: [],
  ...over,
});

const open = (detail: TaskDetail) => {
  vi.stubGlobal('fetch', fakeFetch({ 'GET /api/tasks/t1': () => ({ body: detail }) }).fn);
  renderWithProviders(<TaskDetailDrawer taskId="t1" onClose={() => undefined} />);
};

describe('task detail', () => {
  it('names, link by link, what the latest run still finds', async () => {
    signInAs('writer');
    open(task());
    const list = await screen.findByRole('region', { name: 'Findings of this task' });
    expect(within(list).getByText('As run 7 sees them.')).toBeTruthy();
    const rows = within(list)
      .getAllByRole('listitem')
      .map((li) => li.textContent);
    expect(rows).toEqual(['lockout.mdcranes.md, line 12gone', 'torque.md#tablecranes.md, line 41 · broken-anchorstill found']);
    expect(screen.getByText('Still found')).toBeTruthy();
  });

  it('shows "fixed and verified by run N" as its own state, which a person cannot choose', async () => {
    signInAs('writer');
    open(
      task({
        status: 'verified',
        verification: 'verified',
        check: { ...task().check!, outcome: 'verified', items: task().check!.items.map((i) => ({ ...i, stillFound: false })) },
      }),
    );
    expect(await screen.findAllByText('Fixed and verified by run 7')).toBeTruthy();
    await userEvent.click(screen.getByRole('combobox', { name: 'Status' }));
    const options = await screen.findAllByRole('option');
    expect(options.map((o) => [o.textContent, o.getAttribute('aria-disabled') === 'true'])).toEqual([
      ['Fixed and verified by run 7', true],
      ['Open', false],
      ['In progress', false],
      ['Done', false],
      ['Won’t fix', false],
    ]);
  });
});
