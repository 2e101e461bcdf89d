import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { assigneeSchema } from '@linkloom/shared';
import { pagedList, parsed, signInAs } from '../../../testing/fixtures.js';
import { task } from '../testing-fixtures.js';
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

describe('create tasks dialog', () => {
  it('creates one task per selected page for the chosen writer', async () => {
    signInAs('editor');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const onClose = vi.fn();
    const user = userEvent.setup();
    renderWithProviders(<CreateTasksDialog request={{ pagePaths: ['a.md', 'b.md'], kind: 'add-inbound-links' }} onClose={onClose} />, {
      route: '/doc-sets/d1/findings',
      path: '/doc-sets/:docSetId/findings',
    });
    expect(await screen.findByText('Create 2 tasks', { selector: 'h2' })).toBeTruthy();
    await user.click(screen.getByLabelText('Assignee'));
    await user.click(await screen.findByRole('option', { name: 'Wren Writer (writer)' }));
    await user.click(screen.getByRole('button', { name: 'Create 2 tasks' }));
    await vi.waitFor(() => expect(onClose).toHaveBeenCalled());
    const post = fake.calls.find((c) => c.method === 'POST')!;
    expect(post.body).toMatchObject({
      docSetId: 'd1',
      kind: 'add-inbound-links',
      pagePaths: ['a.md', 'b.md'],
      assigneeId: 'u-w',
      priority: 'normal',
    });
  });

  it('renders nothing for writers, who cannot create tasks', () => {
    signInAs('writer');
    vi.stubGlobal('fetch', api().fn);
    renderWithProviders(<CreateTasksDialog request={{ pagePaths: ['a.md'], kind: 'other' }} onClose={() => undefined} />, {
      route: '/doc-sets/d1/page',
      path: '/doc-sets/:docSetId/page',
    });
    expect(screen.queryByRole('dialog')).toBeNull();
  });
});
