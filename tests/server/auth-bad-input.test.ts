// Bad input on every route of the server core answers 4xx with {code, message} — never a 500, never a stack.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './helpers/test-app';

const ROUTES: { path: string; good: Record<string, unknown> }[] = [
  { path: '/api/auth/sign-up', good: { email: 'new@example.test', password: 'long enough pw', displayName: 'New' } },
  { path: '/api/auth/sign-in', good: { email: 'new@example.test', password: 'long enough pw' } },
  { path: '/api/auth/refresh', good: { refreshToken: 'r'.repeat(43) } },
  { path: '/api/auth/sign-out', good: { refreshToken: 'r'.repeat(43) } },
  { path: '/api/auth/forgot-password', good: { email: 'new@example.test' } },
  { path: '/api/auth/reset-password', good: { token: 't'.repeat(43), password: 'long enough pw' } },
];

const BAD_BODIES: [string, string | undefined, string][] = [
  ['malformed JSON', '{"email": ', 'malformed_json'],
  ['a JSON string instead of an object', '"hello"', 'malformed_json'],
  ['an array', '[1,2]', 'validation_failed'],
  ['an empty object', '{}', 'validation_failed'],
];

describe('bad input on the auth routes', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  const expectClean4xx = (r: { status: number; body: any }, status?: number, code?: string) => {
    expect(r.status).toBeGreaterThanOrEqual(400);
    expect(r.status).toBeLessThan(500);
    if (status) expect(r.status).toBe(status);
    expect(typeof r.body.code).toBe('string');
    expect(typeof r.body.message).toBe('string');
    if (code) expect(r.body.code).toBe(code);
    expect(JSON.stringify(r.body)).not.toMatch(/\.ts:\d+|node_modules/);
  };

  for (const route of ROUTES) {
    describe(route.path, () => {
      it.each(BAD_BODIES)('%s → 400', async (_name, raw, code) => {
        expectClean4xx(await t.api('POST', route.path, { body: raw }), 400, code);
      });

      it('no body at all (no Content-Type) → 400 validation_failed', async () => {
        expectClean4xx(await t.api('POST', route.path), 400, 'validation_failed');
      });

      it('an unknown extra field → 400 naming the field', async () => {
        const r = await t.api('POST', route.path, { body: { ...route.good, isAdmin: true } });
        expectClean4xx(r, 400, 'validation_failed');
        expect(JSON.stringify(r.body.details)).toMatch(/isAdmin/);
      });

      it.each(Object.keys(route.good))('field %s missing → 400 with its path', async (field) => {
        const body = { ...route.good };
        delete body[field];
        const r = await t.api('POST', route.path, { body });
        expectClean4xx(r, 400, 'validation_failed');
        expect(r.body.details.issues.map((i: { path: string }) => i.path)).toContain(field);
      });

      it.each(Object.keys(route.good))('field %s of the wrong type → 400', async (field) => {
        expectClean4xx(await t.api('POST', route.path, { body: { ...route.good, [field]: 12345 } }), 400, 'validation_failed');
      });

      it.each(Object.keys(route.good))('field %s oversized → 400', async (field) => {
        const big = field === 'email' ? `${'a'.repeat(300)}@example.test` : 'z'.repeat(5000);
        expectClean4xx(await t.api('POST', route.path, { body: { ...route.good, [field]: big } }), 400, 'validation_failed');
      });
    });
  }

  it('a sign-up with a badly formed e-mail, short password or bad call sign names each problem', async () => {
    const r = await t.api('POST', '/api/auth/sign-up', { body: { email: 'not-an-email', password: 'short', displayName: '', callSign: 'hello world' } });
    expectClean4xx(r, 400, 'validation_failed');
    const paths = r.body.details.issues.map((i: { path: string }) => i.path).sort();
    expect(paths).toEqual(['callSign', 'displayName', 'email', 'password']);
  });

  it('GET /api/me with a Basic or empty Bearer header → 401', async () => {
    expectClean4xx(await t.api('GET', '/api/me', { headers: { authorization: 'Basic dXNlcjpwYXNz' } }), 401);
    expectClean4xx(await t.api('GET', '/api/me', { headers: { authorization: 'Bearer ' } }), 401);
  });

  it('a wrong method on a known path → 404 not_found as JSON', async () => {
    expectClean4xx(await t.api('DELETE', '/api/health'), 404, 'not_found');
    expectClean4xx(await t.api('GET', '/api/auth/sign-in'), 404, 'not_found');
  });

  it('a body in an unsupported charset → 415', async () => {
    const r = await t.api('POST', '/api/auth/sign-in', { body: '{}', headers: { 'content-type': 'application/json; charset=klingon' } });
    expectClean4xx(r, 415);
  });
});
