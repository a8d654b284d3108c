import '@/testing/setup';
import { describe, expect, it } from 'vitest';
import { errorReply, mockApi } from '@/testing/mock-api';
import { ApiError, apiFetch, getCsrfToken, setCsrfToken } from './api-client';

describe('apiFetch', () => {
  it('returns the data of a success body and sends cookies', async () => {
    const { fetchMock, requests } = mockApi({
      'GET /api/club': () => ({ body: { data: { name: 'X' } } }),
    });
    await expect(apiFetch('/club')).resolves.toEqual({ name: 'X' });
    expect(fetchMock).toHaveBeenCalledTimes(1);
    expect(fetchMock.mock.calls[0]?.[1]).toMatchObject({ credentials: 'include', method: 'GET' });
    expect(requests[0]?.headers['x-csrf-token']).toBeUndefined();
  });

  it('adds the query string, leaving out empty values', async () => {
    const { requests } = mockApi({ 'GET /api/admin/users': () => ({ body: { data: [] } }) });
    await apiFetch('/admin/users', {
      query: { q: 'kim lee', page: 2, empty: '', none: undefined },
    });
    expect(requests[0]?.url).toBe('/api/admin/users?q=kim+lee&page=2');
  });

  it('sends the CSRF token and a JSON body on writes', async () => {
    setCsrfToken('token-a');
    const { requests } = mockApi({
      'PATCH /api/account': () => ({ body: { data: { ok: true } } }),
    });
    await apiFetch('/account', { method: 'PATCH', body: { displayName: 'Kim' } });
    expect(requests[0]?.headers['x-csrf-token']).toBe('token-a');
    expect(requests[0]?.headers['content-type']).toBe('application/json');
    expect(requests[0]?.body).toEqual({ displayName: 'Kim' });
  });

  it('throws an ApiError with code, status and field messages', async () => {
    mockApi({
      'POST /api/auth/signup': () =>
        errorReply(400, 'VALIDATION_FAILED', 'Check the form', { email: 'Already in use' }),
    });
    const error = await apiFetch('/auth/signup', { method: 'POST', body: {} }).catch(
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 400,
      code: 'VALIDATION_FAILED',
      message: 'Check the form',
      fields: { email: 'Already in use' },
    });
  });

  it('on 403 CSRF_INVALID fetches a new token once and retries once with it', async () => {
    setCsrfToken('stale');
    let attempts = 0;
    const { fetchMock, requests } = mockApi({
      'GET /api/auth/me': () => ({ body: { data: { user: null, csrfToken: 'fresh' } } }),
      'POST /api/auth/logout': () => {
        attempts += 1;
        return attempts === 1
          ? errorReply(403, 'CSRF_INVALID', 'Your session token is out of date')
          : { body: { data: { user: null, csrfToken: 'after-logout' } } };
      },
    });
    await expect(apiFetch('/auth/logout', { method: 'POST' })).resolves.toEqual({
      user: null,
      csrfToken: 'after-logout',
    });
    expect(fetchMock).toHaveBeenCalledTimes(3);
    expect(requests.map((r) => `${r.method} ${r.url}`)).toEqual([
      'POST /api/auth/logout',
      'GET /api/auth/me',
      'POST /api/auth/logout',
    ]);
    expect(requests[0]?.headers['x-csrf-token']).toBe('stale');
    expect(requests[2]?.headers['x-csrf-token']).toBe('fresh');
    expect(getCsrfToken()).toBe('fresh');
  });

  it('gives up after one retry when the token is still refused', async () => {
    const { fetchMock } = mockApi({
      'GET /api/auth/me': () => ({ body: { data: { user: null, csrfToken: 'fresh' } } }),
      'PUT /api/admin/users/4/roles': () => errorReply(403, 'CSRF_INVALID', 'Token refused'),
    });
    await expect(
      apiFetch('/admin/users/4/roles', { method: 'PUT', body: { roles: [] } }),
    ).rejects.toMatchObject({ code: 'CSRF_INVALID' });
    expect(fetchMock).toHaveBeenCalledTimes(3);
  });

  it('does not retry other 403 answers', async () => {
    const { fetchMock } = mockApi({
      'POST /api/auth/login': () =>
        errorReply(403, 'EMAIL_NOT_VERIFIED', 'Confirm your e-mail first'),
    });
    await expect(apiFetch('/auth/login', { method: 'POST', body: {} })).rejects.toMatchObject({
      code: 'EMAIL_NOT_VERIFIED',
    });
    expect(fetchMock).toHaveBeenCalledTimes(1);
  });

  it('turns a network failure into a readable NETWORK_ERROR', async () => {
    mockApi({
      'GET /api/health': () => {
        throw new TypeError('Failed to fetch');
      },
    });
    const error = await apiFetch('/health').catch((e: unknown) => e);
    expect(error).toMatchObject({ status: 0, code: 'NETWORK_ERROR' });
    expect((error as ApiError).message).toMatch(/connection/);
  });

  it('turns a body that is not JSON into BAD_RESPONSE', async () => {
    const { fetchMock } = mockApi({});
    fetchMock.mockResolvedValueOnce(new Response('<html>proxy error</html>', { status: 502 }));
    await expect(apiFetch('/health')).rejects.toMatchObject({ status: 502, code: 'BAD_RESPONSE' });
  });
});
