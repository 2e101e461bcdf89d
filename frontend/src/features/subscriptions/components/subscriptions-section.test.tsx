import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { docSet, pagedList, signInAs } from '../../../testing/fixtures.js';
import { SubscriptionsSection } from './subscriptions-section.js';

afterEach(() => vi.unstubAllGlobals());

const HARBOUR = '11111111-1111-4111-8111-111111111111';
const FERRY = '22222222-2222-4222-8222-222222222222';

function api() {
  let stored = [
    { docSetId: HARBOUR, digest: true, nothingChanged: false },
    { docSetId: FERRY, digest: false, nothingChanged: false },
  ];
  return fakeFetch({
    'GET /api/me/subscriptions': () => ({ body: { subscriptions: stored } }),
    'PUT /api/me/subscriptions': (_url, init) => {
      stored = (JSON.parse(String(init?.body)) as { subscriptions: typeof stored }).subscriptions;
      return { body: { subscriptions: stored } };
    },
    'GET /api/doc-sets': () => ({ body: pagedList([docSet(HARBOUR, 'Harbour guides'), docSet(FERRY, 'Ferry manuals')]) }),
  });
}

const lastPut = (calls: ReturnType<typeof api>['calls']) => calls.filter((c) => c.method === 'PUT').at(-1)?.body;

describe('digest subscriptions', () => {
  it('sends the whole list with the changed switch in the PUT body', async () => {
    signInAs('writer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<SubscriptionsSection />);

    const ferryDigest = await screen.findByRole('switch', { name: 'Nightly digest for Ferry manuals' });
    const ferryQuiet = screen.getByRole('switch', { name: 'Also when nothing changed for Ferry manuals' }) as HTMLInputElement;
    expect(ferryQuiet.disabled).toBe(true);

    await userEvent.click(ferryDigest);
    await vi.waitFor(() =>
      expect(lastPut(fake.calls)).toEqual({
        subscriptions: [
          { docSetId: HARBOUR, digest: true, nothingChanged: false },
          { docSetId: FERRY, digest: true, nothingChanged: false },
        ],
      }),
    );
    await vi.waitFor(() => expect(ferryQuiet.disabled).toBe(false));
    expect(await screen.findByText('All choices saved.')).toBeTruthy();

    await userEvent.click(screen.getByRole('switch', { name: 'Also when nothing changed for Harbour guides' }));
    await vi.waitFor(() =>
      expect(lastPut(fake.calls)).toEqual({
        subscriptions: [
          { docSetId: HARBOUR, digest: true, nothingChanged: true },
          { docSetId: FERRY, digest: true, nothingChanged: false },
        ],
      }),
    );
  });

  it('clears "also when nothing changed" when the digest is turned off', async () => {
    signInAs('writer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<SubscriptionsSection />);
    await userEvent.click(await screen.findByRole('switch', { name: 'Also when nothing changed for Harbour guides' }));
    await vi.waitFor(() => expect(fake.calls.filter((c) => c.method === 'PUT')).toHaveLength(1));
    await screen.findByText('All choices saved.');
    await userEvent.click(screen.getByRole('switch', { name: 'Nightly digest for Harbour guides' }));
    await vi.waitFor(() =>
      expect(lastPut(fake.calls)).toEqual({
        subscriptions: [
          { docSetId: HARBOUR, digest: false, nothingChanged: false },
          { docSetId: FERRY, digest: false, nothingChanged: false },
        ],
      }),
    );
    await vi.waitFor(() =>
      expect((screen.getByRole('switch', { name: 'Also when nothing changed for Harbour guides' }) as HTMLInputElement).disabled).toBe(
        true,
      ),
    );
  });
});
