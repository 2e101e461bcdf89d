import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { assigneeSchema } from '@linkloom/shared';
import { pagedList, parsed, signInAs, task } from '../../../testing/fixtures.js';
import { CreateTasksDialog } from './create-tasks-dialog.js';

afterEach(() => vi.unstubAllGlobals());

const WREN = parsed(assigneeSchema, { id: 'u-w', name: 'Wren Writer', email: 'w@x.test', role: 'writer' });

function api() {
  return fakeFetch({
    'GET /api/tasks/assignees': () => ({
      body: pagedList([WREN], 1, 1),
    }),
    'POST /api/tasks/bulk': () => ({
      status: 201,
      body: {
        items: [
          task('t1', { pagePath: 'a.md', assignee: { id: WREN.id, name: WREN.name, email: WREN.email } }),
          task('t2', { pagePath: 'b.md', assignee: { id: WREN.id, name: WREN.name, email: WREN.email } }),
        ],
      },
    }),
  });
}

const render = (request: Parameters<typeof CreateTasksDialog>[0]['request'], onClose = vi.fn()) =>
  renderWithProviders(<CreateTasksDialog request={request} onClose={onClose} />, {
    route: '/doc-sets/d1/findings',
    path: '/doc-sets/:docSetId/findings',
  });

describe('create tasks dialog', () => {
  it('creates one task per selected page for the chosen writer', async () => {
    signInAs('editor');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const onClose = vi.fn();
    const user = userEvent.setup();
    render({ pagePaths: ['a.md', 'b.md'], kind: 'add-inbound-links' }, onClose);
    expect(await screen.findByText('Create tasks for 2 selected findings', { selector: 'h2' })).toBeTruthy();
    await user.click(screen.getByLabelText('Assignee'));
    await user.click(await screen.findByRole('option', { name: 'Wren Writer (writer)' }));
    await user.click(screen.getByRole('button', { name: 'Create 2 tasks' }));
    await vi.waitFor(() => expect(onClose).toHaveBeenCalled());
    const post = fake.calls.find((c) => c.method === 'POST')!;
    expect(post.body).toMatchObject({
      docSetId: 'd1',
      kind: 'add-inbound-links',
      pagePaths: ['a.md', 'b.md'],
      grouping: 'per-row',
      assigneeId: 'u-w',
    });
  });

  it('lists exactly the selected links and can make them one grouped task', async () => {
    signInAs('editor');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const user = userEvent.setup();
    const links = [
      { sourcePath: 'cranes.md', href: '../safety/lockout.md', line: 12 },
      { sourcePath: 'cranes.md', href: 'torque.md', line: 40 },
    ];
    render({ kind: 'repair-broken-links', pagePaths: ['cranes.md'], links });
    const listed = await screen.findByRole('list', { name: 'Selected findings' });
    expect(
      within(listed)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual(['../safety/lockout.mdcranes.md, line 12', 'torque.mdcranes.md, line 40']);
    await user.click(screen.getByLabelText('One task listing all of them'));
    // One task now, so it may have its own title.
    await user.type(screen.getByLabelText('Title'), 'Fix the crane links');
    await user.click(screen.getByRole('button', { name: 'Create task' }));
    await vi.waitFor(() => expect(fake.calls.some((c) => c.method === 'POST')).toBe(true));
    const post = fake.calls.find((c) => c.method === 'POST')!;
    expect(post.body).toEqual(expect.objectContaining({ links, grouping: 'grouped', title: 'Fix the crane links' }));
    expect(post.body).not.toHaveProperty('pagePaths');
  });

  it('renders nothing for writers, who cannot create tasks', () => {
    signInAs('writer');
    vi.stubGlobal('fetch', api().fn);
    render({ pagePaths: ['a.md'], kind: 'other' });
    expect(screen.queryByRole('dialog')).toBeNull();
  });
});
