// Clubs and members over the HTTP API against real PostgreSQL: creating a club makes its creator admin, a person
// may hold a different role in each club, admins change roles and remove members, and a club never loses its
// last admin (issue 2, "Identity" and "As an admin, change a member's role or remove them").
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { clubSchema, memberSchema } from '../../shared/schemas';
import { MembershipEntity } from '../../server/src/db/entities';
import { startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t?.close();
});

async function newClub(name = 'Kestrel Ridge Amateur Radio Club') {
  const admin = await t.signUpUser({ displayName: 'Ada Admin' });
  const res = await t.api('POST', '/api/clubs', { auth: admin, body: { name, callSign: 'k0krc' } });
  expect(res.status).toBe(201);
  return { admin, club: clubSchema.parse(res.body) };
}

describe('clubs', () => {
  it('creating a club makes the creator its admin, with the call sign upper-cased', async () => {
    const { admin, club } = await newClub();
    expect(club).toMatchObject({ name: 'Kestrel Ridge Amateur Radio Club', callSign: 'K0KRC', role: 'admin' });
    const list = await t.api('GET', '/api/clubs', { auth: admin });
    expect(list.status).toBe(200);
    expect(list.body).toEqual([club]);
    const one = await t.api('GET', `/api/clubs/${club.id}`, { auth: admin });
    expect(one.body).toEqual(club);
    const members = await t.api('GET', `/api/clubs/${club.id}/members`, { auth: admin });
    expect(members.body).toHaveLength(1);
    expect(memberSchema.parse(members.body[0])).toMatchObject({ userId: admin.id, role: 'admin', displayName: 'Ada Admin' });
  });

  it('a person may belong to two clubs with a different role in each, and lists each with its own role', async () => {
    const a = await newClub('Alpha Valley Radio Society');
    const b = await newClub('Beta Hill Contest Group');
    const person = await t.signUpUser({ role: 'scout', clubId: a.club.id });
    // put the same person into club b as safety officer (membership rows are per club)
    await t.deps.dataSource.getRepository(MembershipEntity).insert({ clubId: b.club.id, userId: person.id, role: 'safety' });
    const list = await t.api('GET', '/api/clubs', { auth: person });
    expect(list.body.map((c: { name: string; role: string }) => [c.name, c.role])).toEqual([
      ['Alpha Valley Radio Society', 'scout'],
      ['Beta Hill Contest Group', 'safety'],
    ]);
    const me = await t.api('GET', '/api/me', { auth: person });
    expect(me.body.clubs.map((c: { role: string }) => c.role).sort()).toEqual(['safety', 'scout']);
  });

  it('an admin renames the club and changes its call sign; an empty change is 400', async () => {
    const { admin, club } = await newClub();
    const renamed = await t.api('PATCH', `/api/clubs/${club.id}`, { auth: admin, body: { name: 'Kestrel Ridge ARC', callSign: 'w0krc' } });
    expect(renamed.status).toBe(200);
    expect(renamed.body).toEqual({ ...club, name: 'Kestrel Ridge ARC', callSign: 'W0KRC' });
    const empty = await t.api('PATCH', `/api/clubs/${club.id}`, { auth: admin, body: {} });
    expect(empty.status).toBe(400);
    expect(empty.body.message).toMatch(/new name or call sign/);
  });

  it("another club's id answers 404, exactly like an id that does not exist", async () => {
    const { club } = await newClub();
    const stranger = await t.signUpUser();
    const theirs = await t.api('GET', `/api/clubs/${club.id}`, { auth: stranger });
    const none = await t.api('GET', '/api/clubs/00000000-0000-4000-8000-000000000000', { auth: stranger });
    expect(theirs.status).toBe(404);
    expect(none.status).toBe(404);
    expect(theirs.body).toEqual(none.body);
  });
});

describe('members', () => {
  it('an admin changes a member role; the member then has the abilities of the new role only', async () => {
    const { admin, club } = await newClub();
    const scout = await t.signUpUser({ role: 'scout', clubId: club.id });
    const site = { name: 'Alder Bend Meadows', refLat: 45.1, refLon: -93.2 };
    expect((await t.api('POST', `/api/clubs/${club.id}/sites`, { auth: scout, body: site })).status).toBe(403);
    const res = await t.api('PATCH', `/api/clubs/${club.id}/members/${scout.id}`, { auth: admin, body: { role: 'lead' } });
    expect(res.status).toBe(200);
    expect(memberSchema.parse(res.body)).toMatchObject({ userId: scout.id, role: 'lead' });
    expect((await t.api('POST', `/api/clubs/${club.id}/sites`, { auth: scout, body: site })).status).toBe(201);
  });

  it('a non-admin cannot change roles (403) and the role stays', async () => {
    const { club } = await newClub();
    const lead = await t.signUpUser({ role: 'lead', clubId: club.id });
    const crew = await t.signUpUser({ role: 'crew', clubId: club.id });
    const res = await t.api('PATCH', `/api/clubs/${club.id}/members/${crew.id}`, { auth: lead, body: { role: 'admin' } });
    expect(res.status).toBe(403);
    expect(res.body.code).toBe('forbidden');
    const members = await t.api('GET', `/api/clubs/${club.id}/members`, { auth: lead });
    expect(members.body.find((m: { userId: string }) => m.userId === crew.id).role).toBe('crew');
  });

  it('removing a member takes away access to that club only', async () => {
    const { admin, club } = await newClub();
    const other = await newClub('Other Club');
    const crew = await t.signUpUser({ role: 'crew', clubId: club.id });
    await t.deps.dataSource.getRepository(MembershipEntity).insert({ clubId: other.club.id, userId: crew.id, role: 'lead' });
    expect((await t.api('DELETE', `/api/clubs/${club.id}/members/${crew.id}`, { auth: admin })).status).toBe(204);
    expect((await t.api('GET', `/api/clubs/${club.id}`, { auth: crew })).status).toBe(404);
    expect((await t.api('GET', `/api/clubs/${other.club.id}`, { auth: crew })).status).toBe(200);
    expect((await t.api('DELETE', `/api/clubs/${club.id}/members/${crew.id}`, { auth: admin })).status).toBe(404);
  });

  it('the last admin can be neither demoted nor removed (409 last_admin); with a second admin both work', async () => {
    const { admin, club } = await newClub();
    const demote = await t.api('PATCH', `/api/clubs/${club.id}/members/${admin.id}`, { auth: admin, body: { role: 'lead' } });
    expect(demote.status).toBe(409);
    expect(demote.body.code).toBe('last_admin');
    expect(demote.body.message).toMatch(/at least one admin/);
    const remove = await t.api('DELETE', `/api/clubs/${club.id}/members/${admin.id}`, { auth: admin });
    expect(remove.status).toBe(409);

    const second = await t.signUpUser({ role: 'lead', clubId: club.id });
    expect((await t.api('PATCH', `/api/clubs/${club.id}/members/${second.id}`, { auth: admin, body: { role: 'admin' } })).status).toBe(200);
    expect((await t.api('PATCH', `/api/clubs/${club.id}/members/${admin.id}`, { auth: admin, body: { role: 'safety' } })).status).toBe(200);
    // now `second` is the only admin
    expect((await t.api('DELETE', `/api/clubs/${club.id}/members/${second.id}`, { auth: second })).status).toBe(409);
  });

  it('two admins demoting each other at the same moment leave exactly one admin (club row lock)', async () => {
    const { admin, club } = await newClub();
    const second = await t.signUpUser({ role: 'admin', clubId: club.id });
    const [r1, r2] = await Promise.all([
      t.api('PATCH', `/api/clubs/${club.id}/members/${second.id}`, { auth: admin, body: { role: 'lead' } }),
      t.api('PATCH', `/api/clubs/${club.id}/members/${admin.id}`, { auth: second, body: { role: 'lead' } }),
    ]);
    // One demotion wins; the other either finds no admin rights left (403) or the last-admin rule (409).
    expect([r1.status, r2.status].filter((s) => s === 200)).toHaveLength(1);
    const rows: { n: number }[] = await t.deps.dataSource.query("SELECT count(*)::int AS n FROM memberships WHERE club_id = $1 AND role = 'admin'", [club.id]);
    expect(rows[0]!.n).toBe(1);
  });
});
