// The route guards (server/src/http/auth.ts) on a small router: membership of :clubId or 404, ability or 403
// (contracts.md: "not a member of the club → 404; a member whose role lacks the ability → 403").
import express from 'express';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, can } from '../../shared/schemas';
import { authGuards, requireAbility } from '../../server/src/http/auth';
import { errorMiddleware } from '../../server/src/http/error-middleware';
import { startTestApp, type TestApp } from './helpers/test-app';

describe('auth guards', () => {
  let t: TestApp;
  let base: string;
  let close: () => void;
  beforeAll(async () => {
    t = await startTestApp();
    const app = express();
    const g = authGuards(t.deps);
    app.get('/clubs/:clubId/read', g.requireUser, g.requireMembership, (req, res) => {
      res.json({ role: req.membership?.role });
    });
    app.post('/clubs/:clubId/manage', g.requireUser, g.requireMembership, requireAbility('club.manage'), (_req, res) => {
      res.json({ ok: true });
    });
    app.use(errorMiddleware(t.deps.logger));
    const server = app.listen(0, '127.0.0.1');
    await new Promise((ok) => server.once('listening', ok));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    close = () => server.close();
  });
  afterAll(async () => {
    close();
    await t.close();
  });

  const call = async (method: string, path: string, token?: string) => {
    const res = await fetch(`${base}${path}`, { method, headers: token ? { authorization: `Bearer ${token}` } : {} });
    return { status: res.status, body: await res.json() };
  };

  it('a member reads their club and sees their role', async () => {
    const u = await t.signUpUser({ role: 'crew' });
    expect(await call('GET', `/clubs/${u.clubId}/read`, u.tokens.accessToken)).toEqual({ status: 200, body: { role: 'crew' } });
  });

  it('a signed-in non-member gets 404 not_found, the same as for a club that does not exist or a malformed id', async () => {
    const owner = await t.signUpUser({ role: 'admin' });
    const stranger = await t.signUpUser({ role: 'admin' });
    const a = await call('GET', `/clubs/${owner.clubId}/read`, stranger.tokens.accessToken);
    const b = await call('GET', `/clubs/00000000-0000-4000-8000-000000000000/read`, stranger.tokens.accessToken);
    const c = await call('GET', `/clubs/not-a-uuid/read`, stranger.tokens.accessToken);
    expect(a.status).toBe(404);
    expect(a.body).toEqual(b.body);
    expect(c.body).toEqual(a.body);
    expect(a.body.code).toBe('not_found');
  });

  it('no token at all gets 401 before membership is considered', async () => {
    const u = await t.signUpUser({ role: 'admin' });
    expect((await call('GET', `/clubs/${u.clubId}/read`)).status).toBe(401);
  });

  it.each(ROLES)('role %s: club.manage answers 200 only where can() grants it, else 403 forbidden', async (role) => {
    const u = await t.signUpUser({ role });
    const r = await call('POST', `/clubs/${u.clubId}/manage`, u.tokens.accessToken);
    if (can(role, 'club.manage')) expect(r.status).toBe(200);
    else {
      expect(r.status).toBe(403);
      expect(r.body.code).toBe('forbidden');
      expect(r.body.details).toEqual({ needs: 'club.manage', role });
    }
  });

  it('the same person holds different roles in two clubs', async () => {
    const u = await t.signUpUser({ role: 'admin' });
    const other = await t.signUpUser({ role: 'admin' });
    await t.deps.dataSource.query('INSERT INTO memberships (club_id, user_id, role) VALUES ($1, $2, $3)', [other.clubId, u.id, 'scout']);
    expect((await call('POST', `/clubs/${u.clubId}/manage`, u.tokens.accessToken)).status).toBe(200);
    expect((await call('POST', `/clubs/${other.clubId}/manage`, u.tokens.accessToken)).status).toBe(403);
  });
});
