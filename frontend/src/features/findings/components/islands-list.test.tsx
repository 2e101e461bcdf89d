import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import { islandListSchema, type Island } from '@linkloom/shared';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { pagedList, parsed, signInAs } from '../../../testing/fixtures.js';
import { IslandsList } from './islands-list.js';

afterEach(() => vi.unstubAllGlobals());

// The islands route's answer, typed from and parsed by the shared schema: the list once printed
// "undefined pages" because it read `size` where the server sends `pageCount`.
const GALA: Island = {
  islandId: 1,
  pageCount: 2,
  pages: [
    { path: 'events/gala/plan.md', title: 'Gala plan', stationaryScore: 0.004 },
    { path: 'events/gala/budget.md', title: '', stationaryScore: 0.002 },
  ],
};
// The server lists at most 200 pages of an island; `pageCount` counts them all.
const KIOSK: Island = {
  islandId: 2,
  pageCount: 340,
  pages: [{ path: 'legacy/kiosk/index.md', title: 'Kiosk (legacy)', stationaryScore: 0.003 }],
};

function render(islands: Island[]) {
  const fake = fakeFetch({ 'GET /api/doc-sets/d1/runs/r1/islands': () => ({ body: parsed(islandListSchema, pagedList(islands)) }) });
  vi.stubGlobal('fetch', fake.fn);
  renderWithProviders(<IslandsList docSetId="d1" runId="r1" />);
  return fake;
}

describe('islands list', () => {
  it('shows each island with its page count, largest first, and says when not all pages are listed', async () => {
    signInAs('viewer');
    render([GALA, KIOSK]);
    const summaries = await screen.findAllByText(/^Island \d: /);
    expect(summaries.map((s) => s.textContent)).toEqual(['Island 1: 340 pages', 'Island 2: 2 pages']);
    expect(screen.getByText('Showing 1 of 340 pages.')).toBeTruthy();
    expect(screen.queryByText(/undefined/)).toBeNull();
  });

  it('links each page to its detail, by title or else by path, and says "1 page" for one', async () => {
    signInAs('viewer');
    render([{ ...GALA, pageCount: 1, pages: GALA.pages.slice(1) }]);
    expect(await screen.findByText('Island 1: 1 page')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'events/gala/budget.md' }).getAttribute('href')).toContain('events%2Fgala%2Fbudget.md');
  });
});
