import { describe, expect, test } from 'vitest';
import type { AntennaSpot, Hazard, ReviewDecision, Station, Support } from '../schemas/records';
import { at, meta, T, testSite as site, uuid } from './test-records';
import { evaluateEventSpots, fingerprintChanges, spotFingerprint } from './index';

/*
 * The review judges an inverted-V at the leg bearing recorded on its spot, and a changed bearing sends a
 * cleared spot back to review, saying the leg direction changed.
 */

const oak: Support = {
  ...meta(2), siteId: site.id, kind: 'tree', label: 'Lane oak', ...at(0, 0), positionAccuracyM: 3, heightM: 9, attachHeightM: 9, launchMethod: 'throw-bag', maxEnds: 2, species: '', condition: '', mastModel: '', notes: '',
};
// A public path 6 m east of the oak: legs run east–west bring a leg end 1.6 m from it.
const lane: Hazard = { ...meta(50), siteId: site.id, kind: 'path', label: 'Lane', points: [at(6, -60), at(6, 60)], isArea: false, heightM: null, voltageClass: null, voltageKv: null, notes: '' };
const station: Station = { ...meta(60), eventId: uuid(61), name: 'SSB', bands: ['20m'], mode: 'ssb', powerW: 1000, purpose: 'long-distance', crewMemberIds: [], notes: '' };
const records = { site, supports: [oak], hazards: [lane], operatingPositions: [], stations: [station], coax: [] };
const spot = (legAzimuthDeg: number | null, over: Partial<AntennaSpot> = {}): AntennaSpot => ({
  ...meta(70), eventId: uuid(61), stationId: station.id, band: '20m', shape: 'inverted-v', supportIds: [oak.id], legAzimuthDeg, coaxId: null, operatingPositionId: null, state: 'waiting-review', stateReason: '', inputsFingerprint: '', measuredSwr: null, notes: '', ...over,
});
const accept = (n: number, key: string, fp: string): ReviewDecision => ({ ...meta(n), spotId: uuid(70), resultKey: key, decision: 'accept', reason: 'Checked on site', inputsFingerprint: fp, decidedAt: T, decidedBy: uuid(98) });
const one = (s: AntennaSpot, decisions: ReviewDecision[] = []) => evaluateEventSpots(records, [s], decisions).spots[0];

describe('inverted-V leg bearing in the review', () => {
  test('each spot is judged at its own recorded bearing: 90° (across the path) needs review, 0° (along it) is clear', () => {
    const across = one(spot(90));
    const along = one(spot(0));
    expect(across.evaluated!.candidate.wireAzimuthDeg).toBe(90);
    expect(along.evaluated!.candidate.wireAzimuthDeg).toBe(0);
    expect(across.results.find((r) => r.key === 'rf-exposure:public')!.level).toBe('needs-review');
    expect(along.results.find((r) => r.key === 'rf-exposure:public')!.level).toBe('clear');
  });

  test('a bearing is part of the inputs fingerprint; no bearing gives the same fingerprint as before bearings existed', () => {
    const base = { site, supportIds: [oak.id], supports: [oak], hazards: [lane] };
    expect(spotFingerprint({ ...base, legAzimuthDeg: null })).toBe(spotFingerprint(base));
    expect(spotFingerprint(base)).toMatch(/^v1\.s[0-9a-f]{8}\.h[0-9a-f]{8}\.g[0-9a-f]{8}$/);
    const at30 = spotFingerprint({ ...base, legAzimuthDeg: 30 });
    const at120 = spotFingerprint({ ...base, legAzimuthDeg: 120 });
    expect(at30).toMatch(/\.l[0-9a-f]{8}$/);
    expect(at30).not.toBe(at120);
    const legWords = ['The direction the inverted-V’s legs run changed since the review: the wire now hangs over different ground.'];
    expect(fingerprintChanges(at30, at120, ['Lane oak'])).toEqual(legWords);
    expect(fingerprintChanges(spotFingerprint(base), at30, ['Lane oak'])).toEqual(legWords);
    expect(fingerprintChanges(at30, spotFingerprint(base), ['Lane oak'])).toEqual(legWords);
    const taller = spotFingerprint({ ...base, supports: [{ ...oak, heightM: 12 }], legAzimuthDeg: 120 });
    expect(fingerprintChanges(at30, taller, ['Lane oak'])).toEqual(['Lane oak changed since the review (position, height or ends).', ...legWords]);
  });

  test('a cleared spot whose bearing changes goes back to review, says the legs moved, and the old acceptances no longer apply', () => {
    const first = one(spot(0));
    const decisions = first.results.map((r, i) => accept(80 + i, r.key, first.fingerprint));
    const cleared = one(spot(0, { state: 'cleared', inputsFingerprint: first.fingerprint }), decisions);
    expect(cleared.review.state).toBe('cleared');
    const turned = one(spot(90, { state: 'cleared', inputsFingerprint: first.fingerprint }), decisions);
    expect(turned.review.state).toBe('waiting-review');
    expect(turned.review.staleDecisionCount).toBe(decisions.length);
    expect(turned.review.reasons).toEqual(['The direction the inverted-V’s legs run changed since the review: the wire now hangs over different ground.']);
  });
});
