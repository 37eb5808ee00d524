import { describe, expect, test } from 'vitest';
import type { AntennaSpot, Hazard, ReviewDecision, Station, Support } from '../schemas/records';
import { at, meta, T, testSite as site, uuid } from './test-records';
import { evaluateEventSpots, spotSeparations } from './index';

const tree = (n: number, e: number, north: number, over: Partial<Support> = {}): Support => ({
  ...meta(n), siteId: site.id, kind: 'tree', label: `Tree ${n}`, ...at(e, north), positionAccuracyM: 3, heightM: 18, attachHeightM: 14, launchMethod: 'throw-bag', maxEnds: 2, species: '', condition: '', mastModel: '', notes: '', ...over,
});
const line: Hazard = { ...meta(50), siteId: site.id, kind: 'power-line', label: 'Road line', points: [at(6, -80), at(6, 80)], isArea: false, heightM: 9, voltageClass: 'distribution', voltageKv: 12.47, notes: '' };
const station: Station = { ...meta(60), eventId: uuid(61), name: 'CW', bands: ['20m', '15m'], mode: 'cw', powerW: 100, purpose: 'long-distance', crewMemberIds: [], notes: '' };
const spot = (n: number, supportId: string, band: '20m' | '15m' = '20m', state: AntennaSpot['state'] = 'waiting-review'): AntennaSpot => ({
  ...meta(n), eventId: uuid(61), stationId: station.id, band, shape: 'inverted-v', supportIds: [supportId], legAzimuthDeg: null, coaxId: null, operatingPositionId: null, state, stateReason: '', inputsFingerprint: '', measuredSwr: null, notes: '',
});
const records = (supports: Support[]) => ({ site, supports, hazards: [line], operatingPositions: [], stations: [station], coax: [] });
const accept = (n: number, spotId: string, key: string, fp: string): ReviewDecision => ({ ...meta(n), spotId, resultKey: key, decision: 'accept', reason: 'Checked on site', inputsFingerprint: fp, decidedAt: T, decidedBy: uuid(98) });

describe('event spots → review (one function for app and server)', () => {
  test('an 18 m tree 6 m from a distribution line is blocked (its fall reaches the line: the T0B06 rule, NCVEC question pool 2022–2026, and OSHA 29 CFR 1926.1408 Table A, as shared/clearance applies them) and cannot be cleared', () => {
    const { spots } = evaluateEventSpots(records([tree(2, 0, 0)]), [spot(70, uuid(2))], []);
    expect(spots[0].evaluated!.candidate.level).toBe('blocked');
    expect(spots[0].review.state).toBe('sent-back');
    expect(spots[0].review.blockedCount).toBeGreaterThan(0);
  });

  test('accepting every result clears a spot; raising the tree’s height afterwards sends it back to review and names the tree', () => {
    const far = tree(3, -150, 0);
    const first = evaluateEventSpots(records([far]), [spot(71, far.id)], []).spots[0];
    expect(first.results.length).toBeGreaterThan(0);
    const decisions = first.results.map((r, i) => accept(80 + i, first.spot.id, r.key, first.fingerprint));
    const cleared = evaluateEventSpots(records([far]), [{ ...first.spot, state: 'cleared' }], decisions).spots[0];
    expect(cleared.review.state).toBe('cleared');
    const taller = evaluateEventSpots(records([{ ...far, heightM: 22 }]), [{ ...first.spot, state: 'cleared', inputsFingerprint: first.fingerprint }], decisions).spots[0];
    expect(taller.review.state).toBe('waiting-review');
    expect(taller.review.reasons).toEqual(['Tree 3 changed since the review (position, height or ends).']);
  });

  test('raising the station’s power after clearance sends the spot back: the RF-exposure distance grows with √P (47 CFR 1.1310 limits, OET-65 far-field power density S = P·G/(4πR²))', () => {
    const far = tree(7, -150, 0);
    const first = evaluateEventSpots(records([far]), [spot(76, far.id)], []).spots[0];
    const decisions = first.results.map((r, i) => accept(90 + i, first.spot.id, r.key, first.fingerprint));
    const cleared = { ...first.spot, state: 'cleared' as const, inputsFingerprint: first.fingerprint };
    expect(evaluateEventSpots(records([far]), [cleared], decisions).spots[0].review.state).toBe('cleared');
    const louder = { ...records([far]), stations: [{ ...station, powerW: 1500 }] };
    const after = evaluateEventSpots(louder, [cleared], decisions).spots[0];
    expect(after.review.state).toBe('waiting-review');
    expect(after.review.reasons).toEqual(['The station’s power or mode changed since the review, so its RF-exposure distances changed.']);
    // The exposure distance itself grew (S ∝ P at a fixed distance, so the distance for the same limit grows ∝ √P).
    const exposure = (e: typeof first) => e.evaluated!.candidate.clearances.filter((c) => c.key.startsWith('rf'));
    expect(exposure(after).map((c) => c.requiredM ?? 0).reduce((a, b) => Math.max(a, b), 0)).toBeGreaterThan(exposure(first).map((c) => c.requiredM ?? 0).reduce((a, b) => Math.max(a, b), 0));
    // Moving an operating position is a change the review must see too; renaming the station is not.
    const withOp = { ...records([far]), operatingPositions: [{ ...meta(77), siteId: site.id, label: 'Tent', ...at(-140, 5), notes: '' }] };
    expect(evaluateEventSpots(withOp, [cleared], decisions).spots[0].review.reasons).toContain('An operating position was added, moved or removed since the review (the operators’ RF-exposure distance is checked to each).');
    const renamed = { ...records([far]), stations: [{ ...station, name: 'CW station' }] };
    expect(evaluateEventSpots(renamed, [cleared], decisions).spots[0].review.state).toBe('cleared');
  });

  test('a spot on a removed support cannot be built and says so; deleted spots are left out', () => {
    const { spots } = evaluateEventSpots(records([]), [spot(72, uuid(4)), { ...spot(73, uuid(4)), deletedAt: T }], []);
    expect(spots).toHaveLength(1);
    expect(spots[0].evaluated).toBeNull();
    expect(spots[0].review.reasons.join(' ')).toMatch(/can no longer be built/);
  });

  test('two chosen spots 3 m apart on 20 m and 15 m are flagged (under 0.5 λ at 20 m, Loftline default separation rule)', () => {
    const a = tree(5, -150, 0);
    const b = tree(6, -147, 0);
    const { spots } = evaluateEventSpots(records([a, b]), [spot(74, a.id, '20m'), spot(75, b.id, '15m')], []);
    const seps = spotSeparations(spots);
    expect(seps).toHaveLength(1);
    expect(seps[0].level).toBe('blocked');
    expect(seps[0].message).toMatch(/3\.0 m apart/);
  });
});
