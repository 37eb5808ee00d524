// Review e-mails triggered by applied sync pushes, against the real server and PostgreSQL: each event reaches the
// roles the brief names (safety officer: spots waiting for review; lead: sent back or cleared; crew: sheet ready)
// and no one else, not other clubs; several spots in one push make one e-mail per person; a re-pushed or
// duplicated change mails nothing more; a person who turned a kind off gets none of it.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type { MailMessage } from '../../server/src/app-deps';
import { EVENT_BUCKET_MS } from '../../server/src/modules/notifications/notification-events';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';
import { decision, device, eventRecords, push, repush, setState, spotCreate, type Device, type EventIds } from './notifications-fixtures';

let app: TestApp;
let clubId: string;
let lead: TestUser, safety: TestUser, safety2: TestUser, crew: TestUser, crew2: TestUser, scout: TestUser, admin: TestUser;
let otherClubSafety: TestUser, otherClubLead: TestUser;
let leadPhone: Device, safetyPhone: Device;
let ids: EventIds;
let nowMs = Date.now();
const clock = { now: () => new Date(nowMs) };
/** The harness points APP_URL at the test server itself. */
let APP_URL: string;

const inbox = (u: TestUser): MailMessage[] => app.mailbox.messages.filter((m) => m.to === u.email);
const everyone = () => [lead, safety, safety2, crew, crew2, scout, admin, otherClubSafety, otherClubLead];
const countsByPerson = () => Object.fromEntries(everyone().map((u) => [u.email, inbox(u).length]));
/** Who received mail since `before` (a snapshot from countsByPerson). */
const newMailTo = (before: Record<string, number>) => everyone().filter((u) => inbox(u).length > before[u.email]);

beforeAll(async () => {
  app = await startTestApp({ clock });
  APP_URL = app.deps.config.appUrl;
  lead = await app.signUpUser({ role: 'lead', displayName: 'Rowan Lead' });
  clubId = lead.clubId!;
  safety = await app.signUpUser({ role: 'safety', clubId, displayName: 'Sam Safety' });
  safety2 = await app.signUpUser({ role: 'safety', clubId });
  crew = await app.signUpUser({ role: 'crew', clubId, displayName: 'Casey Crew' });
  crew2 = await app.signUpUser({ role: 'crew', clubId });
  scout = await app.signUpUser({ role: 'scout', clubId });
  admin = await app.signUpUser({ role: 'admin', clubId });
  otherClubLead = await app.signUpUser({ role: 'lead' });
  otherClubSafety = await app.signUpUser({ role: 'safety', clubId: otherClubLead.clubId });
  leadPhone = device(lead);
  safetyPhone = device(safety);
  const event = eventRecords('Autumn outing');
  ids = event.ids;
  await push(app, clubId, leadPhone, event.changes, nowMs);
});
afterAll(() => app?.close());
// Each test starts a second into a new once-only time bucket, an hour on, so the tests do not share keys.
beforeEach(() => {
  nowMs = (Math.floor(nowMs / EVENT_BUCKET_MS) + 6) * EVENT_BUCKET_MS + 1000;
});

async function plannedSpots(n: number) {
  const spots = Array.from({ length: n }, (_, i) => spotCreate(ids, i % 2 ? '20m' : '40m'));
  await push(app, clubId, leadPhone, spots, nowMs);
  return spots.map((s) => s.recordId);
}

describe('notifications on applied sync pushes', () => {
  it('spots sent to review in one push: each safety officer gets one e-mail listing both, with the review link; nobody else hears', async () => {
    const [a, b] = await plannedSpots(2);
    const before = countsByPerson();
    expect(newMailTo(before)).toEqual([]); // planned spots announce nothing
    const answer = await push(app, clubId, leadPhone, [setState(a, 'waiting-review'), setState(b, 'waiting-review')], nowMs);
    expect(answer.rejected).toEqual([]);
    expect(newMailTo(before).map((u) => u.email).sort()).toEqual([safety.email, safety2.email].sort());
    const mail = inbox(safety).at(-1)!;
    expect(inbox(safety).length - before[safety.email]).toBe(1);
    expect(mail.subject).toBe('2 antenna spots are waiting for your review · Autumn outing');
    expect(mail.text).toContain('Hello Sam Safety,');
    expect(mail.text).toContain('40m flat-top dipole for Phone station (Autumn outing)');
    expect(mail.text).toContain('20m flat-top dipole for Phone station (Autumn outing)');
    expect(mail.text).toContain(`${APP_URL}/events/${ids.eventId}/review`);
    expect(mail.html).toContain(`href="${APP_URL}/events/${ids.eventId}/review"`);
    expect(mail.text).toContain('Settings → Notifications');
  });

  it('a spot created straight into review is announced too', async () => {
    const before = countsByPerson();
    await push(app, clubId, leadPhone, [spotCreate(ids, '40m', 'waiting-review')], nowMs);
    expect(newMailTo(before).map((u) => u.email).sort()).toEqual([safety.email, safety2.email].sort());
    expect(inbox(safety).at(-1)!.subject).toBe('An antenna spot is waiting for your review · Autumn outing');
  });

  it('a re-pushed batch, a duplicated delivery and the same state written again by another device mail nothing more', async () => {
    const [a] = await plannedSpots(1);
    await push(app, clubId, leadPhone, [setState(a, 'waiting-review')], nowMs);
    const before = countsByPerson();
    await repush(app, clubId, leadPhone, leadPhone.sent.at(-1)!); // the answer was lost; the phone sends it again
    await Promise.all([repush(app, clubId, leadPhone, leadPhone.sent.at(-1)!), repush(app, clubId, leadPhone, leadPhone.sent.at(-1)!)]);
    await push(app, clubId, device(lead), [setState(a, 'waiting-review')], nowMs); // a second phone, same state
    expect(newMailTo(before)).toEqual([]);
  });

  it('a spot bounced out of review and back within the same ten minutes mails once; entering review again later mails again', async () => {
    const [a] = await plannedSpots(1);
    const before = countsByPerson();
    await push(app, clubId, leadPhone, [setState(a, 'waiting-review')], nowMs);
    await push(app, clubId, leadPhone, [setState(a, 'planned')], nowMs + 1000);
    await push(app, clubId, leadPhone, [setState(a, 'waiting-review')], nowMs + 2000);
    expect(inbox(safety).length - before[safety.email]).toBe(1);
    nowMs += EVENT_BUCKET_MS;
    await push(app, clubId, leadPhone, [setState(a, 'planned')], nowMs);
    await push(app, clubId, leadPhone, [setState(a, 'waiting-review')], nowMs + 1000);
    expect(inbox(safety).length - before[safety.email]).toBe(2);
  });

  it('a send-back decision tells the leads, with the plan link; the lead phone writing "sent-back" afterwards does not mail again', async () => {
    const [a] = await plannedSpots(1);
    await push(app, clubId, leadPhone, [setState(a, 'waiting-review')], nowMs);
    const before = countsByPerson();
    const answer = await push(app, clubId, safetyPhone, [decision(a, safety, 'send-back', nowMs)], nowMs);
    expect(answer.rejected).toEqual([]);
    expect(newMailTo(before)).toEqual([lead]);
    const mail = inbox(lead).at(-1)!;
    expect(mail.subject).toBe('An antenna spot was sent back · Autumn outing');
    expect(mail.text).toContain(`${APP_URL}/events/${ids.eventId}/plan`);
    expect(mail.text).not.toContain('/review');
    await push(app, clubId, leadPhone, [setState(a, 'sent-back')], nowMs + 5000);
    expect(newMailTo(before)).toEqual([lead]);
    expect(inbox(lead).length - before[lead.email]).toBe(1);
  });

  it('an accept the server refuses (the result is not on the spot: its supports were never recorded) announces nothing', async () => {
    const [a] = await plannedSpots(1);
    await push(app, clubId, leadPhone, [setState(a, 'waiting-review')], nowMs);
    const before = countsByPerson();
    const answer = await push(app, clubId, safetyPhone, [decision(a, safety, 'accept', nowMs)], nowMs);
    expect(answer.rejected.map((r) => r.code)).toEqual(['invalid']);
    expect(newMailTo(before)).toEqual([]);
  });

  it('a cleared spot tells the lead and gives each crew member the sheet link; the safety officers hear nothing of it', async () => {
    const [a, b] = await plannedSpots(2);
    await push(app, clubId, leadPhone, [setState(a, 'waiting-review'), setState(b, 'waiting-review')], nowMs);
    const before = countsByPerson();
    await push(app, clubId, leadPhone, [setState(a, 'cleared'), setState(b, 'cleared')], nowMs);
    expect(newMailTo(before).map((u) => u.email).sort()).toEqual([lead.email, crew.email, crew2.email].sort());
    const leadMail = inbox(lead).at(-1)!;
    expect(leadMail.subject).toBe('2 antenna spots are cleared to raise · Autumn outing');
    expect(leadMail.text).toContain(`${APP_URL}/events/${ids.eventId}/plan`);
    const crewMail = inbox(crew).at(-1)!;
    expect(inbox(crew).length - before[crew.email]).toBe(1);
    expect(crewMail.subject).toBe('2 antenna sheets are ready · Autumn outing');
    expect(crewMail.text).toContain('Hello Casey Crew,');
    expect(crewMail.text).toContain(`${APP_URL}/events/${ids.eventId}/sheets/${a}`);
    expect(crewMail.text).toContain(`${APP_URL}/events/${ids.eventId}/sheets/${b}`);
    // The cautions ride along with every "cleared" (shared/clearance/cautions.ts); nothing is called safe.
    expect(crewMail.text).toContain('Treat every power line as energised');
    expect(crewMail.text.toLowerCase()).not.toContain(' safe ');
  });

  it('a lead hearing of a send-back and a clearance in the same push gets one e-mail with both', async () => {
    const [a, b] = await plannedSpots(2);
    await push(app, clubId, leadPhone, [setState(a, 'waiting-review'), setState(b, 'waiting-review')], nowMs);
    const before = countsByPerson();
    await push(app, clubId, leadPhone, [setState(a, 'cleared'), setState(b, 'sent-back')], nowMs);
    expect(inbox(lead).length - before[lead.email]).toBe(1);
    const mail = inbox(lead).at(-1)!;
    expect(mail.subject).toBe('Safety review news on 2 antenna spots · Autumn outing');
    expect(mail.text).toContain('The safety review sent an antenna spot back:');
    expect(mail.text).toContain('An antenna spot has passed the safety review and is cleared to raise:');
  });

  it('a refused change (a scout may not set a spot’s state) and a deleted spot announce nothing', async () => {
    const [a, b] = await plannedSpots(2);
    const before = countsByPerson();
    const answer = await push(app, clubId, device(scout), [setState(a, 'waiting-review')], nowMs);
    expect(answer.rejected.map((r) => r.code)).toEqual(['forbidden']);
    await push(app, clubId, leadPhone, [setState(b, 'waiting-review'), { collection: 'antennaSpots', recordId: b, op: 'delete' }], nowMs);
    expect(newMailTo(before)).toEqual([]);
  });

  it('a person who turned a kind off gets none of it; the others still do', async () => {
    const off = { reviewWaiting: false, spotSentBack: true, spotCleared: true, sheetReady: false };
    expect((await app.api('PUT', `/api/clubs/${clubId}/notification-settings`, { auth: safety2, body: off })).status).toBe(200);
    expect((await app.api('PUT', `/api/clubs/${clubId}/notification-settings`, { auth: crew2, body: off })).status).toBe(200);
    const [a] = await plannedSpots(1);
    const before = countsByPerson();
    await push(app, clubId, leadPhone, [setState(a, 'waiting-review')], nowMs);
    await push(app, clubId, leadPhone, [setState(a, 'cleared')], nowMs);
    expect(newMailTo(before).map((u) => u.email).sort()).toEqual([safety.email, lead.email, crew.email].sort());
    const on = { reviewWaiting: true, spotSentBack: true, spotCleared: true, sheetReady: true };
    await app.api('PUT', `/api/clubs/${clubId}/notification-settings`, { auth: safety2, body: on });
    await app.api('PUT', `/api/clubs/${clubId}/notification-settings`, { auth: crew2, body: on });
  });
});
