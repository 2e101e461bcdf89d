import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { mailboxMessageSchema } from '@linkloom/shared';
import { parsed, signInAs } from '../../../testing/fixtures.js';
import MailRoute from './mail-route.js';

afterEach(() => vi.unstubAllGlobals());

const hostileSubject = '<img src=x onerror="window.__mailPwned=1">';
const hostileHtml = '<p>Digest for Harbour Guides</p><script>window.__mailPwned=2</script><img src=x onerror="window.__mailPwned=3">';
const summary = {
  id: 'm1',
  messageId: '<m1@linkloom.local>',
  from: 'linkloom@example.com',
  to: ['rita@example.com'],
  subject: hostileSubject,
  receivedAt: '2026-11-30T02:10:00Z',
};

function api(mailbox: () => { status?: number; body?: unknown } = () => ({ body: { items: [summary], total: 1, page: 1, pageSize: 25 } })) {
  return fakeFetch({
    'GET /api/mail': mailbox,
    'GET /api/mail/m1': () => ({
      body: parsed(mailboxMessageSchema, { ...summary, headers: {}, text: 'Plain digest: 3 broken links fixed.', html: hostileHtml }),
    }),
    'GET /api/outbox': (url) => ({
      body: {
        items:
          url.searchParams.get('status') === 'failed'
            ? [
                {
                  id: 'o1',
                  messageId: '<o1@linkloom.local>',
                  kind: 'digest',
                  toAddress: 'rita@example.com',
                  subject: 'Nightly digest',
                  status: 'failed',
                  attempts: 8,
                  nextAttemptAt: '2026-11-30T02:40:00Z',
                  lastError: '550 mailbox unavailable',
                  docSetId: null,
                  createdAt: '2026-11-30T02:00:00Z',
                  sentAt: null,
                },
              ]
            : [],
        total: 0,
        page: 1,
        pageSize: 25,
      },
    }),
    'POST /api/outbox/deliver': () => ({ body: { sent: 2 } }),
  });
}

describe('mail admin screen', () => {
  it('shows a hostile subject as text and the HTML body only inside an iframe with an empty sandbox', async () => {
    signInAs('admin');
    vi.stubGlobal('fetch', api().fn);
    const { container } = renderWithProviders(<MailRoute />, { route: '/admin/mail' });

    // React escapes text children (react.dev, "Writing Markup with JSX" / dangerouslySetInnerHTML docs:
    // only that prop injects markup; from memory), so the subject must appear literally and create no <img>.
    const row = await screen.findByText(hostileSubject);
    expect(container.querySelector('img')).toBeNull();

    await userEvent.click(row);
    expect(await screen.findByText('Plain digest: 3 broken links fixed.')).toBeTruthy();
    expect(container.querySelector('iframe')).toBeNull();

    await userEvent.click(screen.getByRole('button', { name: 'HTML' }));
    const frame = container.querySelector('iframe')!;
    // WHATWG HTML Living Standard, "The iframe element", sandbox attribute: present with an empty value
    // turns on every restriction (no scripts, unique origin, no forms, no top navigation). Cited from memory.
    expect(frame.hasAttribute('sandbox')).toBe(true);
    expect(frame.getAttribute('sandbox')).toBe('');
    expect(frame.getAttribute('srcdoc')).toBe(hostileHtml);
    // Nothing of the body reached the app's own document, and nothing ran.
    expect(container.querySelector('script')).toBeNull();
    expect(container.querySelector('img')).toBeNull();
    expect((window as unknown as { __mailPwned?: number }).__mailPwned).toBeUndefined();
  });

  it('explains the switched-off mailbox instead of showing an error', async () => {
    signInAs('admin');
    vi.stubGlobal(
      'fetch',
      api(() => ({ status: 404, body: { statusCode: 404, code: 'MAILBOX_OFF', message: 'The local mailbox is off.' } })).fn,
    );
    renderWithProviders(<MailRoute />, { route: '/admin/mail' });
    expect(await screen.findByText('The local mailbox is off')).toBeTruthy();
    expect(screen.getByText(/sends mail through the server named in SMTP_URL/)).toBeTruthy();
  });

  it('filters the outbox by status and sends due mail on request', async () => {
    signInAs('admin');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<MailRoute />, { route: '/admin/mail?tab=delivery' });
    const chips = await screen.findByRole('group', { name: 'Filter by status' });
    await userEvent.click(within(chips).getByText('failed'));
    expect(await screen.findByText('550 mailbox unavailable')).toBeTruthy();
    expect(fake.calls.some((c) => c.url.pathname === '/api/outbox' && c.url.searchParams.get('status') === 'failed')).toBe(true);

    await userEvent.click(screen.getByRole('button', { name: 'Send due mail now' }));
    expect(await screen.findByText('2 messages sent.')).toBeTruthy();
    expect(fake.calls.filter((c) => c.method === 'POST' && c.url.pathname === '/api/outbox/deliver')).toHaveLength(1);
  });
});
