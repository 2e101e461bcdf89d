import { afterEach, describe, expect, it, vi } from 'vitest';
import { docSetSchema, healthSchema, noContentSchema } from '@linkloom/shared';
import { ApiError, apiFetch, apiUrl, errorMessage, setUnauthorizedHandler } from './api-client.js';
import { docSet } from '../testing/fixtures.js';
import { getSession, setSession } from './session.js';

const session = {
  accessToken: 'tok-9',
  expiresAt: '2999-01-01T00:00:00Z',
  user: { id: 'u', email: 'a@b.test', name: 'A', role: 'viewer' as const },
};

afterEach(() => vi.unstubAllGlobals());

describe('apiUrl', () => {
  it('prefixes /api once and drops empty query values', () => {
    expect(apiUrl('/doc-sets', { page: 2, q: '', flags: ['orphan', 'deep'], x: undefined })).toBe(
      '/api/doc-sets?page=2&flags=orphan%2Cdeep',
    );
    expect(apiUrl('/api/health')).toBe('/api/health');
  });
});

describe('apiFetch', () => {
  it('sends the bearer token and JSON body, and parses JSON back with the route schema', async () => {
    setSession(session);
    const created = docSet('d1', 'N');
    const fetchMock = vi.fn(async () => new Response(JSON.stringify(created), { status: 201 }));
    vi.stubGlobal('fetch', fetchMock);
    await expect(apiFetch('/doc-sets', docSetSchema, { method: 'POST', body: { name: 'N' } })).resolves.toEqual(created);
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/doc-sets');
    expect((init.headers as Record<string, string>).Authorization).toBe('Bearer tok-9');
    expect(init.body).toBe('{"name":"N"}');
  });

  it('turns the error body into an ApiError', async () => {
    vi.stubGlobal(
      'fetch',
      async () =>
        new Response(JSON.stringify({ statusCode: 422, code: 'ARCHIVE_UNSAFE_PATH', message: 'Remove ../ paths', details: ['a'] }), {
          status: 422,
        }),
    );
    const error = await apiFetch('/x', healthSchema).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 422, code: 'ARCHIVE_UNSAFE_PATH', message: 'Remove ../ paths', details: ['a'] });
  });

  it('clears the session and sends the user to sign-in on 401', async () => {
    setSession(session);
    const redirect = vi.fn();
    setUnauthorizedHandler(redirect);
    vi.stubGlobal('fetch', async () => new Response('', { status: 401 }));
    await expect(apiFetch('/doc-sets', docSetSchema)).rejects.toMatchObject({ status: 401 });
    expect(getSession()).toBeNull();
    expect(redirect).toHaveBeenCalledOnce();
  });

  it('reports an unreachable server in words', async () => {
    vi.stubGlobal('fetch', async () => {
      throw new TypeError('Failed to fetch');
    });
    await expect(apiFetch('/x', healthSchema)).rejects.toMatchObject({ status: 0, code: 'NETWORK' });
  });

  it('fails in words, naming the field, when the answer has drifted from the schema', async () => {
    // The islands list once printed "undefined pages": the server said `pageCount`, the screen read `size`.
    vi.stubGlobal('fetch', async () => new Response(JSON.stringify({ status: 'ok', databaseKind: 'pglite', version: '1', demo: false })));
    const error = await apiFetch('/health', healthSchema).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 200, code: 'RESPONSE_SHAPE' });
    expect(errorMessage(error)).toMatch(/GET \/api\/health is not what this screen expects \(database: /);
  });

  it('drops fields the schema does not know, so a newer server does not break an older screen', async () => {
    const sent = { status: 'ok', database: 'postgres', version: '2', demo: true, region: 'eu' };
    vi.stubGlobal('fetch', async () => new Response(JSON.stringify(sent)));
    await expect(apiFetch('/health', healthSchema)).resolves.toEqual({ status: 'ok', database: 'postgres', version: '2', demo: true });
  });

  it('expects no body from a 204 route and refuses one that sends a body', async () => {
    vi.stubGlobal('fetch', async () => new Response(null, { status: 204 }));
    await expect(apiFetch('/auth/sign-out', noContentSchema, { method: 'POST' })).resolves.toBeUndefined();
    vi.stubGlobal('fetch', async () => new Response(JSON.stringify({ ok: true }), { status: 200 }));
    await expect(apiFetch('/auth/sign-out', noContentSchema, { method: 'POST' })).rejects.toMatchObject({ code: 'RESPONSE_SHAPE' });
  });
});
