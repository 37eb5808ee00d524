// The server judges an inverted-V at the leg bearing stored on its antenna spot (antennaSpots.legAzimuthDeg), and a
// changed bearing after clearance re-opens the review, saying the legs moved. Against the real server and PostgreSQL.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { evaluateSpotOnServer } from '../../server/src/modules/review/review-guard';
import type { SpotEvaluation } from '../../shared/review';
import { antennaSpotFieldsSchema } from '../../shared/schemas';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';
import { device, push, type Change, type Device } from './notifications-fixtures';

const REF = { lat: 44.9312, lon: -92.8671 };
const at = (e: number, n: number) => ({ lat: REF.lat + n / 111_320, lon: REF.lon + e / (111_320 * Math.cos((REF.lat * Math.PI) / 180)) });
const LEGS_MOVED = /direction the inverted-V’s legs run changed since the review/;

let app: TestApp;
let clubId: string;
let lead: TestUser, safety: TestUser;
let leadPhone: Device, safetyPhone: Device;
const ids = { site: randomUUID(), event: randomUUID(), station: randomUUID(), oak: randomUUID(), ash: randomUUID(), lane: randomUUID(), op: randomUUID(), spot: randomUUID() };
let nowMs = Date.now();

const decide = (resultKey: string, fingerprint: string, reason = 'Looked at it on site with the lead'): Change => ({
  collection: 'reviewDecisions',
  recordId: randomUUID(),
  fields: { spotId: ids.spot, resultKey, decision: 'accept', reason, inputsFingerprint: fingerprint, decidedAt: new Date(nowMs).toISOString(), decidedBy: safety.id },
});
const evaluate = async () => (await evaluateSpotOnServer(app.deps.dataSource.manager, clubId, ids.spot)) as SpotEvaluation;
const publicRf = (e: SpotEvaluation) => e.results.find((r) => r.key === 'rf-exposure:public')!;

beforeAll(async () => {
  app = await startTestApp();
  lead = await app.signUpUser({ role: 'lead', displayName: 'Rowan Lead' });
  clubId = lead.clubId!;
  safety = await app.signUpUser({ role: 'safety', clubId });
  leadPhone = device(lead);
  safetyPhone = device(safety);
  const tree = (id: string, label: string, e: number): Change => ({
    collection: 'supports',
    recordId: id,
    fields: { siteId: ids.site, kind: 'tree', label, ...at(e, 0), positionAccuracyM: 3, heightM: 9, attachHeightM: 9, launchMethod: 'throw-bag', maxEnds: 2, species: '', condition: '', mastModel: '', notes: '' },
  });
  await push(app, clubId, leadPhone, [
    { collection: 'sites', recordId: ids.site, fields: { name: 'Leg meadow', refLat: REF.lat, refLon: REF.lon, notes: '', groundClass: 'average' } },
    { collection: 'events', recordId: ids.event, fields: { siteId: ids.site, name: 'Leg outing', startsOn: '2026-12-19', endsOn: '2026-12-20', notes: '' } },
    { collection: 'stations', recordId: ids.station, fields: { eventId: ids.event, name: 'SSB station', bands: ['20m'], mode: 'ssb', powerW: 1000, purpose: 'long-distance', notes: '' } },
    tree(ids.oak, 'Lane oak', 0),
    tree(ids.ash, 'Far ash', -25),
    // A public path 6 m east of the oak: legs laid east–west bring a leg end inside the public RF distance.
    { collection: 'hazards', recordId: ids.lane, fields: { siteId: ids.site, kind: 'path', label: 'Lane', points: [at(6, -60), at(6, 60)], isArea: false, heightM: null, voltageClass: null, voltageKv: null, notes: '' } },
    { collection: 'operatingPositions', recordId: ids.op, fields: { siteId: ids.site, label: 'Tent', ...at(0, -40), notes: '' } },
    {
      collection: 'antennaSpots',
      recordId: ids.spot,
      fields: { eventId: ids.event, stationId: ids.station, band: '20m', shape: 'inverted-v', supportIds: [ids.oak], legAzimuthDeg: 0, coaxId: null, operatingPositionId: null, state: 'waiting-review', stateReason: '', inputsFingerprint: '', measuredSwr: null, notes: '' },
    },
  ], nowMs);
});
afterAll(() => app?.close());

describe('inverted-V leg bearing on the server', () => {
  it('the server evaluates the stored bearing (0°: legs along the path, clear), the same wire the shared engine gives for that bearing', async () => {
    const e = await evaluate();
    expect(e.evaluated!.candidate.wireAzimuthDeg).toBe(0);
    expect(e.evaluated!.candidate.id).toMatch(/@0$/);
    expect(publicRf(e).level).toBe('clear');
    expect(e.fingerprint).toMatch(/\.l[0-9a-f]{8}\./);
    // What the app's "Send for review" writes: the fingerprint the lead sent it with.
    const sent = await push(app, clubId, leadPhone, [{ collection: 'antennaSpots', recordId: ids.spot, fields: { state: 'waiting-review', inputsFingerprint: e.fingerprint } }], nowMs + 1);
    expect(sent.rejected).toEqual([]);
  });

  it('accepting every result at the stored bearing clears the spot', async () => {
    const e = await evaluate();
    const answer = await push(app, clubId, safetyPhone, e.results.map((r) => decide(r.key, e.fingerprint)), nowMs);
    expect(answer.rejected).toEqual([]);
    expect((await evaluate()).review.state).toBe('cleared');
  });

  it('turning the legs to 90° (across the path) re-opens the review, says the legs moved, and refuses the old acceptance', async () => {
    const before = await evaluate();
    nowMs += 60_000;
    const moved = await push(app, clubId, leadPhone, [{ collection: 'antennaSpots', recordId: ids.spot, fields: { legAzimuthDeg: 90 } }], nowMs);
    expect(moved.rejected).toEqual([]);
    const after = await evaluate();
    expect(after.spot.legAzimuthDeg).toBe(90);
    expect(after.evaluated!.candidate.wireAzimuthDeg).toBe(90);
    expect(after.fingerprint).not.toBe(before.fingerprint);
    expect(after.review.state).toBe('waiting-review');
    expect(after.review.reasons.join(' ')).toMatch(LEGS_MOVED);
    expect(publicRf(after).level).toBe('needs-review');
    const stale = await push(app, clubId, safetyPhone, [decide('rf-exposure:public', before.fingerprint)], nowMs);
    expect(stale.rejected).toHaveLength(1);
    expect((stale.rejected[0] as unknown as { message: string }).message).toMatch(/changed since you opened it/);
  });

  it('an acceptance made against the new bearing is kept, and the spot clears again', async () => {
    const e = await evaluate();
    const answer = await push(app, clubId, safetyPhone, e.results.map((r) => decide(r.key, e.fingerprint, 'Lane roped off 3 m either side while on the air')), nowMs);
    expect(answer.rejected).toEqual([]);
    expect((await evaluate()).review.state).toBe('cleared');
  });

  it('a new flat-top carrying a leg bearing is refused and nothing is stored (the record schema: only an inverted-V has one)', async () => {
    const flat = randomUUID();
    const fields = { eventId: ids.event, stationId: ids.station, band: '20m', shape: 'flat', supportIds: [ids.oak, ids.ash], legAzimuthDeg: 45, coaxId: null, operatingPositionId: null, state: 'planned', stateReason: '', inputsFingerprint: '', measuredSwr: null, notes: '' };
    expect(antennaSpotFieldsSchema.safeParse(fields).error?.issues[0]?.message).toBe('only an inverted-V has a leg bearing');
    const answer = await push(app, clubId, leadPhone, [{ collection: 'antennaSpots', recordId: flat, fields }], nowMs);
    expect(answer.rejected).toHaveLength(1);
    // The writer is told the real reason, not that the record is gone.
    expect(answer.rejected[0]).toMatchObject({ code: 'invalid', message: 'legAzimuthDeg: only an inverted-V has a leg bearing' });
    expect(typeof (await evaluateSpotOnServer(app.deps.dataSource.manager, clubId, flat))).toBe('string');
  });

  it('an edit that puts a bearing on a stored flat-top is refused; the spot keeps its fingerprint and its wire between the two supports', async () => {
    const flat = randomUUID();
    const fields = { eventId: ids.event, stationId: ids.station, band: '20m', shape: 'flat', supportIds: [ids.oak, ids.ash], legAzimuthDeg: null, coaxId: null, operatingPositionId: null, state: 'waiting-review', stateReason: '', inputsFingerprint: '', measuredSwr: null, notes: '' };
    expect((await push(app, clubId, leadPhone, [{ collection: 'antennaSpots', recordId: flat, fields }], nowMs)).rejected).toEqual([]);
    const plain = (await evaluateSpotOnServer(app.deps.dataSource.manager, clubId, flat)) as SpotEvaluation;
    const edit = await push(app, clubId, leadPhone, [{ collection: 'antennaSpots', recordId: flat, fields: { legAzimuthDeg: 45 } }], nowMs + 5);
    expect(edit.rejected).toHaveLength(1);
    const after = (await evaluateSpotOnServer(app.deps.dataSource.manager, clubId, flat)) as SpotEvaluation;
    expect(after.spot.legAzimuthDeg).toBeNull();
    expect(after.fingerprint).toBe(plain.fingerprint);
    expect(after.evaluated!.candidate.wireAzimuthDeg).toBeCloseTo(90, 2); // ash due west of the oak
    await push(app, clubId, leadPhone, [{ collection: 'antennaSpots', recordId: flat, op: 'delete' }], nowMs + 6);
  });
});
