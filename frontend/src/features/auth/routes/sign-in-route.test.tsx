import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { getSession } from '../../../lib/session.js';
import SignInRoute, { safeNext } from './sign-in-route.js';

const user = { id: 'u1', email: 'ada@example.test', name: 'Ada', role: 'editor' };

function renderSignIn(route = '/sign-in?next=%2Fdoc-sets%2Fd1%2Fruns') {
  return renderWithProviders(<SignInRoute />, {
    route,
    path: '/sign-in',
    extraRoutes: [{ path: '/doc-sets/:id/runs', element: <p>runs screen</p> }],
  });
}

afterEach(() => vi.unstubAllGlobals());

describe('sign-in', () => {
  it('asks for both fields before calling the server', async () => {
    const api = fakeFetch({});
    vi.stubGlobal('fetch', api.fn);
    renderSignIn();
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(screen.getByText(/Enter the e-mail address/)).toBeTruthy();
    expect(screen.getByText('Enter your password.')).toBeTruthy();
    expect(api.calls).toHaveLength(0);
  });

  it('signs in, stores the session and goes to `next`', async () => {
    const api = fakeFetch({
      'POST /api/auth/sign-in': () => ({ body: { accessToken: 'tok-1', expiresAt: '2999-01-01T00:00:00Z', user } }),
    });
    vi.stubGlobal('fetch', api.fn);
    renderSignIn();
    await userEvent.type(screen.getByLabelText(/E-mail/), ' ada@example.test ');
    await userEvent.type(screen.getByLabelText(/Password/), 'correct horse');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('runs screen')).toBeTruthy();
    expect(api.calls[0].body).toEqual({ email: 'ada@example.test', password: 'correct horse' });
    expect(getSession()?.accessToken).toBe('tok-1');
  });

  it('says plainly when the password is wrong, and when attempts are rate-limited', async () => {
    let status = 401;
    const api = fakeFetch({
      'POST /api/auth/sign-in': () => ({ status, body: { statusCode: status, code: 'X', message: 'server words' } }),
    });
    vi.stubGlobal('fetch', api.fn);
    renderSignIn();
    await userEvent.type(screen.getByLabelText(/E-mail/), 'ada@example.test');
    await userEvent.type(screen.getByLabelText(/Password/), 'nope');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect((await screen.findByRole('alert')).textContent).toMatch(/do not match an active account/);
    status = 429;
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(screen.getByRole('alert').textContent).toMatch(/Too many sign-in attempts/));
    expect(getSession()).toBeNull();
  });

  it('only follows same-site `next` paths', () => {
    expect(safeNext('/doc-sets/a')).toBe('/doc-sets/a');
    expect(safeNext('//evil.example/x')).toBe('/');
    expect(safeNext('https://evil.example')).toBe('/');
    expect(safeNext(null)).toBe('/');
  });
});
