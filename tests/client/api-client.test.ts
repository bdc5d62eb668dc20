import { describe, expect, it, vi } from 'vitest';
import { api, ApiError, setCsrfToken, setUnauthenticatedHandler } from '@/lib/api-client';
import { apiError, mockFetch } from './support';

describe('api client', () => {
  it('when the API answers 401 then the sign-in handler runs and an ApiError is thrown', async () => {
    mockFetch(() => apiError(401, 'unauthenticated', 'Sign in first.'));
    const handler = vi.fn();
    setUnauthenticatedHandler(handler);
    await expect(api.get('/api/yards')).rejects.toMatchObject({
      status: 401,
      code: 'unauthenticated',
    });
    expect(handler).toHaveBeenCalledTimes(1);
  });

  it('when sign-in itself answers 401 then no redirect happens', async () => {
    mockFetch(() => apiError(401, 'unauthenticated', 'Wrong e-mail or password.'));
    const handler = vi.fn();
    setUnauthenticatedHandler(handler);
    await expect(
      api.post('/api/session', { email: 'a@b.c', password: 'x' }),
    ).rejects.toBeInstanceOf(ApiError);
    expect(handler).not.toHaveBeenCalled();
  });

  it('when the CSRF token is stale then a fresh one is fetched and the write retried once', async () => {
    setCsrfToken('old');
    let writes = 0;
    const { requests } = mockFetch((r) => {
      if (r.method === 'GET') return { status: 200, body: { user: null, csrfToken: 'fresh' } };
      writes += 1;
      return writes === 1
        ? apiError(403, 'csrf_invalid', 'Bad token.')
        : { status: 201, body: { ok: true } };
    });
    await expect(api.post('/api/yards', {})).resolves.toEqual({ ok: true });
    const posts = requests.filter((r) => r.method === 'POST');
    expect(posts.map((p) => p.headers['X-CSRF-Token'])).toEqual(['old', 'fresh']);
  });

  it('when rate limited then the wait from Retry-After is kept on the error', async () => {
    mockFetch(() => ({
      ...apiError(429, 'too_many_requests', 'Slow down.'),
      headers: { 'Retry-After': '30' },
    }));
    await expect(api.get('/api/yards')).rejects.toMatchObject({
      status: 429,
      retryAfterSeconds: 30,
    });
  });
});
