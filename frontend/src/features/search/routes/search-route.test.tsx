import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { searchResultSchema } from '@linkloom/shared';
import { pagedList, parsed, signInAs } from '../../../testing/fixtures.js';
import SearchRoute from './search-route.js';

afterEach(() => vi.unstubAllGlobals());

const ATTACK = '<img src=x onerror="window.__hit=1">';

function api() {
  return fakeFetch({
    'GET /api/doc-sets/d1/runs/latest/search': (url) => ({
      body: parsed(searchResultSchema, {
        ...pagedList([
          {
            path: 'brakes/bleeding.md',
            title: `Bleeding ${ATTACK} brakes`,
            snippet: `Before you «bleed» the lines ${ATTACK} check the «pads».`,
            textRank: 0.42,
            stationaryScore: 0.031,
            score: 0.37,
            why: `Strong text match; linked from 9 pages (${url.searchParams.get('mode')})`,
          },
        ]),
        mode: url.searchParams.get('mode') === 'subgraph' ? 'subgraph' : 'blend',
        capped: false,
        explanation: 'Ranked by text match and link score.',
      }),
    }),
  });
}

describe('search', () => {
  it('marks the server highlights and renders any HTML in titles and snippets as plain text', async () => {
    signInAs('viewer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    const user = userEvent.setup();
    const { container, router } = renderWithProviders(<SearchRoute />, {
      route: '/doc-sets/d1/search',
      path: '/doc-sets/:docSetId/search',
    });
    await user.type(screen.getByLabelText('Words to find'), 'bleed pads{Enter}');
    await screen.findByText(/Strong text match/);
    expect(router.state.location.search).toBe('?q=bleed+pads');

    const marks = [...container.querySelectorAll('mark')].map((m) => m.textContent);
    expect(marks).toEqual(['bleed', 'pads']);
    // The injected markup is visible text, not an element.
    expect(container.querySelector('img')).toBeNull();
    expect((window as unknown as { __hit?: number }).__hit).toBeUndefined();
    expect(screen.getByRole('link', { name: `Bleeding ${ATTACK} brakes` })).toBeTruthy();
    expect(screen.getByText(ATTACK, { exact: false, selector: 'span' })).toBeTruthy();
    expect(screen.getByText('0.420')).toBeTruthy();
    expect(screen.getByText('0.370')).toBeTruthy();

    await user.click(screen.getByRole('button', { name: 'Link score among matches' }));
    await waitFor(() => expect(fake.calls.at(-1)?.url.searchParams.get('mode')).toBe('subgraph'));
    expect(await screen.findByText(/\(subgraph\)/)).toBeTruthy();
  });
});
