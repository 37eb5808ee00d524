// The skeleton end to end: a test app on its own cloned database answers health and the error contract.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './helpers/test-app';

describe('server skeleton', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('GET /api/health checks the database and answers {ok, db}', async () => {
    const r = await t.api('GET', '/api/health');
    expect(r.status).toBe(200);
    expect(r.body).toEqual({ ok: true, db: 'up' });
  });

  it('an unknown /api route answers 404 {code: not_found} as JSON', async () => {
    const r = await t.api('GET', '/api/no-such-thing');
    expect(r.status).toBe(404);
    expect(r.body.code).toBe('not_found');
    expect(typeof r.body.message).toBe('string');
  });

  it('malformed JSON answers 400 malformed_json without a stack', async () => {
    const r = await t.api('POST', '/api/auth/sign-in', { body: '{"email": "a@b.test",' });
    expect(r.status).toBe(400);
    expect(r.body.code).toBe('malformed_json');
    expect(JSON.stringify(r.body)).not.toMatch(/at .*\.ts:\d+/);
  });

  it('a body over the JSON limit answers 413 payload_too_large', async () => {
    const r = await t.api('POST', '/api/auth/sign-in', { body: JSON.stringify({ email: 'a@b.test', password: 'x'.repeat(3 * 1024 * 1024) }) });
    expect(r.status).toBe(413);
    expect(r.body.code).toBe('payload_too_large');
  });

  it('sets security headers (helmet) on API answers', async () => {
    const r = await t.api('GET', '/api/health');
    expect(r.headers.get('x-content-type-options')).toBe('nosniff');
    expect(r.headers.get('x-powered-by')).toBeNull();
  });

  it('signUpUser puts a user in a new club with the asked role', async () => {
    const u = await t.signUpUser({ role: 'scout' });
    expect(u.clubId).toBeTruthy();
    const me = await t.api('GET', '/api/me', { auth: u });
    expect(me.status).toBe(200);
    expect(me.body.clubs).toEqual([expect.objectContaining({ id: u.clubId, role: 'scout' })]);
  });

  it('GET /api/health answers 503 {ok: false, db: down} when the database is gone (run last: it closes the pool)', async () => {
    await t.deps.dataSource.destroy();
    const r = await t.api('GET', '/api/health');
    expect(r.status).toBe(503);
    expect(r.body).toEqual({ ok: false, db: 'down' });
  });
});
