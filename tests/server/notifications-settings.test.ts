// GET/PUT /api/clubs/:clubId/notification-settings against the real server and PostgreSQL: defaults, per person and
// per club, the kinds each role receives, bad bodies refused without losing the stored choice, and who may call it.
// (The authz matrix and bad-input suites also drive these routes from tests/server/route-catalog.ts.)
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';

let app: TestApp;
let lead: TestUser, crew: TestUser, outsider: TestUser;
let clubId: string, secondClubId: string;
const path = (id: string) => `/api/clubs/${id}/notification-settings`;
const ALL_ON = { reviewWaiting: true, spotSentBack: true, spotCleared: true, sheetReady: true };

beforeAll(async () => {
  app = await startTestApp();
  lead = await app.signUpUser({ role: 'lead' });
  clubId = lead.clubId!;
  crew = await app.signUpUser({ role: 'crew', clubId });
  outsider = await app.signUpUser({ role: 'admin' });
  // The crew member is also the safety officer of a second club.
  secondClubId = outsider.clubId!;
  await app.deps.dataSource.query("INSERT INTO memberships (club_id, user_id, role) VALUES ($1, $2, 'safety')", [secondClubId, crew.id]);
});
afterAll(() => app?.close());

describe('notification settings', () => {
  it('every kind is on until the person turns it off, and the answer says which kinds their role receives', async () => {
    const res = await app.api('GET', path(clubId), { auth: crew });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ settings: ALL_ON, forRole: ['sheetReady'] });
    expect((await app.api('GET', path(clubId), { auth: lead })).body.forRole).toEqual(['spotSentBack', 'spotCleared']);
    expect((await app.api('GET', path(secondClubId), { auth: crew })).body.forRole).toEqual(['reviewWaiting']);
    expect((await app.api('GET', path(secondClubId), { auth: outsider })).body.forRole).toEqual([]);
  });

  it('a member of any role (crew here) stores their own choice, per club; nobody else’s changes', async () => {
    const off = { ...ALL_ON, sheetReady: false };
    const put = await app.api('PUT', path(clubId), { auth: crew, body: off });
    expect(put.status).toBe(200);
    expect(put.body.settings).toEqual(off);
    expect((await app.api('GET', path(clubId), { auth: crew })).body.settings).toEqual(off);
    expect((await app.api('GET', path(secondClubId), { auth: crew })).body.settings).toEqual(ALL_ON);
    expect((await app.api('GET', path(clubId), { auth: lead })).body.settings).toEqual(ALL_ON);
    const back = await app.api('PUT', path(clubId), { auth: crew, body: ALL_ON });
    expect(back.body.settings).toEqual(ALL_ON);
  });

  it('a bad body is refused with a clear error and the stored choice is kept', async () => {
    await app.api('PUT', path(clubId), { auth: lead, body: { ...ALL_ON, spotCleared: false } });
    for (const body of [{ ...ALL_ON, spotCleared: 'no' }, { reviewWaiting: true }, { ...ALL_ON, weekly: true }, []]) {
      const res = await app.api('PUT', path(clubId), { auth: lead, body });
      expect(res.status).toBe(400);
      expect(res.body.code).toBe('validation_failed');
      expect(typeof res.body.message).toBe('string');
    }
    expect((await app.api('GET', path(clubId), { auth: lead })).body.settings).toEqual({ ...ALL_ON, spotCleared: false });
  });

  it('anonymous → 401; a member of another club (even its admin) → 404, as for a club that does not exist', async () => {
    expect((await app.api('GET', path(clubId))).status).toBe(401);
    expect((await app.api('PUT', path(clubId), { body: ALL_ON })).status).toBe(401);
    expect((await app.api('GET', path(clubId), { auth: outsider })).status).toBe(404);
    expect((await app.api('PUT', path(clubId), { auth: outsider, body: ALL_ON })).status).toBe(404);
    expect((await app.api('GET', path('00000000-0000-4000-8000-000000000000'), { auth: lead })).status).toBe(404);
  });
});
