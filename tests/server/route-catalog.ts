// Every /api route of the app, in one list, with who may call it and a body it accepts. The authorization matrix
// (authz-matrix.test.ts) and the bad-input suite (bad-input.test.ts) are driven by it, and a completeness test fails
// when a router mounts a route that is missing here: adding a route means adding one entry below.
import { randomUUID } from 'node:crypto';
import type { Ability } from '../../shared/schemas';
import { PROTOCOL_VERSION, SCHEMA_VERSION } from '../../sync/protocol';
import { SHA_ZERO, type RouteContext } from './route-context';

export type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE' | 'HEAD';

/**
 * public: anyone · user: any signed-in person · member: a member of :clubId in any role ·
 * an ability: a member of :clubId whose role grants it (shared/schemas/roles.ts).
 */
export type Access = 'public' | 'user' | 'member' | Ability;

export interface RouteSpec {
  method: Method;
  /** The Express pattern under /api, e.g. '/api/clubs/:clubId/sites/:id'. */
  path: string;
  access: Access;
  /** Values of the path parameters other than :clubId (fresh records where a call may consume them). */
  params?: (ctx: RouteContext) => Promise<Record<string, string>>;
  /** A JSON body the route accepts (omitted: the route takes none). */
  body?: (ctx: RouteContext) => Promise<unknown> | unknown;
  /** Every field of the body is optional (PATCH): dropping one is not an error. */
  partial?: boolean;
  /** Fields of `body` that may be left out. */
  optional?: string[];
  /** The body is raw bytes, not JSON. */
  raw?: boolean;
  /** Only exists with the fake mail transport. */
  devOnly?: boolean;
}

const uuid = () => randomUUID();
const site = { name: 'Alder Bend Meadows', refLat: 44.9312, refLon: -92.8671, notes: 'North gate' };
const versions = { protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION };

export const ROUTES: RouteSpec[] = [
  // ---- health and auth (H3a) ----
  { method: 'GET', path: '/api/health', access: 'public' },
  {
    method: 'POST', path: '/api/auth/sign-up', access: 'public', optional: ['callSign'],
    body: () => ({ email: `new-${uuid()}@kestrel.test`, password: 'a long enough password', displayName: 'New Person', callSign: 'K0NEW' }),
  },
  { method: 'POST', path: '/api/auth/sign-in', access: 'public', body: (c) => ({ email: c.users.admin.email, password: c.users.admin.password }) },
  { method: 'POST', path: '/api/auth/refresh', access: 'public', body: async (c) => ({ refreshToken: await c.fresh.refreshToken() }) },
  { method: 'POST', path: '/api/auth/sign-out', access: 'public', body: async (c) => ({ refreshToken: await c.fresh.refreshToken() }) },
  { method: 'POST', path: '/api/auth/forgot-password', access: 'public', body: (c) => ({ email: c.users.crew.email }) },
  { method: 'POST', path: '/api/auth/reset-password', access: 'public', body: () => ({ token: 'x'.repeat(43), password: 'a long enough password' }) },
  { method: 'GET', path: '/api/me', access: 'user' },

  // ---- clubs, members, invitations (H3b) ----
  { method: 'POST', path: '/api/clubs', access: 'user', optional: ['callSign'], body: () => ({ name: 'Heron Point Radio Club', callSign: 'K0HPR' }) },
  { method: 'GET', path: '/api/clubs', access: 'user' },
  { method: 'GET', path: '/api/clubs/:clubId', access: 'member' },
  { method: 'PATCH', path: '/api/clubs/:clubId', access: 'club.manage', partial: true, body: () => ({ name: 'Kestrel Ridge Amateur Radio Club', callSign: 'K0KRC' }) },
  { method: 'GET', path: '/api/clubs/:clubId/members', access: 'member' },
  {
    method: 'PATCH', path: '/api/clubs/:clubId/members/:userId', access: 'club.manage',
    params: async (c) => ({ userId: await c.fresh.memberUserId() }), body: () => ({ role: 'scout' }),
  },
  { method: 'DELETE', path: '/api/clubs/:clubId/members/:userId', access: 'club.manage', params: async (c) => ({ userId: await c.fresh.memberUserId() }) },
  { method: 'POST', path: '/api/clubs/:clubId/invitations', access: 'club.manage', body: () => ({ email: `inv-${uuid()}@kestrel.test`, role: 'crew' }) },
  { method: 'GET', path: '/api/clubs/:clubId/invitations', access: 'club.manage' },
  {
    method: 'DELETE', path: '/api/clubs/:clubId/invitations/:invitationId', access: 'club.manage',
    params: async (c) => ({ invitationId: await c.fresh.invitationId() }),
  },
  { method: 'GET', path: '/api/invitations/:token', access: 'public', params: async (c) => ({ token: await c.fresh.inviteToken() }) },
  {
    method: 'POST', path: '/api/invitations/accept', access: 'public', optional: ['signUp'],
    body: async (c) => ({ token: await c.fresh.inviteToken(), signUp: { password: 'a long enough password', displayName: 'Invited Person' } }),
  },

  // ---- sites and events (H3b) ----
  { method: 'GET', path: '/api/clubs/:clubId/sites', access: 'member' },
  { method: 'POST', path: '/api/clubs/:clubId/sites', access: 'event.write', optional: ['notes'], body: () => ({ ...site }) },
  { method: 'GET', path: '/api/clubs/:clubId/sites/:id', access: 'member', params: async (c) => ({ id: await c.fresh.siteId() }) },
  {
    method: 'PATCH', path: '/api/clubs/:clubId/sites/:id', access: 'event.write', partial: true,
    params: async (c) => ({ id: await c.fresh.siteId() }), body: () => ({ notes: 'Bring the long throw line.', refLat: 44.94 }),
  },
  { method: 'DELETE', path: '/api/clubs/:clubId/sites/:id', access: 'event.write', params: async (c) => ({ id: await c.fresh.siteId() }) },
  { method: 'GET', path: '/api/clubs/:clubId/events', access: 'member' },
  {
    method: 'POST', path: '/api/clubs/:clubId/events', access: 'event.write', optional: ['notes'],
    body: async (c) => ({ siteId: await c.fresh.siteId(), name: 'Autumn outing', startsOn: '2026-12-19', endsOn: '2026-12-20', notes: '' }),
  },
  { method: 'GET', path: '/api/clubs/:clubId/events/:id', access: 'member', params: async (c) => ({ id: await c.fresh.eventId() }) },
  {
    method: 'PATCH', path: '/api/clubs/:clubId/events/:id', access: 'event.write', partial: true,
    params: async (c) => ({ id: await c.fresh.eventId() }), body: () => ({ name: 'Autumn outing, day two', endsOn: '2026-12-21' }),
  },
  { method: 'DELETE', path: '/api/clubs/:clubId/events/:id', access: 'event.write', params: async (c) => ({ id: await c.fresh.eventId() }) },

  // ---- dev mailbox (H3b) ----
  { method: 'GET', path: '/api/dev/mailbox', access: 'public', devOnly: true },
  { method: 'GET', path: '/api/dev/mailbox/:id', access: 'public', devOnly: true, params: async () => ({ id: uuid() }) },

  // ---- photos (H5b) ----
  { method: 'HEAD', path: '/api/clubs/:clubId/photos/:sha256', access: 'member', params: async () => ({ sha256: SHA_ZERO }) },
  { method: 'GET', path: '/api/clubs/:clubId/photos/:sha256', access: 'member', params: async () => ({ sha256: SHA_ZERO }) },
  {
    method: 'POST', path: '/api/clubs/:clubId/photos/:sha256/uploads', access: 'survey.write',
    params: async () => ({ sha256: SHA_ZERO }), body: () => ({ bytes: 1000, mimeType: 'image/jpeg' }),
  },
  {
    method: 'GET', path: '/api/clubs/:clubId/photos/:sha256/uploads/:uploadId', access: 'survey.write',
    params: async () => ({ sha256: SHA_ZERO, uploadId: uuid() }),
  },
  {
    method: 'PUT', path: '/api/clubs/:clubId/photos/:sha256/uploads/:uploadId', access: 'survey.write', raw: true,
    params: async () => ({ sha256: SHA_ZERO, uploadId: uuid() }),
  },
  {
    method: 'POST', path: '/api/clubs/:clubId/photos/:sha256/uploads/:uploadId/complete', access: 'survey.write',
    params: async () => ({ sha256: SHA_ZERO, uploadId: uuid() }),
  },

  // ---- sync (H5a): every member syncs; each mutation is checked against the role inside the push ----
  { method: 'POST', path: '/api/clubs/:clubId/sync/push', access: 'member', body: () => ({ type: 'push', ...versions, deviceId: `matrix-${uuid()}`, mutations: [] }) },
  { method: 'POST', path: '/api/clubs/:clubId/sync/pull', access: 'member', body: () => ({ type: 'pull', ...versions, cursor: '0', limit: 10 }) },
  { method: 'GET', path: '/api/clubs/:clubId/sync/rejected', access: 'member' },
  { method: 'GET', path: '/api/clubs/:clubId/sync/conflicts', access: 'member' },
  // ---- sync problems (PROBLEMS helper): leads and admins settle conflicts; each person dismisses their own refusals ----
  { method: 'POST', path: '/api/clubs/:clubId/sync/rejected/:rejectedId/dismiss', access: 'member', params: async () => ({ rejectedId: '987654321' }) },
  {
    method: 'POST', path: '/api/clubs/:clubId/sync/conflicts/:conflictId/resolve', access: 'plan.write', optional: ['note'],
    params: async () => ({ conflictId: '987654321' }), body: () => ({ choice: 'other', note: 'Measured again with the clinometer.' }),
  },

  // ---- notification settings (H7b): each member reads and sets their own ----
  { method: 'GET', path: '/api/clubs/:clubId/notification-settings', access: 'member' },
  {
    method: 'PUT', path: '/api/clubs/:clubId/notification-settings', access: 'member',
    body: () => ({ reviewWaiting: true, spotSentBack: false, spotCleared: true, sheetReady: true }),
  },
];

export const routeName = (r: RouteSpec) => `${r.method} ${r.path}`;

/** The concrete URL of a route: :clubId from the context (or `clubId`), the other parameters from `params`. */
export async function routeUrl(r: RouteSpec, ctx: RouteContext, clubId = ctx.clubId, overrides: Record<string, string> = {}): Promise<string> {
  const values = { clubId, ...(r.params ? await r.params(ctx) : {}), ...overrides };
  return r.path.replace(/:(\w+)/g, (_, name: string) => {
    const v = (values as Record<string, string>)[name];
    if (v === undefined) throw new Error(`${routeName(r)}: no value for :${name}`);
    return encodeURIComponent(v);
  });
}
