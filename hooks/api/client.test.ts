import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Tokens } from '@/shared/schemas';
import { ApiRequestError, apiFetch, fieldErrors } from './client';
import { tokenStore } from './token-store';

const user = { id: '6f1c1d0e-0b7a-4b7e-9a52-2c1f8b9f0a11', email: 'a@b.test', displayName: 'A', callSign: '' };
const tokens = (n: number): Tokens => ({ accessToken: `access-${n}`, refreshToken: `refresh-token-number-${n}-xxxxxxxx`, expiresIn: 900, user });
const json = (status: number, body: unknown) => new Response(body === undefined ? null : JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

describe('apiFetch (bearer tokens, RFC 6750; rotating refresh tokens)', () => {
  let fetchMock: ReturnType<typeof vi.fn>;
  beforeEach(() => {
    fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    tokenStore.set(tokens(1));
  });
  afterEach(() => {
    vi.unstubAllGlobals();
    tokenStore.set(null);
  });

  it('sends "Authorization: Bearer <access token>" and asks for JSON', async () => {
    fetchMock.mockResolvedValueOnce(json(200, { ok: true }));
    await expect(apiFetch('/api/me')).resolves.toEqual({ ok: true });
    const headers = fetchMock.mock.calls[0][1].headers as Headers;
    expect(headers.get('authorization')).toBe('Bearer access-1');
    expect(headers.get('accept')).toBe('application/json');
  });

  it('on 401 refreshes once, keeps the rotated tokens and retries with the new access token', async () => {
    fetchMock
      .mockResolvedValueOnce(json(401, { code: 'unauthorized', message: 'expired' }))
      .mockResolvedValueOnce(json(200, tokens(2)))
      .mockResolvedValueOnce(json(200, { fine: 1 }));
    await expect(apiFetch('/api/me')).resolves.toEqual({ fine: 1 });
    expect(fetchMock.mock.calls[1][0]).toBe('/api/auth/refresh');
    expect(JSON.parse(fetchMock.mock.calls[1][1].body)).toEqual({ refreshToken: tokens(1).refreshToken });
    expect((fetchMock.mock.calls[2][1].headers as Headers).get('authorization')).toBe('Bearer access-2');
    expect(tokenStore.get()?.refreshToken).toBe(tokens(2).refreshToken);
  });

  it('shares one refresh among concurrent 401s (a rotated refresh token works only once)', async () => {
    let refreshCalls = 0;
    fetchMock.mockImplementation(async (url: string, init: RequestInit) => {
      if (url === '/api/auth/refresh') {
        refreshCalls++;
        return json(200, tokens(3));
      }
      const auth = (init.headers as Headers).get('authorization');
      return auth === 'Bearer access-3' ? json(200, { url }) : json(401, { code: 'unauthorized', message: 'expired' });
    });
    const results = await Promise.all([apiFetch('/api/a'), apiFetch('/api/b'), apiFetch('/api/c')]);
    expect(results).toEqual([{ url: '/api/a' }, { url: '/api/b' }, { url: '/api/c' }]);
    expect(refreshCalls).toBe(1);
  });

  it('signs out when the server refuses the refresh token, and reports the original refusal in words', async () => {
    fetchMock.mockResolvedValueOnce(json(401, { code: 'unauthorized', message: 'Sign in again.' })).mockResolvedValueOnce(json(401, { code: 'unauthorized', message: 'revoked' }));
    const err = await apiFetch('/api/me').catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ApiRequestError);
    expect((err as ApiRequestError).status).toBe(401);
    expect((err as ApiRequestError).message).toBe('Sign in again.');
    expect(tokenStore.get()).toBeNull();
  });

  it('keeps the session when the network fails, and says so plainly', async () => {
    fetchMock.mockRejectedValueOnce(new TypeError('Failed to fetch'));
    const err = (await apiFetch('/api/me').catch((e: unknown) => e)) as ApiRequestError;
    expect(err.code).toBe('offline');
    expect(err.message).toMatch(/Could not reach/);
    expect(tokenStore.get()?.accessToken).toBe('access-1');
  });

  it('turns a non-JSON failure into a plain message, never a stack or HTML', async () => {
    fetchMock.mockResolvedValueOnce(new Response('<html>bad gateway</html>', { status: 502 }));
    const err = (await apiFetch('/api/me').catch((e: unknown) => e)) as ApiRequestError;
    expect(err.status).toBe(502);
    expect(err.message).not.toMatch(/</);
  });

  it('answers undefined for 204 No Content', async () => {
    fetchMock.mockResolvedValueOnce(new Response(null, { status: 204 }));
    await expect(apiFetch('/api/auth/sign-out', { method: 'POST', json: {} })).resolves.toBeUndefined();
  });
});

describe('fieldErrors', () => {
  it('reads the server\'s dotted string paths (server/src/http/error-middleware.ts) by their last named segment', () => {
    const e = new ApiRequestError(400, 'validation_failed', 'bad', { issues: [{ path: 'signUp.password', message: 'use at least 10 characters' }, { path: 'email', message: 'enter a valid e-mail address' }, { path: '', message: 'body is required' }] });
    expect(fieldErrors(e)).toEqual({ password: 'use at least 10 characters', email: 'enter a valid e-mail address' });
  });
  it('maps zod issues in the error details to the first message per field', () => {
    const e = new ApiRequestError(400, 'invalid', 'bad', { issues: [{ path: ['email'], message: 'enter a valid e-mail address' }, { path: ['email'], message: 'second' }, { path: ['role'], message: 'role must be one of admin' }] });
    expect(fieldErrors(e)).toEqual({ email: 'enter a valid e-mail address', role: 'role must be one of admin' });
    expect(fieldErrors(new Error('x'))).toEqual({});
  });
});
