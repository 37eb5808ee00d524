// The server's own check of review decisions arriving by sync (issue 7): a blocked clearance result can be accepted
// by no one, an acceptance made against changed inputs is refused, and accepting the last open result of a spot
// clears it, which tells the lead and readies the crew's sheet. Against the real server and PostgreSQL.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evaluateSpotOnServer } from '../../server/src/modules/review/review-guard';
import type { SpotEvaluation } from '../../shared/review';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';
import { device, push, type Change, type Device } from './notifications-fixtures';

const REF = { lat: 44.9312, lon: -92.8671 };
const at = (e: number, n: number) => ({ lat: REF.lat + n / 111_320, lon: REF.lon + e / (111_320 * Math.cos((REF.lat * Math.PI) / 180)) });

let app: TestApp;
let clubId: string;
let lead: TestUser, safety: TestUser, crew: TestUser;
let leadPhone: Device, safetyPhone: Device;
const ids = { site: randomUUID(), event: randomUUID(), station: randomUUID(), nearTree: randomUUID(), farTree: randomUUID(), line: randomUUID(), op: randomUUID(), blockedSpot: randomUUID(), clearSpot: randomUUID() };
const nowMs = Date.now();

const tree = (id: string, label: string, e: number, n: number): Change => ({
  collection: 'supports',
  recordId: id,
  fields: { siteId: ids.site, kind: 'tree', label, ...at(e, n), positionAccuracyM: 3, heightM: 18, attachHeightM: 14, launchMethod: 'throw-bag', maxEnds: 2, species: '', condition: '', mastModel: '', notes: '' },
});
const spot = (id: string, supportId: string): Change => ({
  collection: 'antennaSpots',
  recordId: id,
  fields: { eventId: ids.event, stationId: ids.station, band: '20m', shape: 'inverted-v', supportIds: [supportId], coaxId: null, operatingPositionId: null, state: 'waiting-review', stateReason: '', inputsFingerprint: '', measuredSwr: null, notes: '' },
});
const decide = (spotId: string, resultKey: string, decision: 'accept' | 'send-back', fingerprint: string, by = safety): Change => ({
  collection: 'reviewDecisions',
  recordId: randomUUID(),
  fields: { spotId, resultKey, decision, reason: 'Looked at it on site with the lead', inputsFingerprint: fingerprint, decidedAt: new Date(nowMs).toISOString(), decidedBy: by.id },
});
const evaluate = async (spotId: string) => (await evaluateSpotOnServer(app.deps.dataSource.manager, clubId, spotId)) as SpotEvaluation;

beforeAll(async () => {
  app = await startTestApp();
  lead = await app.signUpUser({ role: 'lead', displayName: 'Rowan Lead' });
  clubId = lead.clubId!;
  safety = await app.signUpUser({ role: 'safety', clubId });
  crew = await app.signUpUser({ role: 'crew', clubId });
  leadPhone = device(lead);
  safetyPhone = device(safety);
  await push(app, clubId, leadPhone, [
    { collection: 'sites', recordId: ids.site, fields: { name: 'Test meadow', refLat: REF.lat, refLon: REF.lon, notes: '', groundClass: 'average' } },
    { collection: 'events', recordId: ids.event, fields: { siteId: ids.site, name: 'Guard outing', startsOn: '2026-12-19', endsOn: '2026-12-20', notes: '' } },
    { collection: 'stations', recordId: ids.station, fields: { eventId: ids.event, name: 'CW station', bands: ['20m'], mode: 'cw', powerW: 100, purpose: 'long-distance', notes: '' } },
    tree(ids.nearTree, 'Roadside elm', 0, 0),
    tree(ids.farTree, 'Meadow oak', -150, 0),
    {
      collection: 'hazards',
      recordId: ids.line,
      // A distribution line 6 m east of the elm: an 18 m tree falling reaches far past it.
      fields: { siteId: ids.site, kind: 'power-line', label: 'Road line', points: [at(6, -80), at(6, 80)], isArea: false, heightM: 9, voltageClass: 'distribution', voltageKv: 12.47, notes: '' },
    },
    { collection: 'operatingPositions', recordId: ids.op, fields: { siteId: ids.site, label: 'Tent', ...at(-100, -20), notes: '' } },
    spot(ids.blockedSpot, ids.nearTree),
    spot(ids.clearSpot, ids.farTree),
  ], nowMs);
});
afterAll(() => app?.close());

describe('review decisions checked on the server', () => {
  it('an acceptance of a blocked result is refused and stored as a rejected mutation; sending it back is kept', async () => {
    const e = await evaluate(ids.blockedSpot);
    const blocked = e.results.find((r) => r.level === 'blocked');
    expect(blocked, 'the elm 6 m from the line must be blocked by the fall rule').toBeDefined();
    const accept = decide(ids.blockedSpot, blocked!.key, 'accept', e.fingerprint);
    const answer = await push(app, clubId, safetyPhone, [accept, decide(ids.blockedSpot, blocked!.key, 'send-back', e.fingerprint)], nowMs);
    expect(answer.rejected).toHaveLength(1);
    expect(answer.rejected[0]).toMatchObject({ code: 'invalid', recordId: accept.recordId });
    expect((answer.rejected[0] as unknown as { message: string }).message).toMatch(/blocked result cannot be accepted/);
    const listed = await app.api('GET', `/api/clubs/${clubId}/sync/rejected`, { auth: safety });
    expect(JSON.stringify(listed.body)).toContain(accept.recordId);
    expect((await evaluate(ids.blockedSpot)).review.state).toBe('sent-back');
  });

  it('an acceptance made against inputs that changed since (a stale fingerprint) is refused; one in another person’s name too', async () => {
    const e = await evaluate(ids.clearSpot);
    const first = e.results[0];
    const stale = await push(app, clubId, safetyPhone, [decide(ids.clearSpot, first.key, 'accept', 'v1.s00000000.h00000000.g00000000')], nowMs);
    expect((stale.rejected[0] as unknown as { message: string }).message).toMatch(/changed since you opened it/);
    const forged = await push(app, clubId, safetyPhone, [{ ...decide(ids.clearSpot, first.key, 'accept', e.fingerprint), fields: { ...decide(ids.clearSpot, first.key, 'accept', e.fingerprint).fields, decidedBy: crew.id } }], nowMs);
    expect((forged.rejected[0] as unknown as { message: string }).message).toMatch(/in the name of the person who sends it/);
  });

  it('accepting every result of a spot clears it: the lead and the crew are told by e-mail (derived on the server)', async () => {
    const e = await evaluate(ids.clearSpot);
    expect(e.results.every((r) => r.level !== 'blocked')).toBe(true);
    const before = app.mailbox.messages.length;
    const answer = await push(app, clubId, safetyPhone, e.results.map((r) => decide(ids.clearSpot, r.key, 'accept', e.fingerprint)), nowMs);
    expect(answer.rejected).toEqual([]);
    expect((await evaluate(ids.clearSpot)).review.state).toBe('cleared');
    const fresh = app.mailbox.messages.slice(before);
    expect(fresh.map((m) => m.to).sort()).toEqual([crew.email, lead.email].sort());
    expect(fresh.find((m) => m.to === lead.email)!.subject).toMatch(/cleared to raise/);
  });
});
