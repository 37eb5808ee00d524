// Every path of /api/auth/* and /api/me, against the contract in /tmp/briefs/contracts.md and shared/schemas.
import jwt from 'jsonwebtoken';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FORGOT_PASSWORD_MIN_MS } from '../../server/src/modules/auth/router';
import { startTestApp, type TestApp } from './helpers/test-app';

let offsetMs = 0;
const clock = { now: () => new Date(Date.now() + offsetMs) };

describe('auth', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ clock });
  });
  afterAll(() => t.close());

  describe('sign-up and sign-in', () => {
    it('sign-up answers 201 with tokens and the user; the e-mail is stored lower-case', async () => {
      const r = await t.api('POST', '/api/auth/sign-up', { body: { email: 'Ada@Example.TEST', password: 'long enough pw', displayName: 'Ada', callSign: 'k0ada' } });
      expect(r.status).toBe(201);
      expect(r.body.user).toMatchObject({ email: 'ada@example.test', displayName: 'Ada', callSign: 'K0ADA' });
      expect(r.body.expiresIn).toBe(900);
      expect(r.body.refreshToken.length).toBeGreaterThanOrEqual(40);
      const [row] = await t.deps.dataSource.query('SELECT password_hash FROM users WHERE email = $1', ['ada@example.test']);
      expect(row.password_hash).toMatch(/^\$argon2id\$/);
    });

    it('a second sign-up with the same e-mail answers 409 email_taken', async () => {
      const r = await t.api('POST', '/api/auth/sign-up', { body: { email: 'ada@example.test', password: 'another password', displayName: 'Ada 2' } });
      expect(r.status).toBe(409);
      expect(r.body.code).toBe('email_taken');
    });

    it('sign-in with the right password answers tokens; a wrong password or unknown e-mail the same 401', async () => {
      const ok = await t.api('POST', '/api/auth/sign-in', { body: { email: 'ADA@example.test', password: 'long enough pw' } });
      expect(ok.status).toBe(200);
      expect(ok.body.user.email).toBe('ada@example.test');
      const wrong = await t.api('POST', '/api/auth/sign-in', { body: { email: 'ada@example.test', password: 'not the password' } });
      const unknown = await t.api('POST', '/api/auth/sign-in', { body: { email: 'nobody@example.test', password: 'not the password' } });
      expect(wrong.status).toBe(401);
      expect(unknown.status).toBe(401);
      expect(wrong.body).toEqual(unknown.body);
      expect(wrong.body.code).toBe('invalid_credentials');
    });

    it('GET /api/me answers the user and their clubs with roles', async () => {
      const u = await t.signUpUser({ role: 'lead' });
      const r = await t.api('GET', '/api/me', { auth: u });
      expect(r.status).toBe(200);
      expect(r.body.user).toMatchObject({ id: u.id, email: u.email });
      expect(r.body.clubs).toEqual([{ id: u.clubId, name: `Club of ${u.email}`, callSign: '', role: 'lead' }]);
    });
  });

  describe('access tokens', () => {
    it('no Authorization header answers 401 unauthenticated', async () => {
      const r = await t.api('GET', '/api/me');
      expect(r.status).toBe(401);
      expect(r.body.code).toBe('unauthenticated');
    });

    it('an expired access token answers 401 token_expired with a clear message', async () => {
      offsetMs = -20 * 60_000; // issued 20 min ago, lives 15 min
      const u = await t.signUpUser();
      offsetMs = 0;
      const r = await t.api('GET', '/api/me', { auth: u });
      expect(r.status).toBe(401);
      expect(r.body.code).toBe('token_expired');
      expect(r.body.message).toMatch(/expired/);
    });

    it('a tampered token (payload changed, signature kept) answers 401 token_invalid', async () => {
      const u = await t.signUpUser();
      const other = await t.signUpUser();
      const [h, , s] = u.tokens.accessToken.split('.');
      const forged = Buffer.from(JSON.stringify({ ...(jwt.decode(u.tokens.accessToken) as object), sub: other.id })).toString('base64url');
      const r = await t.api('GET', '/api/me', { auth: `${h}.${forged}.${s}` });
      expect(r.status).toBe(401);
      expect(r.body.code).toBe('token_invalid');
    });

    it('a token signed with another secret, a garbage token and a refresh token used as bearer all answer 401', async () => {
      const u = await t.signUpUser();
      const foreign = jwt.sign({ sub: u.id, typ: 'access' }, 'x'.repeat(40), { issuer: 'loftline', audience: 'loftline-api', expiresIn: 900 });
      for (const token of [foreign, 'not-a-jwt', u.tokens.refreshToken]) {
        const r = await t.api('GET', '/api/me', { auth: token });
        expect(r.status, token).toBe(401);
        expect(r.body.code).toBe('token_invalid');
      }
      const unsigned = jwt.sign({ sub: u.id, typ: 'access' }, '', { algorithm: 'none', issuer: 'loftline', audience: 'loftline-api' });
      expect((await t.api('GET', '/api/me', { auth: unsigned })).status).toBe(401);
    });
  });

  describe('refresh and sign-out', () => {
    it('refresh rotates: a new pair, and the new access token works', async () => {
      const u = await t.signUpUser();
      const r = await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } });
      expect(r.status).toBe(200);
      expect(r.body.refreshToken).not.toBe(u.tokens.refreshToken);
      expect((await t.api('GET', '/api/me', { auth: r.body.accessToken })).status).toBe(200);
    });

    it('reusing a rotated refresh token answers 401 refresh_reused and revokes its whole family', async () => {
      const u = await t.signUpUser();
      const first = await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } });
      const replay = await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } });
      expect(replay.status).toBe(401);
      expect(replay.body.code).toBe('refresh_reused');
      const heir = await t.api('POST', '/api/auth/refresh', { body: { refreshToken: first.body.refreshToken } });
      expect(heir.status).toBe(401);
      expect(heir.body.code).toBe('refresh_invalid');
    });

    it('another session of the same user survives the revocation of one family', async () => {
      const u = await t.signUpUser();
      const second = await t.api('POST', '/api/auth/sign-in', { body: { email: u.email, password: u.password } });
      await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } });
      await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } }); // replay: family 1 revoked
      expect((await t.api('POST', '/api/auth/refresh', { body: { refreshToken: second.body.refreshToken } })).status).toBe(200);
    });

    it('an expired refresh token answers 401 refresh_expired', async () => {
      offsetMs = -31 * 24 * 3600_000;
      const u = await t.signUpUser();
      offsetMs = 0;
      const r = await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } });
      expect(r.status).toBe(401);
      expect(r.body.code).toBe('refresh_expired');
    });

    it('an unknown refresh token answers 401 refresh_invalid', async () => {
      const r = await t.api('POST', '/api/auth/refresh', { body: { refreshToken: 'x'.repeat(43) } });
      expect(r.status).toBe(401);
      expect(r.body.code).toBe('refresh_invalid');
    });

    it('sign-out answers 204 (also when repeated) and the session cannot refresh any more', async () => {
      const u = await t.signUpUser();
      expect((await t.api('POST', '/api/auth/sign-out', { body: { refreshToken: u.tokens.refreshToken } })).status).toBe(204);
      expect((await t.api('POST', '/api/auth/sign-out', { body: { refreshToken: u.tokens.refreshToken } })).status).toBe(204);
      const r = await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } });
      expect(r.status).toBe(401);
    });

    it('signing out ends the session at once: its access token is refused, another session of the person keeps working', async () => {
      const u = await t.signUpUser();
      const other = await t.api('POST', '/api/auth/sign-in', { body: { email: u.email, password: u.password } });
      expect((await t.api('GET', '/api/me', { auth: u.tokens.accessToken })).status).toBe(200);
      await t.api('POST', '/api/auth/sign-out', { body: { refreshToken: u.tokens.refreshToken } });
      const after = await t.api('GET', '/api/me', { auth: u.tokens.accessToken });
      expect(after.status).toBe(401);
      expect(after.body.code).toBe('session_ended');
      expect((await t.api('GET', '/api/me', { auth: other.body.accessToken })).status).toBe(200);
    });

    it('a replayed refresh token closes the family, and the access tokens issued in it stop working too', async () => {
      const u = await t.signUpUser();
      const next = await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } });
      expect((await t.api('GET', '/api/me', { auth: next.body.accessToken })).status).toBe(200);
      await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } });
      expect((await t.api('GET', '/api/me', { auth: next.body.accessToken })).body.code).toBe('session_ended');
    });

    it('an access token that names no session (right secret, old format) is refused', async () => {
      const u = await t.signUpUser();
      const noSession = jwt.sign({ sub: u.id, typ: 'access' }, t.deps.config.jwtSecret, { algorithm: 'HS256', issuer: 'loftline', audience: 'loftline-api', expiresIn: 900 });
      const r = await t.api('GET', '/api/me', { auth: noSession });
      expect(r.status).toBe(401);
      expect(r.body.code).toBe('token_invalid');
    });
  });

  describe('password reset', () => {
    const tokenOf = (email: string) => {
      const link = t.mailbox.linkTo(email, `${t.baseUrl}/reset-password?token=`);
      expect(link, `a reset link mailed to ${email}`).toBeTruthy();
      return decodeURIComponent(new URL(link as string).searchParams.get('token') as string);
    };

    it('forgot-password answers 202 for an unknown e-mail and sends nothing', async () => {
      const before = t.mailbox.messages.length;
      const r = await t.api('POST', '/api/auth/forgot-password', { body: { email: 'ghost@example.test' } });
      expect(r.status).toBe(202);
      expect(t.mailbox.messages.length).toBe(before);
    });

    it('forgot-password takes at least the same floor for a known and an unknown address (answer timing reveals no account; OWASP Forgot Password Cheat Sheet, from memory: consistent response time)', async () => {
      const u = await t.signUpUser();
      const timed = async (email: string) => {
        const started = performance.now();
        const r = await t.api('POST', '/api/auth/forgot-password', { body: { email } });
        expect(r.status).toBe(202);
        return performance.now() - started;
      };
      for (const ms of [await timed('nobody-here@example.test'), await timed(u.email)]) expect(ms).toBeGreaterThanOrEqual(FORGOT_PASSWORD_MIN_MS - 5);
    });

    it('the mailed link resets the password once; old password and other sessions stop working', async () => {
      const u = await t.signUpUser();
      expect((await t.api('POST', '/api/auth/forgot-password', { body: { email: u.email } })).status).toBe(202);
      expect(t.mailbox.lastTo(u.email)?.subject).toMatch(/reset/i);
      const token = tokenOf(u.email);
      expect((await t.api('POST', '/api/auth/reset-password', { body: { token, password: 'a brand new secret' } })).status).toBe(204);
      expect((await t.api('POST', '/api/auth/sign-in', { body: { email: u.email, password: u.password } })).status).toBe(401);
      expect((await t.api('POST', '/api/auth/sign-in', { body: { email: u.email, password: 'a brand new secret' } })).status).toBe(200);
      expect((await t.api('POST', '/api/auth/refresh', { body: { refreshToken: u.tokens.refreshToken } })).status).toBe(401);
      expect((await t.api('GET', '/api/me', { auth: u.tokens.accessToken })).body.code).toBe('session_ended');
      const again = await t.api('POST', '/api/auth/reset-password', { body: { token, password: 'yet another secret' } });
      expect(again.status).toBe(410);
      expect(again.body.code).toBe('reset_used');
    });

    it('a reset link older than 1 hour answers 410 reset_expired', async () => {
      const u = await t.signUpUser();
      await t.api('POST', '/api/auth/forgot-password', { body: { email: u.email } });
      const token = tokenOf(u.email);
      offsetMs = 61 * 60_000;
      const r = await t.api('POST', '/api/auth/reset-password', { body: { token, password: 'a brand new secret' } });
      offsetMs = 0;
      expect(r.status).toBe(410);
      expect(r.body.code).toBe('reset_expired');
    });

    it('an unknown reset token answers 400 reset_invalid', async () => {
      const r = await t.api('POST', '/api/auth/reset-password', { body: { token: 'y'.repeat(43), password: 'a brand new secret' } });
      expect(r.status).toBe(400);
      expect(r.body.code).toBe('reset_invalid');
    });
  });
});

describe('auth rate limits', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ config: { authRateLimit: { max: 3, ipMax: 7, windowMs: 60_000 } } });
  });
  afterAll(() => t.close());

  it('failed sign-ins are limited per e-mail, then per client address, with 429 rate_limited', async () => {
    const u = await t.signUpUser();
    const attempt = (email: string) => t.api('POST', '/api/auth/sign-in', { body: { email, password: 'wrong password' } });
    for (let i = 0; i < 3; i++) expect((await attempt(u.email)).status).toBe(401);
    const limited = await attempt(u.email);
    expect(limited.status).toBe(429);
    expect(limited.body.code).toBe('rate_limited');
    // The right password is refused too while the e-mail is locked.
    expect((await t.api('POST', '/api/auth/sign-in', { body: { email: u.email, password: u.password } })).status).toBe(429);
    // Another e-mail from the same address still gets its answer, until the per-address limit (7 failures,
    // counting the 5 refused above) is reached.
    expect((await attempt('other@example.test')).status).toBe(401);
    expect((await attempt('third@example.test')).status).toBe(401);
    expect((await attempt('fourth@example.test')).status).toBe(429);
  });

  it('forgot-password is limited per e-mail', async () => {
    for (let i = 0; i < 3; i++) expect((await t.api('POST', '/api/auth/forgot-password', { body: { email: 'limit@example.test' } })).status).toBe(202);
    expect((await t.api('POST', '/api/auth/forgot-password', { body: { email: 'limit@example.test' } })).status).toBe(429);
  });
});
