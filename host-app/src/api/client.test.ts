import { describe, expect, it, vi } from 'vitest';
import { makeApiError, makeMe } from '@/test/factories';
import { stubFetch } from '@/test/stubFetch';
import { apiClient, ApiRequestError } from './client';

describe('apiClient', () => {
  it('returns the parsed JSON of a 2xx response', async () => {
    const me = makeMe();
    stubFetch({ 'GET /api/me': { status: 200, body: me } });
    await expect(apiClient.get('/api/me')).resolves.toEqual(me);
  });

  it('sends JSON with the session cookie (same-origin credentials)', async () => {
    const fetchMock = stubFetch({ 'POST /api/auth/sign-in': { status: 200, body: makeMe() } });
    await apiClient.post('/api/auth/sign-in', { email: 'a@b.example', password: 'pw' });
    const [, init] = fetchMock.mock.calls[0];
    expect(init?.credentials).toBe('same-origin');
    expect(init?.headers).toMatchObject({ 'Content-Type': 'application/json' });
    expect(JSON.parse(String(init?.body))).toEqual({ email: 'a@b.example', password: 'pw' });
  });

  it('resolves an empty 204 as undefined', async () => {
    stubFetch({ 'POST /api/auth/sign-out': { status: 204 } });
    await expect(apiClient.post('/api/auth/sign-out')).resolves.toBeUndefined();
  });

  it('turns a non-2xx ApiError body into an ApiRequestError carrying that body', async () => {
    const body = makeApiError('weak_password', 'Use at least 15 characters.', [
      { field: 'password', message: 'Use at least 15 characters.' },
    ]);
    stubFetch({ 'POST /api/auth/password-reset': { status: 400, body } });

    const error = await apiClient.post('/api/auth/password-reset', {}).catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiRequestError);
    const apiError = error as ApiRequestError;
    expect(apiError.status).toBe(400);
    expect(apiError.body).toEqual(body);
    expect(apiError.code).toBe('weak_password');
    expect(apiError.message).toBe('Use at least 15 characters.');
    expect(apiError.fieldMessages('password')).toEqual(['Use at least 15 characters.']);
    expect(apiError.fieldMessages('email')).toEqual([]);
  });

  it('still throws an ApiRequestError with a readable message when the error body is not an ApiError', async () => {
    stubFetch({ 'GET /api/me': { status: 502, body: '<html>Bad gateway</html>' } });
    const error = (await apiClient.get('/api/me').catch((e: unknown) => e)) as ApiRequestError;
    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error.status).toBe(502);
    expect(error.code).toBe('unexpected_response');
  });

  it('reports an unreachable server as status 0', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    const error = (await apiClient.get('/api/me').catch((e: unknown) => e)) as ApiRequestError;
    expect(error).toBeInstanceOf(ApiRequestError);
    expect(error.status).toBe(0);
    expect(error.code).toBe('network_unreachable');
  });
});
