// The server's check of a station's crew (stations.crewMemberIds) on sync pushes, against the real server and
// PostgreSQL: members of the club (any role) may be named; a person of another club, an unknown id or one who left
// makes the change a rejected mutation with a plain message, listed among the pusher's refused changes, and the
// station keeps the crew it had. Common practice of this project: refusals are rejected mutations, never lost silently.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../server/src/dev/seed-demo';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';
import { device, eventRecords, push, type Device, type EventIds } from './notifications-fixtures';

let app: TestApp;
let clubId: string;
let lead: TestUser, crew: TestUser, crew2: TestUser, safety: TestUser, outsider: TestUser;
let leadPhone: Device;
let ids: EventIds;
const nowMs = Date.now();

const crewOf = async (stationId: string): Promise<string[]> => {
  const [row]: { crew: string[] }[] = await app.deps.dataSource.query('SELECT crew_member_ids AS crew FROM stations WHERE id = $1', [stationId]);
  return row.crew;
};
const setCrew = (stationId: string, crewMemberIds: string[]) => ({ collection: 'stations', recordId: stationId, fields: { crewMemberIds } });

beforeAll(async () => {
  app = await startTestApp();
  lead = await app.signUpUser({ role: 'lead' });
  clubId = lead.clubId!;
  crew = await app.signUpUser({ role: 'crew', clubId });
  crew2 = await app.signUpUser({ role: 'crew', clubId });
  safety = await app.signUpUser({ role: 'safety', clubId });
  outsider = await app.signUpUser({ role: 'crew' }); // a crew member of another club
  leadPhone = device(lead);
  const event = eventRecords('Crew check outing');
  ids = event.ids;
  const answer = await push(app, clubId, leadPhone, event.changes, nowMs);
  expect(answer.rejected).toEqual([]);
});
afterAll(() => app?.close());

describe('a station’s crew must be members of its club', () => {
  it('an edit naming club members of any role (crew, and a lead who raises antennas too) is stored', async () => {
    const answer = await push(app, clubId, leadPhone, [setCrew(ids.stationId, [crew.id, lead.id])], nowMs + 1000);
    expect(answer.rejected).toEqual([]);
    expect(await crewOf(ids.stationId)).toEqual([crew.id, lead.id]);
  });

  it('an edit naming a member of another club is refused with a plain message and listed; the crew stays as it was', async () => {
    const answer = await push(app, clubId, leadPhone, [setCrew(ids.stationId, [crew.id, outsider.id])], nowMs + 2000);
    expect(answer.rejected).toHaveLength(1);
    const refusal = answer.rejected[0] as unknown as { code: string; recordId: string; message: string };
    expect(refusal).toMatchObject({ code: 'invalid', recordId: ids.stationId });
    expect(refusal.message).toBe("the station's crew names a person who is not a member of this club (they may have left it): pick the crew again from the club's members");
    expect(await crewOf(ids.stationId)).toEqual([crew.id, lead.id]);
    const listed = await app.api('GET', `/api/clubs/${clubId}/sync/rejected`, { auth: lead });
    expect(listed.status).toBe(200);
    expect(JSON.stringify(listed.body)).toContain(outsider.id);
  });

  it('a new station naming an unknown id is refused (not stored at all); one naming members is stored', async () => {
    const bad = randomUUID();
    const good = randomUUID();
    const fields = (crewMemberIds: string[]) => ({ eventId: ids.eventId, name: 'Digital station', bands: ['20m'], mode: 'digital', powerW: 50, purpose: 'regional', crewMemberIds, notes: '' });
    const answer = await push(app, clubId, leadPhone, [
      { collection: 'stations', recordId: bad, fields: fields([crew2.id, randomUUID(), randomUUID()]) },
      { collection: 'stations', recordId: good, fields: fields([crew2.id, safety.id]) },
    ], nowMs + 3000);
    expect(answer.rejected.map((r) => r.recordId)).toEqual([bad]);
    expect((answer.rejected[0] as unknown as { message: string }).message).toMatch(/names 2 people who are not members of this club/);
    expect((await app.deps.dataSource.query('SELECT id FROM stations WHERE id = $1', [bad])).length).toBe(0);
    expect(await crewOf(good)).toEqual([crew2.id, safety.id]);
  });

  it('a member who has left cannot be named again; other edits of a station that still names them are kept', async () => {
    const station = randomUUID();
    await push(app, clubId, leadPhone, [{ collection: 'stations', recordId: station, fields: { eventId: ids.eventId, name: 'Leaving crew station', bands: ['40m'], mode: 'ssb', powerW: 100, purpose: 'regional', crewMemberIds: [crew2.id], notes: '' } }], nowMs + 4000);
    expect((await app.api('DELETE', `/api/clubs/${clubId}/members/${crew2.id}`, { auth: await app.signUpUser({ role: 'admin', clubId }) })).status).toBe(204);
    const rename = await push(app, clubId, leadPhone, [{ collection: 'stations', recordId: station, fields: { name: 'Renamed station' } }], nowMs + 5000);
    expect(rename.rejected).toEqual([]);
    const again = await push(app, clubId, leadPhone, [setCrew(station, [crew2.id])], nowMs + 6000);
    expect(again.rejected.map((r) => r.code)).toEqual(['invalid']);
  });

  it('a crew list left empty is always accepted (the station then readies every crew member’s sheet)', async () => {
    const answer = await push(app, clubId, leadPhone, [setCrew(ids.stationId, [])], nowMs + 7000);
    expect(answer.rejected).toEqual([]);
    expect(await crewOf(ids.stationId)).toEqual([]);
  });
});

describe('the demo names a crew on one station and none on the other (both sheet-mail paths show)', () => {
  it('Station 2 (high bands) names crew@kestrel.test; Station 1 (low bands) names no one', async () => {
    const t = await startTestApp();
    try {
      const { eventId } = await seedDemo(t.deps);
      const rows: { name: string; crew: string[] }[] = await t.deps.dataSource.query('SELECT name, crew_member_ids AS crew FROM stations WHERE event_id = $1 ORDER BY name', [eventId]);
      const [crewUser]: { id: string }[] = await t.deps.dataSource.query("SELECT id FROM users WHERE email = 'crew@kestrel.test'");
      expect(rows).toEqual([
        { name: 'Station 1 (low bands)', crew: [] },
        { name: 'Station 2 (high bands)', crew: [crewUser.id] },
      ]);
    } finally {
      await t.close();
    }
  });
});

describe('a demo seeded before stations had crews gains the demo crew once', () => {
  it('Station 2 with no crew and no clock for the field gets crew@kestrel.test; a crew someone set (even none) is kept', async () => {
    const t = await startTestApp();
    try {
      const { eventId } = await seedDemo(t.deps);
      const s2 = "SELECT id FROM stations WHERE event_id = $1 AND name = 'Station 2 (high bands)'";
      const [{ id }]: { id: string }[] = await t.deps.dataSource.query(s2, [eventId]);
      // As a demo seeded before migration 1796190000000 looks: empty crew, no clock for the field.
      await t.deps.dataSource.query("UPDATE stations SET crew_member_ids = '[]'::jsonb, field_clocks = field_clocks - 'crewMemberIds' WHERE id = $1", [id]);
      const [{ seq: before }]: { seq: string }[] = await t.deps.dataSource.query('SELECT change_seq AS seq FROM stations WHERE id = $1', [id]);
      expect((await seedDemo(t.deps)).created).toBe(true);
      const [after]: { crew: string[]; seq: string; clocks: Record<string, string> }[] = await t.deps.dataSource.query('SELECT crew_member_ids AS crew, change_seq AS seq, field_clocks AS clocks FROM stations WHERE id = $1', [id]);
      const [crewUser]: { id: string }[] = await t.deps.dataSource.query("SELECT id FROM users WHERE email = 'crew@kestrel.test'");
      expect(after.crew).toEqual([crewUser.id]);
      expect(BigInt(after.seq)).toBeGreaterThan(BigInt(before)); // devices pull the change
      expect(after.clocks.crewMemberIds).toBeTruthy();
      // The lead later clears the crew on purpose (a clock for the field): reseeding leaves it cleared.
      await t.deps.dataSource.query("UPDATE stations SET crew_member_ids = '[]'::jsonb WHERE id = $1", [id]);
      expect((await seedDemo(t.deps)).created).toBe(false);
      const [kept]: { crew: string[] }[] = await t.deps.dataSource.query('SELECT crew_member_ids AS crew FROM stations WHERE id = $1', [id]);
      expect(kept.crew).toEqual([]);
    } finally {
      await t.close();
    }
  });
});
