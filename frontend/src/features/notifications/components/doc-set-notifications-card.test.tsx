import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { notificationSettingsSchema } from '@linkloom/shared';
import { parsed, signInAs } from '../../../testing/fixtures.js';
import { DocSetNotificationsCard } from './doc-set-notifications-card.js';

afterEach(() => vi.unstubAllGlobals());

const D1 = '11111111-1111-4111-8111-111111111111';
const settings = (digestKind: boolean) =>
  parsed(notificationSettingsSchema, {
    timeZone: 'UTC',
    timeZoneIsDefault: true,
    kinds: { digest: digestKind, 'task-assigned': true, 'task-reopened': true, 'pruning-waiting': true },
    docSets: [{ docSetId: D1, docSetName: 'Harbour guides', digest: true, nothingChanged: false, pruningWaiting: true }],
  });

describe('e-mail choices on a doc set', () => {
  it('changes this doc set’s digest from its own screen', async () => {
    signInAs('editor');
    const fake = fakeFetch({
      'GET /api/me/notifications': () => ({ body: settings(true) }),
      'PATCH /api/me/notifications': () => ({ body: settings(true) }),
    });
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<DocSetNotificationsCard docSetId={D1} />);
    await userEvent.click(await screen.findByRole('switch', { name: 'Also when nothing changed' }));
    await vi.waitFor(() =>
      expect(fake.calls.find((c) => c.method === 'PATCH')?.body).toEqual({ docSets: [{ docSetId: D1, nothingChanged: true }] }),
    );
    expect(screen.getByRole('link', { name: 'All notification settings' }).getAttribute('href')).toBe('/account/notifications');
  });

  it('says when digests are switched off for every doc set', async () => {
    signInAs('writer');
    vi.stubGlobal('fetch', fakeFetch({ 'GET /api/me/notifications': () => ({ body: settings(false) }) }).fn);
    renderWithProviders(<DocSetNotificationsCard docSetId={D1} />);
    expect((await screen.findByRole('note')).textContent).toContain('You switched off all digests under Notifications');
    expect(screen.queryByRole('switch', { name: 'Pruning list waiting' })).toBeNull();
  });
});
