// Bad input on EVERY /api route (route-catalog.ts): malformed JSON, bodies that are not objects, missing fields,
// wrong types, oversized fields and bodies, unknown fields, unknown roles, malformed path ids, junk queries, and
// expired, tampered, foreign or garbled bearer tokens. Each gets a 4xx with {code, message} and never a 500 or a
// stack (issue 2, "Bad input … a test proves it for every route").
import jwt from 'jsonwebtoken';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, can, type Role } from '../../shared/schemas';
import { ACCESS_TOKEN_AUDIENCE, ACCESS_TOKEN_ISSUER } from '../../server/src/http/access-token';
import { buildRouteContext, type RouteContext } from './route-context';
import { ROUTES, routeName, routeUrl, type RouteSpec } from './route-catalog';

let ctx: RouteContext;
beforeAll(async () => {
  ctx = await buildRouteContext();
});
afterAll(async () => {
  await ctx?.t.close();
});

/** A member whose role may call the route (so the request reaches validation), or nobody for public routes. */
function caller(r: RouteSpec): string | undefined {
  if (r.access === 'public') return undefined;
  const role = ROLES.find((x: Role) => r.access === 'user' || r.access === 'member' || can(x, r.access as never))!;
  return ctx.users[role].tokens.accessToken;
}

type Answer = { status: number; body: any };
function expectClear4xx(res: Answer, what: string) {
  const shown = `${what} → ${res.status} ${JSON.stringify(res.body)}`;
  expect(res.status, shown).toBeGreaterThanOrEqual(400);
  expect(res.status, shown).toBeLessThan(500);
  expect(typeof res.body?.code, shown).toBe('string');
  expect(typeof res.body?.message, shown).toBe('string');
  expect(res.body.message.length, shown).toBeGreaterThan(5);
  expect(JSON.stringify(res.body), shown).not.toMatch(/\\n\s+at |node_modules|\.ts:\d+/);
}

async function send(r: RouteSpec, body: unknown, opts: { auth?: string; raw?: string; url?: string; headers?: Record<string, string> } = {}) {
  const url = opts.url ?? (await routeUrl(r, ctx));
  return ctx.t.api(r.method, url, {
    auth: opts.auth ?? caller(r),
    body: opts.raw ?? body,
    headers: { 'content-type': 'application/json', ...opts.headers },
  });
}

/** A value of another JSON type than `v`. */
function wrongType(v: unknown): unknown {
  if (typeof v === 'string') return 12345;
  if (typeof v === 'number') return 'twelve';
  if (typeof v === 'boolean') return 'yes';
  if (Array.isArray(v)) return { not: 'a list' };
  if (v && typeof v === 'object') return 'not an object';
  return 42;
}

const jsonRoutes = ROUTES.filter((r) => r.body && !r.raw);
const authed = ROUTES.filter((r) => r.access !== 'public');
const withIdParams = ROUTES.filter((r) => /:(?!clubId)\w+/.test(r.path));

describe.each(jsonRoutes.map((r) => [routeName(r), r] as const))('%s body', (_n, r) => {
  it('malformed JSON → 400 malformed_json', async () => {
    const res = await send(r, undefined, { raw: '{"name": "Alder Bend", ' });
    expectClear4xx(res, 'malformed JSON');
    expect(res.body.code).toBe('malformed_json');
  });

  it.each([['a list', '[]'], ['a string', '"text"'], ['null', 'null'], ['a number', '42'], ['nothing', '']])('a body that is %s → 4xx', async (_w, raw) => {
    expectClear4xx(await send(r, undefined, { raw }), `body ${raw}`);
  });

  it('each required field left out → 400 naming it', async () => {
    if (r.partial) return;
    const valid = (await r.body!(ctx)) as Record<string, unknown>;
    for (const key of Object.keys(valid).filter((k) => !r.optional?.includes(k))) {
      const { [key]: _dropped, ...rest } = valid;
      const res = await send(r, rest);
      expectClear4xx(res, `without ${key}`);
      expect(JSON.stringify(res.body), `without ${key}`).toContain(key);
    }
  });

  it('each field with a wrong type → 400', async () => {
    const valid = (await r.body!(ctx)) as Record<string, unknown>;
    for (const key of Object.keys(valid)) {
      expectClear4xx(await send(r, { ...((await r.body!(ctx)) as object), [key]: wrongType(valid[key]) }), `${key} of the wrong type`);
    }
  });

  it('each text field 100 000 characters long → 4xx (no field is unbounded)', async () => {
    const valid = (await r.body!(ctx)) as Record<string, unknown>;
    for (const key of Object.keys(valid).filter((k) => typeof valid[k] === 'string')) {
      expectClear4xx(await send(r, { ...((await r.body!(ctx)) as object), [key]: 'x'.repeat(100_000) }), `${key} oversized`);
    }
  });

  it('a body over the 2 MB JSON limit → 413', async () => {
    const res = await send(r, undefined, { raw: JSON.stringify({ padding: 'x'.repeat(2_200_000) }) });
    expectClear4xx(res, 'huge body');
    expect(res.status).toBe(413);
  });

  it('an unknown extra field → 400', async () => {
    expectClear4xx(await send(r, { ...((await r.body!(ctx)) as object), favouriteBand: '20m' }), 'unknown field');
  });

  it('an unknown role → 400 listing the roles', async () => {
    const valid = (await r.body!(ctx)) as Record<string, unknown>;
    if (!('role' in valid)) return;
    const res = await send(r, { ...valid, role: 'superuser' });
    expectClear4xx(res, 'unknown role');
    expect(res.body.message).toMatch(/admin, lead, safety, scout, crew/);
  });
});

describe.each(authed.map((r) => [routeName(r), r] as const))('%s bearer token', (_n, r) => {
  const sign = (secret: string, expiresIn: number, sub = ctx.users.admin.id) =>
    jwt.sign({ sub, typ: 'access', iat: Math.floor(Date.now() / 1000) - 3600 }, secret, { algorithm: 'HS256', expiresIn, issuer: ACCESS_TOKEN_ISSUER, audience: ACCESS_TOKEN_AUDIENCE });

  it('expired → 401 token_expired', async () => {
    const res = await send(r, r.body ? await r.body(ctx) : undefined, { auth: sign(ctx.t.deps.config.jwtSecret, 60) });
    expect(res.status).toBe(401);
    if (r.method !== 'HEAD') expect(res.body.code).toBe('token_expired');
  });

  it('tampered payload, another server’s signature, garbage, or a refresh token in its place → 401', async () => {
    const good = ctx.users.admin.tokens.accessToken;
    const [h, p, s] = good.split('.');
    const payload = JSON.parse(Buffer.from(p!, 'base64url').toString());
    const forged = `${h}.${Buffer.from(JSON.stringify({ ...payload, sub: ctx.outsider.id })).toString('base64url')}.${s}`;
    const foreign = jwt.sign({ sub: ctx.users.admin.id, typ: 'access' }, 'another-server-secret-another-server-secret', { algorithm: 'HS256', expiresIn: 600, issuer: ACCESS_TOKEN_ISSUER, audience: ACCESS_TOKEN_AUDIENCE });
    for (const token of [forged, foreign, 'not-a-jwt', `${good}x`, ctx.users.admin.tokens.refreshToken]) {
      const res = await send(r, r.body ? await r.body(ctx) : undefined, { auth: token });
      expect(res.status, token.slice(0, 20)).toBe(401);
      if (r.method !== 'HEAD') expectClear4xx(res, 'bad token');
    }
  });
});

describe.each(withIdParams.map((r) => [routeName(r), r] as const))('%s path', (_n, r) => {
  const names = [...r.path.matchAll(/:(\w+)/g)].map((m) => m[1]!).filter((n) => n !== 'clubId');
  it.each(names)('a malformed :%s → 4xx', async (name) => {
    const url = await routeUrl(r, ctx, ctx.clubId, { [name]: 'not-an-id' });
    const res = await send(r, r.body && !r.raw ? await r.body(ctx) : undefined, { url });
    if (r.method === 'HEAD') expect(res.status).toBeGreaterThanOrEqual(400);
    else expectClear4xx(res, `malformed ${name} ${url}`);
  });
});

describe('club id in the path', () => {
  it.each(ROUTES.filter((r) => r.path.includes(':clubId')).map((r) => [routeName(r), r] as const))('%s with a malformed club id → 404 club not found', async (_n, r) => {
    const url = await routeUrl(r, ctx, 'kestrel-ridge');
    const res = await send(r, r.body && !r.raw ? await r.body(ctx) : undefined, { url });
    expect(res.status).toBe(404);
    if (r.method !== 'HEAD') expect(res.body).toEqual({ code: 'not_found', message: 'club not found' });
  });
});

describe('junk query strings', () => {
  it.each(ROUTES.filter((r) => r.method === 'GET').map((r) => [routeName(r), r] as const))('%s never answers 500 to a junk query', async (_n, r) => {
    const url = `${await routeUrl(r, ctx)}?includeDeleted=maybe&limit=abc&siteId=1&cursor[$gt]=&to[]=a&to[]=b`;
    const res = await send(r, undefined, { url });
    expect(res.status, JSON.stringify(res.body)).toBeLessThan(500);
    if (res.status >= 400) expectClear4xx(res, 'junk query');
  });
});
