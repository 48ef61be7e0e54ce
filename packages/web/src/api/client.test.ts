import { describe, expect, it } from 'vitest';
import { mockFetch } from '../test/mockFetch';
import { ApiError } from './ApiError';
import { apiRequest, forgetCsrfToken } from './client';

describe('apiRequest', () => {
  it('sends the CSRF token from /api/auth/csrf on state-changing requests, fetching it once', async () => {
    const server = mockFetch({
      'GET /api/auth/csrf': { body: { token: 'tok-1' } },
      'POST /api/orgs': { status: 201, body: { organization: { id: 'o1' } } },
      'PATCH /api/auth/me': { body: { user: { id: 'u1' } } },
    });

    await apiRequest('/api/orgs', { method: 'POST', body: { name: 'Hoist Works' } });
    await apiRequest('/api/auth/me', { method: 'PATCH', body: { name: 'Alice' } });

    expect(server.to('GET', '/api/auth/csrf')).toHaveLength(1);
    const [post] = server.to('POST', '/api/orgs');
    expect(post?.headers['x-csrf-token']).toBe('tok-1');
    expect(post?.headers['content-type']).toBe('application/json');
    expect(post?.body).toEqual({ name: 'Hoist Works' });
    expect(post?.credentials).toBe('same-origin');
    expect(server.to('PATCH', '/api/auth/me')[0]?.headers['x-csrf-token']).toBe('tok-1');
  });

  it('sends no CSRF token on GET and asks for none', async () => {
    const server = mockFetch({ 'GET /api/orgs': { body: { organizations: [] } } });
    await expect(apiRequest('/api/orgs')).resolves.toEqual({ organizations: [] });
    expect(server.sent).toHaveLength(1);
    expect(server.sent[0]?.headers['x-csrf-token']).toBeUndefined();
  });

  it('fetches a new token after forgetCsrfToken (a session change)', async () => {
    let issued = 0;
    const server = mockFetch({
      'GET /api/auth/csrf': () => ({ body: { token: `tok-${++issued}` } }),
      'POST /api/auth/signout': { status: 204 },
    });
    await apiRequest('/api/auth/signout', { method: 'POST' });
    forgetCsrfToken();
    await apiRequest('/api/auth/signout', { method: 'POST' });
    expect(server.to('POST', '/api/auth/signout').map((r) => r.headers['x-csrf-token'])).toEqual([
      'tok-1',
      'tok-2',
    ]);
  });

  it('retries once with a fresh token when the server refuses a stale one', async () => {
    let issued = 0;
    const server = mockFetch({
      'GET /api/auth/csrf': () => ({ body: { token: `tok-${++issued}` } }),
      'DELETE /api/sheets/s1': (request) =>
        request.headers['x-csrf-token'] === 'tok-2'
          ? { status: 204 }
          : {
              status: 403,
              body: { error: { code: 'csrf', message: 'CSRF token missing or stale' } },
            },
    });
    await expect(apiRequest('/api/sheets/s1', { method: 'DELETE' })).resolves.toBeUndefined();
    expect(server.to('DELETE', '/api/sheets/s1')).toHaveLength(2);
  });

  it('maps an error answer to an ApiError with status, code and message', async () => {
    mockFetch({
      'GET /api/auth/csrf': { body: { token: 't' } },
      'DELETE /api/orgs/o1/members/u1': {
        status: 409,
        body: {
          error: { code: 'last-owner', message: 'an organization needs at least one owner' },
        },
      },
    });
    const error = await apiRequest('/api/orgs/o1/members/u1', { method: 'DELETE' }).catch(
      (e: unknown) => e,
    );
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 409,
      code: 'last-owner',
      message: 'an organization needs at least one owner',
    });
  });

  it('reads the fields named in an invalid-field answer', async () => {
    mockFetch({
      'GET /api/auth/csrf': { body: { token: 't' } },
      'POST /api/auth/signup': {
        status: 400,
        body: {
          error: {
            code: 'invalid-field',
            message:
              'email: must be an e-mail address such as name@example.com; password: must be at least 10 characters',
          },
        },
      },
    });
    const error = (await apiRequest('/api/auth/signup', { method: 'POST', body: {} }).catch(
      (e: unknown) => e,
    )) as ApiError;
    expect(error.code).toBe('invalid-field');
    expect(error.fieldErrors).toEqual({
      email: 'must be an e-mail address such as name@example.com',
      password: 'must be at least 10 characters',
    });
    expect(error.field).toBe('email');
  });

  it('turns an answer that is not JSON into an ApiError that keeps the status', async () => {
    mockFetch({ 'GET /api/health': { status: 502, text: '<html>Bad gateway</html>' } });
    const error = (await apiRequest('/api/health').catch((e: unknown) => e)) as ApiError;
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(502);
    expect(error.code).toBe('http-502');
    expect(error.message).toContain('502');
  });

  it('reports an unreachable server as status 0, code network', async () => {
    mockFetch({
      'GET /api/health': () => {
        throw new TypeError('Failed to fetch');
      },
    });
    const error = (await apiRequest('/api/health').catch((e: unknown) => e)) as ApiError;
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(0);
    expect(error.code).toBe('network');
    expect(error.message).toBe('Failed to fetch');
  });
});
