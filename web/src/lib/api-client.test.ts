import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError, apiRequest, OfflineError } from './api-client';
import { getSession, setSession } from './session';

const user = { id: 'u1', email: 'tech1@larkfield.example', name: 'Sam Brannigan', role: 'technician' as const, organisationId: 'o1' };

function json(status: number, body: unknown): Response {
  return new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

describe('api client', () => {
  const store = new Map<string, string>();
  beforeEach(() => {
    vi.stubGlobal('localStorage', {
      getItem: (k: string) => store.get(k) ?? null,
      setItem: (k: string, v: string) => store.set(k, v),
      removeItem: (k: string) => store.delete(k),
    });
    setSession({ accessToken: 'old-access', refreshToken: 'refresh-1', user });
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    store.clear();
  });

  it('sends the access token and returns the body', async () => {
    const fetchMock = vi.fn(async () => json(200, { ok: true }));
    vi.stubGlobal('fetch', fetchMock);
    await expect(apiRequest('/auth/me')).resolves.toEqual({ ok: true });
    const [url, init] = fetchMock.mock.calls[0] as unknown as [string, RequestInit];
    expect(url).toBe('/api/auth/me');
    expect((init.headers as Record<string, string>).authorization).toBe('Bearer old-access');
  });

  it('refreshes once for parallel 401s and retries each request with the new token', async () => {
    let refreshes = 0;
    vi.stubGlobal('fetch', vi.fn(async (url: string, init: RequestInit) => {
      const auth = (init.headers as Record<string, string>).authorization;
      if (url.endsWith('/auth/refresh')) {
        refreshes++;
        return json(200, { accessToken: 'new-access', refreshToken: 'refresh-2', user });
      }
      return auth === 'Bearer new-access' ? json(200, { url }) : json(401, { statusCode: 401, message: 'expired' });
    }));
    const results = await Promise.all([apiRequest('/a'), apiRequest('/b'), apiRequest('/c')]);
    expect(results).toEqual([{ url: '/api/a' }, { url: '/api/b' }, { url: '/api/c' }]);
    expect(refreshes).toBe(1);
    expect(getSession()?.refreshToken).toBe('refresh-2');
  });

  it('forgets the session when the refresh is refused', async () => {
    vi.stubGlobal('fetch', vi.fn(async (url: string) =>
      url.endsWith('/auth/refresh') ? json(401, { statusCode: 401, message: 'Your session has ended.' }) : json(401, { statusCode: 401, message: 'expired' }),
    ));
    await expect(apiRequest('/auth/me')).rejects.toBeInstanceOf(ApiError);
    expect(getSession()).toBeNull();
  });

  it('keeps the session when there is no connection', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => {
      throw new TypeError('Failed to fetch');
    }));
    await expect(apiRequest('/auth/me')).rejects.toBeInstanceOf(OfflineError);
    expect(getSession()?.accessToken).toBe('old-access');
  });

  it("carries the server's messages on an error", async () => {
    vi.stubGlobal('fetch', vi.fn(async () => json(400, { statusCode: 400, message: ['email must be an e-mail address'] })));
    const err = await apiRequest('/users', { method: 'POST', body: {} }).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiError);
    expect((err as ApiError).status).toBe(400);
    expect((err as ApiError).message).toBe('email must be an e-mail address');
  });
});
