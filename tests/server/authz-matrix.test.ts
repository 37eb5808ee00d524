// The authorization matrix over EVERY /api route (route-catalog.ts), against the real app and PostgreSQL:
// anonymous → 401, a member of another club → 404 (the club's data does not admit it exists), a member whose role
// lacks the ability → 403, a member whose role has it → let through. Contract: /tmp briefs "Authorization: not a
// member of the club → 404; a member whose role lacks the ability → 403. Tested for every route"; role grants from
// shared/schemas/roles.ts (can()).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, can, type Role } from '../../shared/schemas';
import { MODULES } from '../../server/src/modules';
import { buildRouteContext, type RouteContext } from './route-context';
import { ROUTES, routeName, routeUrl, type RouteSpec } from './route-catalog';

let ctx: RouteContext;
beforeAll(async () => {
  ctx = await buildRouteContext();
});
afterAll(async () => {
  await ctx?.t.close();
});

type Layer = { route?: { path: string; methods: Record<string, boolean> }; handle?: { stack?: unknown[] } };

/** Every route the mounted routers declare, as "METHOD /api/…". */
function mountedRoutes(c: RouteContext): string[] {
  const found: string[] = [];
  for (const m of MODULES) {
    const router = m.router(c.t.deps) as unknown as { stack: Layer[] };
    for (const layer of router.stack) {
      if (!layer.route) {
        // A nested router would hide routes from this list: make the test say so rather than miss them.
        if (layer.handle?.stack) throw new Error(`module mounted at '${m.mount}' nests a router: list its routes by hand`);
        continue;
      }
      const sub = layer.route.path === '/' ? '' : layer.route.path;
      for (const method of Object.keys(layer.route.methods)) found.push(`${method.toUpperCase()} /api${m.mount}${sub}`);
    }
  }
  return found;
}

async function call(r: RouteSpec, who: { auth?: string } & { clubId?: string }) {
  const url = await routeUrl(r, ctx, who.clubId);
  const body = r.raw ? undefined : r.body ? await r.body(ctx) : undefined;
  const headers: Record<string, string> = r.raw ? { 'content-type': 'application/octet-stream' } : {};
  return ctx.t.api(r.method, url, { auth: who.auth, body: r.raw ? 'raw-bytes' : body, headers });
}

const isClubScoped = (r: RouteSpec) => r.path.includes(':clubId');
const needsMembership = (r: RouteSpec) => r.access !== 'public' && r.access !== 'user';
const allowed = (r: RouteSpec, role: Role) => r.access === 'public' || r.access === 'user' || r.access === 'member' || can(role, r.access);

describe('route catalog', () => {
  it('lists every route the app mounts, and nothing it does not', () => {
    const mounted = mountedRoutes(ctx).sort();
    const listed = ROUTES.map(routeName).sort();
    expect(listed).toEqual(mounted);
  });
});

describe.each(ROUTES.map((r) => [routeName(r), r] as const))('%s', (_name, r) => {
  // Tests are registered only where they apply, so the report lists no skipped cases.
  if (r.access === 'public') {
    it('anyone is let through without signing in (not 401/403)', async () => {
      const res = await call(r, {});
      expect([401, 403]).not.toContain(res.status);
      expect(res.status).toBeLessThan(500);
    });
    return;
  }

  it('anonymous → 401', async () => {
    const res = await call(r, {});
    expect(res.status).toBe(401);
    if (r.method !== 'HEAD') expect(res.body.code).toMatch(/^(unauthenticated|token_invalid)$/);
  });

  if (needsMembership(r) && isClubScoped(r)) {
    it('an admin of another club → 404, the same answer as a club that does not exist', async () => {
      const theirs = await call(r, { auth: ctx.outsider.tokens.accessToken });
      const none = await call(r, { auth: ctx.outsider.tokens.accessToken, clubId: '00000000-0000-4000-8000-000000000000' });
      expect(theirs.status).toBe(404);
      expect(none.status).toBe(404);
      if (r.method !== 'HEAD') {
        expect(theirs.body).toEqual({ code: 'not_found', message: 'club not found' });
        expect(none.body).toEqual(theirs.body);
      }
    });
  }

  const denied = ROLES.filter((role) => !allowed(r, role));
  if (denied.length) {
    it.each(denied)('role %s lacks the ability → 403', async (role) => {
      const res = await call(r, { auth: ctx.users[role].tokens.accessToken });
      expect(res.status).toBe(403);
      if (r.method !== 'HEAD') {
        expect(res.body.code).toBe('forbidden');
        expect(res.body.message).toContain(role);
      }
    });
  }

  it.each(ROLES.filter((role) => allowed(r, role)))('role %s is let through (not 401/403, not "club not found")', async (role) => {
    const res = await call(r, { auth: ctx.users[role].tokens.accessToken });
    expect(res.status, JSON.stringify(res.body)).not.toBe(401);
    expect(res.status, JSON.stringify(res.body)).not.toBe(403);
    if (res.status === 404 && r.method !== 'HEAD') expect(res.body.message).not.toBe('club not found');
    expect(res.status).toBeLessThan(500);
  });
});
