// @vitest-environment happy-dom
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { apiError, fakeApi } from '../testing/fake-api';
import { apiRequest, ApiRequestError, forgetCsrfToken } from './api-client';

const okSchema = z.object({ ok: z.literal(true) });

beforeEach(() => forgetCsrfToken());
afterEach(() => vi.unstubAllGlobals());

describe('apiRequest', () => {
  it('sends the session CSRF token with every change and fetches it only once', async () => {
    const api = fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 'token-1' } },
      'POST /api/studio/invitations': { status: 201, body: { ok: true } },
      'DELETE /api/studio/invitations/abc': { status: 204 },
    });
    await apiRequest('/studio/invitations', { method: 'POST', body: { email: 'a@b.test' }, schema: okSchema });
    await apiRequest('/studio/invitations/abc', { method: 'DELETE' });
    const changes = api.calls.filter((call) => call.method !== 'GET');
    expect(changes.map((call) => call.headers['x-csrf-token'])).toEqual(['token-1', 'token-1']);
    expect(api.calls.filter((call) => call.path === '/api/auth/csrf')).toHaveLength(1);
  });

  it('fetches a fresh token and retries once when the server says the token is out of date', async () => {
    let tokens = 0;
    const api = fakeApi({
      'GET /api/auth/csrf': () => ({ body: { csrfToken: `token-${++tokens}` } }),
      'PATCH /api/studio': ({ headers }) =>
        headers['x-csrf-token'] === 'token-2'
          ? { status: 200, body: { ok: true } }
          : apiError(403, 'csrf.invalid', 'This request carried an out-of-date security token.'),
    });
    await expect(apiRequest('/studio', { method: 'PATCH', body: {}, schema: okSchema })).resolves.toEqual({ ok: true });
    expect(api.calls.filter((call) => call.method === 'PATCH')).toHaveLength(2);
  });

  it('gives up after one retry so a broken session cannot loop', async () => {
    fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 'stale' } },
      'PATCH /api/studio': apiError(403, 'csrf.invalid', 'Reload the page and try again.'),
    });
    await expect(apiRequest('/studio', { method: 'PATCH', body: {} })).rejects.toMatchObject({
      status: 403,
      code: 'csrf.invalid',
    });
  });

  it('turns an error answer into an ApiRequestError with its code, message and field errors', async () => {
    fakeApi({
      'GET /api/auth/csrf': { body: { csrfToken: 't' } },
      'POST /api/auth/sign-up': apiError(400, 'request.invalid', 'Check the highlighted fields.', {
        email: 'That address already has an account',
      }),
    });
    const failure = await apiRequest('/auth/sign-up', { method: 'POST', body: {} }).catch((error: unknown) => error);
    expect(failure).toBeInstanceOf(ApiRequestError);
    expect(failure).toMatchObject({
      status: 400,
      code: 'request.invalid',
      message: 'Check the highlighted fields.',
      fields: { email: 'That address already has an account' },
    });
  });

  it('reports a gateway page without a JSON body as the server being out of reach', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => new Response('<html>Bad gateway</html>', { status: 502 })));
    await expect(apiRequest('/auth/me', { schema: okSchema })).rejects.toMatchObject({ code: 'network.unreachable' });
  });

  it('rejects an answer that does not match the shared schema instead of passing it on', async () => {
    fakeApi({ 'GET /api/studio': { body: { ok: 'yes' } } });
    await expect(apiRequest('/studio', { schema: okSchema })).rejects.toMatchObject({ code: 'response.invalid' });
  });
});
