import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ApiError, NETWORK_ERROR_MESSAGE, NetworkError } from '@/api/errors';
import { CSRF_HEADER, http, onSessionRefreshed, setCsrfToken } from '@/api/http';
import { headersOfCall, stubApi } from './support/fetch-stub';

describe('the http wrapper', () => {
  beforeEach(() => {
    setCsrfToken('token-1');
    onSessionRefreshed(null);
  });
  afterEach(() => {
    vi.unstubAllGlobals();
  });

  it('sends the CSRF token on a POST but not on a GET', async () => {
    const fetchStub = stubApi({ 'GET /api/thing': { body: { ok: true } }, 'POST /api/thing': { body: { ok: true } } });

    await http.get('/api/thing');
    await http.post('/api/thing', { a: 1 });

    expect(headersOfCall(fetchStub, 0)[CSRF_HEADER]).toBeUndefined();
    expect(headersOfCall(fetchStub, 1)[CSRF_HEADER]).toBe('token-1');
    expect(fetchStub.mock.calls[1]?.[1]?.credentials).toBe('same-origin');
    expect(fetchStub.mock.calls[1]?.[1]?.body).toBe('{"a":1}');
  });

  it('leaves empty query values out of the address', async () => {
    const fetchStub = stubApi({ 'GET /api/admin/users': { body: { items: [] } } });

    await http.get('/api/admin/users', { q: '', role: undefined, page: 2 });

    expect(String(fetchStub.mock.calls[0]?.[0])).toBe('/api/admin/users?page=2');
  });

  it('turns a 422 answer into a validation error carrying the field messages', async () => {
    stubApi({
      'POST /api/auth/sign-up': {
        status: 422,
        body: { error: { code: 'validation_failed', message: 'Check the form.', fields: { password: 'Too common.' } } },
      },
    });

    const error = await http.post('/api/auth/sign-up', {}).catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 422,
      kind: 'validation',
      code: 'validation_failed',
      message: 'Check the form.',
    });
    expect((error as ApiError).fields).toEqual({ password: 'Too common.' });
  });

  it('keeps the wait time of a 429 answer', async () => {
    stubApi({
      'POST /api/auth/sign-in': {
        status: 429,
        body: { error: { code: 'rate_limited', message: 'Too many attempts.', retryAfterSeconds: 120 } },
      },
    });

    const error = (await http.post('/api/auth/sign-in', {}).catch((e: unknown) => e)) as ApiError;

    expect(error.kind).toBe('rate_limited');
    expect(error.retryAfterSeconds).toBe(120);
  });

  it('gives a sentence of its own when a 502 answer is not JSON', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => new Response('<html>Bad gateway</html>', { status: 502 })),
    );

    const error = (await http.get('/api/account').catch((e: unknown) => e)) as ApiError;

    expect(error.kind).toBe('server');
    expect(error.code).toBe('http_502');
    expect(error.message).toMatch(/try again/i);
  });

  it('says Benchwright could not be reached when the network fails', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))),
    );

    const error = await http.get('/api/auth/session').catch((e: unknown) => e);

    expect(error).toBeInstanceOf(NetworkError);
    expect((error as ApiError).message).toBe(NETWORK_ERROR_MESSAGE);
  });

  it('refreshes the session once and retries when the CSRF token was refused', async () => {
    const fetchStub = stubApi({
      'POST /api/account/profile': [
        { status: 403, body: { error: { code: 'csrf_invalid', message: 'Reload the page.' } } },
        { body: { user: { id: 1 } } },
      ],
      'GET /api/auth/session': { body: { user: null, csrfToken: 'token-2' } },
    });
    const listener = vi.fn();
    onSessionRefreshed(listener);

    const answer = await http.post('/api/account/profile', { displayName: 'Ada' });

    expect(answer).toEqual({ user: { id: 1 } });
    expect(fetchStub).toHaveBeenCalledTimes(3);
    expect(headersOfCall(fetchStub, 2)[CSRF_HEADER]).toBe('token-2');
    expect(listener).toHaveBeenCalledWith({ user: null, csrfToken: 'token-2' });
  });

  it('gives up after one retry when the CSRF token is refused again', async () => {
    const fetchStub = stubApi({
      'POST /api/account/profile': {
        status: 403,
        body: { error: { code: 'csrf_invalid', message: 'Reload the page.' } },
      },
      'GET /api/auth/session': { body: { user: null, csrfToken: 'token-2' } },
    });

    const error = (await http.post('/api/account/profile', {}).catch((e: unknown) => e)) as ApiError;

    expect(error.code).toBe('csrf_invalid');
    expect(fetchStub).toHaveBeenCalledTimes(3);
  });
});
