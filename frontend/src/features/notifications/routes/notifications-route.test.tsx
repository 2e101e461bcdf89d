import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { NotificationSettings } from '@linkloom/shared';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { signInAs } from '../../../testing/fixtures.js';
import NotificationsRoute from './notifications-route.js';

afterEach(() => vi.unstubAllGlobals());

const HARBOUR = '11111111-1111-4111-8111-111111111111';

function api(failPatch = false) {
  let stored: NotificationSettings = {
    timeZone: 'UTC',
    timeZoneIsDefault: true,
    kinds: { digest: true, 'task-assigned': true, 'task-reopened': true, 'pruning-waiting': true },
    docSets: [{ docSetId: HARBOUR, docSetName: 'Harbour guides', digest: true, nothingChanged: false, pruningWaiting: true }],
  };
  return fakeFetch({
    'GET /api/me/notifications': () => ({ body: stored }),
    'PATCH /api/me/notifications': (_url, init) => {
      if (failPatch)
        return {
          status: 400,
          body: { statusCode: 400, code: 'VALIDATION_FAILED', message: 'The request is not valid. timeZone: is not a time zone name' },
        };
      const patch = JSON.parse(String(init?.body));
      stored = {
        ...stored,
        ...(patch.timeZone ? { timeZone: patch.timeZone, timeZoneIsDefault: false } : {}),
        kinds: { ...stored.kinds, ...patch.kinds },
      };
      return { body: stored };
    },
  });
}

const patches = (calls: ReturnType<typeof api>['calls']) => calls.filter((c) => c.method === 'PATCH').map((c) => c.body);

describe('Notifications screen', () => {
  it('offers the kinds of mail that can reach a writer, and saves one switch at a time', async () => {
    signInAs('writer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<NotificationsRoute />, { route: '/account/notifications' });
    await userEvent.click(await screen.findByRole('switch', { name: /Your task reopened by a run/ }));
    await vi.waitFor(() => expect(patches(fake.calls)).toEqual([{ kinds: { 'task-reopened': false } }]));
    // Writers do not decide on the pruning list, so its mail is not offered to them.
    expect(screen.queryByRole('switch', { name: /Pruning list waiting/ })).toBeNull();
    await userEvent.click(screen.getByRole('switch', { name: 'Digest for Harbour guides' }));
    await vi.waitFor(() => expect(patches(fake.calls).at(-1)).toEqual({ docSets: [{ docSetId: HARBOUR, digest: false }] }));
  });

  it('shows a viewer only the digest and an editor every kind', async () => {
    signInAs('viewer');
    vi.stubGlobal('fetch', api().fn);
    const { unmount } = renderWithProviders(<NotificationsRoute />, { route: '/account/notifications' });
    expect(await screen.findByRole('switch', { name: /Digest of what changed/ })).toBeTruthy();
    expect(screen.queryByRole('switch', { name: /A task assigned to you/ })).toBeNull();
    unmount();
    signInAs('editor');
    renderWithProviders(<NotificationsRoute />, { route: '/account/notifications' });
    expect(await screen.findByRole('switch', { name: /Pruning list waiting for a decision/ })).toBeTruthy();
    expect(screen.getByRole('switch', { name: 'Pruning list waiting for Harbour guides' })).toBeTruthy();
  });

  it('finds a zone by city under its current IANA name, and says when the server’s zone is used', async () => {
    signInAs('writer');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<NotificationsRoute />, { route: '/account/notifications' });
    expect(await screen.findByText("The server's zone until you choose yours.")).toBeTruthy();
    const field = screen.getByRole('combobox', { name: 'Time zone of dates in your e-mails' });
    await userEvent.clear(field);
    // Mumbai is in India's zone, Asia/Kolkata (IANA time zone database; Asia/Calcutta is its older name).
    await userEvent.type(field, 'Mumbai');
    await userEvent.click(await screen.findByRole('option', { name: /^Asia\/Kolkata \(\+05:30/ }));
    await vi.waitFor(() => expect(patches(fake.calls)).toEqual([{ timeZone: 'Asia/Kolkata' }]));
  });

  it('says when a choice was not saved, with the server’s reason', async () => {
    signInAs('writer');
    vi.stubGlobal('fetch', api(true).fn);
    renderWithProviders(<NotificationsRoute />, { route: '/account/notifications' });
    await userEvent.click(await screen.findByRole('switch', { name: /A task assigned to you/ }));
    expect(await screen.findByText('Your choice was not saved')).toBeTruthy();
    expect(screen.getByText(/is not a time zone name/)).toBeTruthy();
  });
});
