import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { signInAs } from '../../../testing/fixtures.js';
import PruningRoute from './pruning-route.js';

afterEach(() => vi.unstubAllGlobals());

const item = (path: string) => ({
  path,
  title: path,
  reasons: [
    { rule: 'orphan', detail: 'No other page links here.' },
    { rule: 'thin', detail: '12 words (fewer than 80).' },
  ],
  inLatestRun: true,
  inboundCount: 0,
  stationaryScore: 0.01,
  wordCount: 12,
  reviewedAt: null,
  firstProposedAt: '2026-01-01T00:00:00Z',
  nominations: [],
  decision: null,
});

function api(conflict = false) {
  return fakeFetch({
    'GET /api/doc-sets/d1/pruning': () => ({
      body: {
        items: [item('guide/old.md'), item('guide/stub.md')],
        total: 2,
        page: 1,
        pageSize: 50,
        version: 7,
        runId: 'r1',
        rules: { lowScorePercentile: 20, staleDays: 365, thinWordCount: 80, protectGlobs: ['legal/**'] },
      },
    }),
    'POST /api/doc-sets/d1/pruning/decisions': () =>
      conflict
        ? { status: 409, body: { statusCode: 409, code: 'PRUNING_LIST_CHANGED', message: 'changed' } }
        : { body: { version: 8, decided: 2 } },
  });
}

const render = () => renderWithProviders(<PruningRoute />, { route: '/doc-sets/d1/pruning', path: '/doc-sets/:docSetId/pruning' });

describe('pruning list screen', () => {
  it('shows the rules, each candidate’s reasons and the caution, with no decision buttons for writers', async () => {
    signInAs('writer');
    vi.stubGlobal('fetch', api().fn);
    render();
    expect(await screen.findByText('guide/old.md')).toBeTruthy();
    expect(screen.getByText(/Linkloom never deletes documentation/)).toBeTruthy();
    expect(screen.getByText(/records-retention and compliance rules/)).toBeTruthy();
    expect(screen.getByText(/lowest 20%/)).toBeTruthy();
    expect(screen.getAllByLabelText('Thin: 12 words (fewer than 80).')).toHaveLength(2);
    expect(screen.queryByRole('button', { name: /^Approve/ })).toBeNull();
    expect(screen.queryByRole('checkbox', { name: /Select/ })).toBeNull();
  });

  it('lets an editor approve two pages in bulk with a note, sending the list version', async () => {
    signInAs('editor');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const user = userEvent.setup();
    render();
    await screen.findByText('guide/old.md');
    await user.click(screen.getByRole('checkbox', { name: 'Select all rows on this page' }));
    await user.click(screen.getByRole('button', { name: 'Approve selected' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText(/Note/), 'Superseded by the new berth guide');
    await user.click(within(dialog).getByRole('button', { name: 'Approve' }));
    await vi.waitFor(() => expect(fake.calls.some((c) => c.method === 'POST')).toBe(true));
    const post = fake.calls.find((c) => c.method === 'POST')!;
    expect(post.body).toEqual({
      version: 7,
      decisions: [
        { path: 'guide/old.md', decision: 'approve', note: 'Superseded by the new berth guide' },
        { path: 'guide/stub.md', decision: 'approve', note: 'Superseded by the new berth guide' },
      ],
    });
  });

  it('explains a 409 from a concurrent decision and keeps the dialog open', async () => {
    signInAs('editor');
    vi.stubGlobal('fetch', api(true).fn);
    const user = userEvent.setup();
    render();
    await user.click(await screen.findByRole('button', { name: 'Keep guide/old.md' }));
    await user.click(within(await screen.findByRole('dialog')).getByRole('button', { name: 'Keep' }));
    expect(await screen.findByText(/Someone changed this list/)).toBeTruthy();
  });
});
