import { afterEach, describe, expect, it, vi } from 'vitest';
import { fireEvent, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { fakeFetch, renderWithProviders } from '../../../testing/render.js';
import { userDetailsSchema, type Role } from '@linkloom/shared';
import { pagedList, parsed, signInAs } from '../../../testing/fixtures.js';
import UsersRoute from './users-route.js';

afterEach(() => vi.unstubAllGlobals());

const person = (id: string, name: string, role: Role) =>
  parsed(userDetailsSchema, {
    id,
    email: `${name.toLowerCase()}@example.test`,
    name,
    role,
    disabled: false,
    createdAt: '2026-11-01T09:00:00Z',
    lastSignInAt: null,
  });
const people = [person('u1', 'Ada', 'admin'), person('u2', 'Bo', 'writer')];

function api() {
  return fakeFetch({
    'GET /api/users': () => ({ body: pagedList(people) }),
    'PATCH /api/users/u2': () => ({ body: { ...people[1], disabled: true } }),
    'POST /api/users': () => ({ status: 201, body: person('u3', 'Cy', 'viewer') }),
  });
}

// Text fields are filled with fireEvent.change: typing key by key is slow on a shared machine and adds nothing here.
const fill = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });

describe('users admin', () => {
  it('disables another user but never yourself', async () => {
    signInAs('admin');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<UsersRoute />, { route: '/admin/users' });
    expect(((await screen.findByRole('switch', { name: 'Ada can sign in' })) as HTMLInputElement).disabled).toBe(true);
    await userEvent.click(screen.getByRole('switch', { name: 'Bo can sign in' }));
    await vi.waitFor(() => expect(fake.calls.find((c) => c.method === 'PATCH')?.body).toEqual({ disabled: true }));
  });

  it('creates a user after checking the initial password length', async () => {
    signInAs('admin');
    const fake = api();
    vi.stubGlobal('fetch', fake.fn);
    renderWithProviders(<UsersRoute />, { route: '/admin/users' });
    await userEvent.click(await screen.findByRole('button', { name: 'New user' }));
    fill('E-mail', 'cy@example.test');
    fill('Name', 'Cy');
    fill('Initial password', 'short');
    await userEvent.click(screen.getByRole('button', { name: 'Create user' }));
    expect(screen.getByText(/at least 8 characters/)).toBeTruthy();
    fill('Initial password', 'short-enough-now');
    await userEvent.click(screen.getByRole('button', { name: 'Create user' }));
    await vi.waitFor(() =>
      expect(fake.calls.find((c) => c.method === 'POST')?.body).toEqual({
        email: 'cy@example.test',
        name: 'Cy',
        role: 'writer',
        password: 'short-enough-now',
      }),
    );
  });
});
