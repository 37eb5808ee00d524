// The world the route matrix tests run in: one club with a member of every role, an outsider who is admin of another
// club, and factories for fresh records (each call makes a new one, so a DELETE never eats another test's fixture).
import { randomUUID } from 'node:crypto';
import { ROLES, type Role } from '../../shared/schemas';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';

export interface RouteContext {
  t: TestApp;
  clubId: string;
  users: Record<Role, TestUser>;
  /** Admin of another club: every club-scoped route of `clubId` must answer 404 to them. */
  outsider: TestUser;
  fresh: {
    siteId(): Promise<string>;
    eventId(): Promise<string>;
    /** A crew member added to the club for the occasion (a target for role change and removal). */
    memberUserId(): Promise<string>;
    invitationId(): Promise<string>;
    /** The token of a new, open invitation (read from the test mailbox). */
    inviteToken(): Promise<string>;
    /** A refresh token of a new session of the admin. */
    refreshToken(): Promise<string>;
  };
}

export const SHA_ZERO = '0'.repeat(64);

function must<T>(status: number, want: number, body: T, what: string): T {
  if (status !== want) throw new Error(`fixture ${what}: ${status} ${JSON.stringify(body)}`);
  return body;
}

export async function buildRouteContext(): Promise<RouteContext> {
  const t = await startTestApp();
  const admin = await t.signUpUser({ displayName: 'Ada Admin' });
  const club = await t.api('POST', '/api/clubs', { auth: admin, body: { name: 'Kestrel Ridge Amateur Radio Club', callSign: 'K0KRC' } });
  const clubId = must(club.status, 201, club.body, 'club').id as string;
  admin.clubId = clubId;
  const users = { admin } as Record<Role, TestUser>;
  for (const role of ROLES) if (role !== 'admin') users[role] = await t.signUpUser({ role, clubId, displayName: `Test ${role}` });
  const outsider = await t.signUpUser({ role: 'admin' });

  let n = 0;
  const siteId = async () => {
    const r = await t.api('POST', `/api/clubs/${clubId}/sites`, { auth: admin, body: { name: `Site ${++n}`, refLat: 44.93, refLon: -92.87 } });
    return must(r.status, 201, r.body, 'site').id as string;
  };
  const invite = async () => {
    const email = `invitee-${randomUUID()}@kestrel.test`;
    const r = await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email, role: 'scout' } });
    must(r.status, 201, r.body, 'invitation');
    const link = t.mailbox.linkTo(email, `${t.baseUrl}/invite/`);
    if (!link) throw new Error('fixture invitation: no link in the mailbox');
    return { id: r.body.id as string, token: link.slice(`${t.baseUrl}/invite/`.length) };
  };
  return {
    t,
    clubId,
    users,
    outsider,
    fresh: {
      siteId,
      async eventId() {
        const r = await t.api('POST', `/api/clubs/${clubId}/events`, {
          auth: admin,
          body: { siteId: await siteId(), name: `Outing ${++n}`, startsOn: '2026-12-19', endsOn: '2026-12-20' },
        });
        return must(r.status, 201, r.body, 'event').id as string;
      },
      async memberUserId() {
        return (await t.signUpUser({ role: 'crew', clubId })).id;
      },
      invitationId: async () => (await invite()).id,
      inviteToken: async () => (await invite()).token,
      async refreshToken() {
        const r = await t.api('POST', '/api/auth/sign-in', { body: { email: admin.email, password: admin.password } });
        return must(r.status, 200, r.body, 'sign-in').refreshToken as string;
      },
    },
  };
}
