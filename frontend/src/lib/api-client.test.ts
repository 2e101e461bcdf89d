import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError, apiFetch, apiUrl, setUnauthorizedHandler } from './api-client.js';
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
  it('sends the bearer token and JSON body, and parses JSON back', async () => {
    setSession(session);
    const fetchMock = vi.fn(async () => new Response(JSON.stringify({ ok: 1 }), { status: 200 }));
    vi.stubGlobal('fetch', fetchMock);
    await expect(apiFetch('/doc-sets', { method: 'POST', body: { name: 'N' } })).resolves.toEqual({ ok: 1 });
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
    const error = await apiFetch('/x').catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 422, code: 'ARCHIVE_UNSAFE_PATH', message: 'Remove ../ paths', details: ['a'] });
  });

  it('clears the session and sends the user to sign-in on 401', async () => {
    setSession(session);
    const redirect = vi.fn();
    setUnauthorizedHandler(redirect);
    vi.stubGlobal('fetch', async () => new Response('', { status: 401 }));
    await expect(apiFetch('/doc-sets')).rejects.toMatchObject({ status: 401 });
    expect(getSession()).toBeNull();
    expect(redirect).toHaveBeenCalledOnce();
  });

  it('reports an unreachable server in words', async () => {
    vi.stubGlobal('fetch', async () => {
      throw new TypeError('Failed to fetch');
    });
    await expect(apiFetch('/x')).rejects.toMatchObject({ status: 0, code: 'NETWORK' });
  });
});
