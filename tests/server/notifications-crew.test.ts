// "Sheet ready" follows the station's crew (stations.crewMemberIds), against the real server and PostgreSQL: a cleared
// spot of a station that names its crew mails those people only (any role), not the other crew members; a station
// naming no crew mails every crew member as before and says so in the mail; a named person who turned the kind off
// gets nothing; leads' mails are unchanged; a named non-crew member can see (and so turn off) the kind in Settings.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { MailMessage } from '../../server/src/app-deps';
import { EVENT_BUCKET_MS } from '../../server/src/modules/notifications/notification-events';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';
import { device, eventRecords, push, setState, spotCreate, type Device, type EventIds } from './notifications-fixtures';

let app: TestApp;
let clubId: string;
let lead: TestUser, lead2: TestUser, crewA: TestUser, crewB: TestUser, crewC: TestUser, safety: TestUser;
let leadPhone: Device;
let ids: EventIds;
let nowMs = Date.now();
const clock = { now: () => new Date(nowMs) };

const inbox = (u: TestUser): MailMessage[] => app.mailbox.messages.filter((m) => m.to === u.email);
const everyone = () => [lead, lead2, crewA, crewB, crewC, safety];
const counts = () => Object.fromEntries(everyone().map((u) => [u.email, inbox(u).length]));
const newMailTo = (before: Record<string, number>) => everyone().filter((u) => inbox(u).length > before[u.email]).map((u) => u.email).sort();
const emails = (...us: TestUser[]) => us.map((u) => u.email).sort();
const ALL_ON = { reviewWaiting: true, spotSentBack: true, spotCleared: true, sheetReady: true };

async function setCrew(crewMemberIds: string[]) {
  const answer = await push(app, clubId, leadPhone, [{ collection: 'stations', recordId: ids.stationId, fields: { crewMemberIds } }], nowMs);
  expect(answer.rejected).toEqual([]);
}

/** A spot of the test station taken to review and then cleared; returns its id and who got mail at the clearance. */
async function clearOneSpot() {
  const spot = spotCreate(ids, '40m', 'waiting-review');
  await push(app, clubId, leadPhone, [spot], nowMs);
  const before = counts();
  await push(app, clubId, leadPhone, [setState(spot.recordId, 'cleared')], nowMs + 1000);
  return { spotId: spot.recordId, before, to: newMailTo(before) };
}

beforeAll(async () => {
  app = await startTestApp({ clock });
  lead = await app.signUpUser({ role: 'lead', displayName: 'Rowan Lead' });
  clubId = lead.clubId!;
  lead2 = await app.signUpUser({ role: 'lead', clubId, displayName: 'Ellis Lead' });
  crewA = await app.signUpUser({ role: 'crew', clubId, displayName: 'Alex Crew' });
  crewB = await app.signUpUser({ role: 'crew', clubId, displayName: 'Bea Crew' });
  crewC = await app.signUpUser({ role: 'crew', clubId, displayName: 'Cy Crew' });
  safety = await app.signUpUser({ role: 'safety', clubId });
  leadPhone = device(lead);
  const event = eventRecords('Crew mail outing');
  ids = event.ids;
  await push(app, clubId, leadPhone, event.changes, nowMs);
});
afterAll(() => app?.close());
beforeEach(() => {
  nowMs = (Math.floor(nowMs / EVENT_BUCKET_MS) + 6) * EVENT_BUCKET_MS + 1000;
});

describe('"sheet ready" goes to the station’s crew', () => {
  it('a station naming crew A: A gets the sheet link, crew B and C do not; both leads still hear "cleared"', async () => {
    await setCrew([crewA.id]);
    const { spotId, to } = await clearOneSpot();
    expect(to).toEqual(emails(lead, lead2, crewA));
    const mail = inbox(crewA).at(-1)!;
    expect(mail.subject).toBe('Your antenna sheet is ready · Crew mail outing');
    expect(mail.text).toContain(`/events/${ids.eventId}/sheets/${spotId}`);
    expect(mail.text).not.toContain('No crew is named');
    expect(mail.text).toContain('Treat every power line as energised'); // the cautions ride along (shared/clearance/cautions.ts)
    expect(inbox(lead).at(-1)!.subject).toBe('An antenna spot is cleared to raise · Crew mail outing');
  });

  it('a station naming no crew: every crew member gets it, and the mail says no crew is named for the station', async () => {
    await setCrew([]);
    const { to } = await clearOneSpot();
    expect(to).toEqual(emails(lead, lead2, crewA, crewB, crewC));
    for (const c of [crewA, crewB, crewC]) expect(inbox(c).at(-1)!.text).toContain('No crew is named for this station, so every crew member gets this.');
    expect(inbox(lead).at(-1)!.text).not.toContain('No crew is named');
  });

  it('a named crew member who turned "sheet ready" off gets nothing; the other named one still does; nobody else is mailed instead', async () => {
    await setCrew([crewA.id, crewB.id]);
    expect((await app.api('PUT', `/api/clubs/${clubId}/notification-settings`, { auth: crewA, body: { ...ALL_ON, sheetReady: false } })).status).toBe(200);
    try {
      const first = await clearOneSpot();
      expect(first.to).toEqual(emails(lead, lead2, crewB));
      // Every named person turned it off: still no fallback to the other crew (they chose; the station has its crew).
      expect((await app.api('PUT', `/api/clubs/${clubId}/notification-settings`, { auth: crewB, body: { ...ALL_ON, sheetReady: false } })).status).toBe(200);
      nowMs += EVENT_BUCKET_MS;
      const second = await clearOneSpot();
      expect(second.to).toEqual(emails(lead, lead2));
    } finally {
      await app.api('PUT', `/api/clubs/${clubId}/notification-settings`, { auth: crewA, body: ALL_ON });
      await app.api('PUT', `/api/clubs/${clubId}/notification-settings`, { auth: crewB, body: ALL_ON });
    }
  });

  it('a lead named as crew gets one e-mail with both the clearance and the sheet; the settings list "sheet ready" for them', async () => {
    const before = await app.api('GET', `/api/clubs/${clubId}/notification-settings`, { auth: lead2 });
    expect(before.body.forRole).toEqual(['spotSentBack', 'spotCleared']);
    await setCrew([lead2.id]);
    const after = await app.api('GET', `/api/clubs/${clubId}/notification-settings`, { auth: lead2 });
    expect(after.body.forRole).toEqual(['spotSentBack', 'spotCleared', 'sheetReady']);
    const { spotId, before: was, to } = await clearOneSpot();
    expect(to).toEqual(emails(lead, lead2));
    expect(inbox(lead2).length - was[lead2.email]).toBe(1);
    const mail = inbox(lead2).at(-1)!;
    expect(mail.subject).toBe('Safety review news on an antenna spot · Crew mail outing');
    expect(mail.text).toContain(`/events/${ids.eventId}/sheets/${spotId}`);
  });

  it('a station whose named crew have all left the club falls back to every crew member (nobody would hear otherwise)', async () => {
    const leaver = await app.signUpUser({ role: 'crew', clubId });
    await setCrew([leaver.id]);
    const admin = await app.signUpUser({ role: 'admin', clubId });
    expect((await app.api('DELETE', `/api/clubs/${clubId}/members/${leaver.id}`, { auth: admin })).status).toBe(204);
    const { to } = await clearOneSpot();
    expect(to).toEqual(emails(lead, lead2, crewA, crewB, crewC));
    expect(inbox(leaver).filter((m) => m.subject.includes('Crew mail outing'))).toEqual([]);
    expect(inbox(crewC).at(-1)!.text).toContain('No crew is named for this station');
  });

  it('two stations in one push: each spot’s sheet goes to its own station’s crew', async () => {
    await setCrew([crewA.id]);
    const other = randomUUID();
    await push(app, clubId, leadPhone, [{ collection: 'stations', recordId: other, fields: { eventId: ids.eventId, name: 'Second station', bands: ['20m'], mode: 'cw', powerW: 100, purpose: 'long-distance', crewMemberIds: [crewB.id], notes: '' } }], nowMs);
    const mine = spotCreate(ids, '40m', 'waiting-review');
    const theirs = { ...spotCreate(ids, '20m', 'waiting-review'), recordId: randomUUID() };
    theirs.fields = { ...theirs.fields, stationId: other };
    await push(app, clubId, leadPhone, [mine, theirs], nowMs);
    const before = counts();
    await push(app, clubId, leadPhone, [setState(mine.recordId, 'cleared'), setState(theirs.recordId, 'cleared')], nowMs + 1000);
    expect(newMailTo(before)).toEqual(emails(lead, lead2, crewA, crewB));
    expect(inbox(crewA).at(-1)!.text).toContain(`/sheets/${mine.recordId}`);
    expect(inbox(crewA).at(-1)!.text).not.toContain(`/sheets/${theirs.recordId}`);
    expect(inbox(crewB).at(-1)!.text).toContain(`/sheets/${theirs.recordId}`);
    expect(inbox(crewB).at(-1)!.text).not.toContain(`/sheets/${mine.recordId}`);
  });
});
