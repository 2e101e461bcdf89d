import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { unsubscribeInfoSchema, unsubscribeResultSchema } from '@linkloom/shared';
import { clearSession } from '../../../lib/session.js';
import { parsed } from '../../../testing/fixtures.js';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import UnsubscribeRoute from './unsubscribe-route.js';

afterEach(() => vi.unstubAllGlobals());

const info = parsed(unsubscribeInfoSchema, {
  kind: 'digest',
  kindLabel: 'Digest of what changed',
  maskedEmail: 'w•••@example.test',
  subscribed: true,
});

describe('unsubscribe page', () => {
  it('changes nothing on opening, and unsubscribes on the button, without signing in', async () => {
    clearSession();
    const fake = fakeFetch({
      'GET /api/unsubscribe/tok.en.sig': () => ({ body: info }),
      'POST /api/unsubscribe/tok.en.sig': () => ({
        body: parsed(unsubscribeResultSchema, {
          ...info,
          subscribed: false,
          message: 'You will get no more e-mails of the kind “Digest of what changed”.',
        }),
      }),
    });
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<UnsubscribeRoute />, { route: '/unsubscribe/tok.en.sig', path: '/unsubscribe/:token' });
    expect(await screen.findByText('w•••@example.test', { exact: false })).toBeTruthy();
    expect(fake.calls.filter((c) => c.method === 'POST')).toHaveLength(0);
    await userEvent.click(screen.getByRole('button', { name: 'Unsubscribe' }));
    expect((await screen.findByRole('status')).textContent).toContain('no more e-mails');
    expect(fake.calls.filter((c) => c.method === 'POST')).toHaveLength(1);
  });

  it('explains a link that does not work, in the server’s words', async () => {
    clearSession();
    vi.stubGlobal(
      'fetch',
      fakeFetch({
        'GET /api/unsubscribe/bad': () => ({
          status: 400,
          body: {
            statusCode: 400,
            code: 'UNSUBSCRIBE_LINK_INVALID',
            message: 'This unsubscribe link is not valid; copy the whole link from the e-mail.',
          },
        }),
      }).fn,
    );
    renderWithProviders(<UnsubscribeRoute />, { route: '/unsubscribe/bad', path: '/unsubscribe/:token' });
    expect(await screen.findByText('This link does not work')).toBeTruthy();
    expect(screen.getByText(/copy the whole link/)).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Unsubscribe' })).toBeNull();
  });
});
