import { describe, expect, it } from 'vitest';
import { planeDistanceM } from '../clearance/planar';
import type { SiteFile } from '../schemas/site-file';
import { legEndOffsetM } from './candidates';
import { evaluateSpot } from './evaluate-spot';
import { DEFAULT_PLAN_OPTIONS } from './options';

/*
 * An inverted-V is judged at the leg bearing the lead chose (antennaSpots.legAzimuthDeg), not at whichever
 * direction the engine ranks best. A hand-built meadow: one 9 m oak at the reference point, a public path
 * running north–south 6 m east of it, a 12.47 kV line 40 m west, the operating tent 40 m south.
 */
const REF = { lat: 44.9312, lon: -92.8671 };
const at = (e: number, n: number) => ({ lat: REF.lat + n / 111_320, lon: REF.lon + e / (111_320 * Math.cos((REF.lat * Math.PI) / 180)) });
const site: SiteFile = {
  version: 1,
  name: 'Leg test meadow',
  reference: REF,
  ground: 'average',
  supports: [{ id: 'oak', kind: 'tree', ...at(0, 0), heightM: 9, attachHeightM: 9 }],
  hazards: [
    { id: 'lane', kind: 'path', points: [at(6, -60), at(6, 60)] },
    { id: 'line', kind: 'power-line', points: [at(-40, -80), at(-40, 80)], voltageKv: 12.47 },
  ],
  operatingPositions: [{ id: 'tent', ...at(0, -40) }],
  stations: [{ id: 'st', bands: ['20m'], powerW: 1000, mode: 'ssb', purpose: 'long-distance' }],
  coax: [],
};
const iv = (legAzimuthDeg?: number | null, geometryId?: string) =>
  evaluateSpot(site, { stationId: 'st', band: '20m', shape: 'inverted-v', supportIds: ['oak'], legAzimuthDeg, geometryId })!;
const result = (e: ReturnType<typeof iv>, key: string) => e.candidate.clearances.find((c) => c.key === key)!;

describe('evaluateSpot at the leg bearing the lead chose', () => {
  it.each([0, 30, 90, 157.5])(
    'bearing %s°: the leg ends lie leg·sin(apex/2) from the apex along the bearing and its reverse (right-triangle trigonometry)',
    (az) => {
      const c = iv(az).candidate;
      const legM = c.wireLengthM / 2;
      const offsetM = legM * Math.sin(((DEFAULT_PLAN_OPTIONS.invertedVApexDeg / 2) * Math.PI) / 180);
      expect(legEndOffsetM(legM, DEFAULT_PLAN_OPTIONS.invertedVApexDeg)).toBeCloseTo(offsetM, 12);
      expect(c.wireAzimuthDeg).toBe(az);
      expect(c.broadsideDeg).toEqual([(az + 90) % 360, (az + 270) % 360].sort((x, y) => x - y));
      expect(c.id).toBe(`20m:iv:oak@${az}`);
      const r = (az * Math.PI) / 180;
      const [[end1], [, end2]] = c.wire;
      expect(end2.eastM - c.feed.eastM).toBeCloseTo(offsetM * Math.sin(r), 9);
      expect(end2.northM - c.feed.northM).toBeCloseTo(offsetM * Math.cos(r), 9);
      expect(end1.eastM - c.feed.eastM).toBeCloseTo(-offsetM * Math.sin(r), 9);
      expect(planeDistanceM(end1, c.feed)).toBeCloseTo(offsetM, 9);
    },
  );

  it('120° apex: a 20 m leg of 5.03 m reaches 4.36 m out (sin 60° = 0.866) and hangs 2.52 m below the apex (cos 60° = 0.5)', () => {
    const c = iv(0).candidate;
    expect(legEndOffsetM(5.03, 120)).toBeCloseTo(4.356, 3);
    expect(c.endHeightsM[0]).toBeCloseTo(9 - (c.wireLengthM / 2) * 0.5, 9);
  });

  it('legs across the path (90°) bring a leg end inside the public RF distance (needs review); along it (0°) the wire stays 6 m off (clear)', () => {
    const across = iv(90);
    const along = iv(0);
    const offsetM = legEndOffsetM(across.candidate.wireLengthM / 2, DEFAULT_PLAN_OPTIONS.invertedVApexDeg);
    const pubAcross = result(across, 'rf-exposure:public');
    const pubAlong = result(along, 'rf-exposure:public');
    expect(pubAlong.distanceM).toBeCloseTo(6, 1);
    // The leg toward the path shortens the wire-to-path distance by exactly the leg end's offset.
    expect(pubAlong.distanceM! - pubAcross.distanceM!).toBeCloseTo(offsetM, 1);
    expect(pubAcross.level).toBe('needs-review');
    expect(pubAlong.level).toBe('clear');
    expect(across.candidate.level).toBe('needs-review');
    expect(along.candidate.level).toBe('clear');
  });

  it('the power-line fall result does not depend on the bearing: a fall reaches the full support height, or a whole leg swinging from the apex, in any direction (T0B06 as shared/clearance applies it)', () => {
    // Why no bearing can make a leg "reach over" the line while another clears it: the fall reach is drawn
    // around the support, max(height, leg + insulator), and every leg end lies inside it (4.4 m < 5.3 m).
    const a = result(iv(90), 'power-line:line');
    const b = result(iv(0), 'power-line:line');
    expect(a).toEqual(b);
    expect(a.level).toBe('clear');
    const blockedSite: SiteFile = { ...site, hazards: [{ id: 'line', kind: 'power-line', points: [at(5, -80), at(5, 80)], voltageKv: 12.47 }] };
    for (const az of [0, 90]) {
      const e = evaluateSpot(blockedSite, { stationId: 'st', band: '20m', shape: 'inverted-v', supportIds: ['oak'], legAzimuthDeg: az })!;
      expect(e.candidate.level).toBe('blocked');
    }
  });

  it('a bearing outside the options’ four directions is evaluated as given, and 210° is the same wire as 30°', () => {
    expect(DEFAULT_PLAN_OPTIONS.invertedVAzimuthsDeg).not.toContain(30);
    const c = iv(30).candidate;
    expect(c.wireAzimuthDeg).toBe(30);
    expect(iv(210).candidate).toEqual(c);
    // A chosen bearing wins over a candidate id naming another direction.
    expect(iv(30, '20m:iv:oak@90').candidate.id).toBe('20m:iv:oak@30');
  });

  it('null (or no bearing) keeps the old choice: the best-ranked of the options’ directions, or the named candidate', () => {
    const best = iv(null).candidate;
    expect(iv(undefined).candidate).toEqual(best);
    const options = DEFAULT_PLAN_OPTIONS.invertedVAzimuthsDeg.map((az) => iv(az).candidate);
    expect(options.map((o) => o.id)).toContain(best.id);
    for (const o of options) if (o.level !== 'blocked') expect(best.score).toBeGreaterThanOrEqual(o.score - 1e-9);
    expect(best.level).toBe('clear');
    expect(iv(null, '20m:iv:oak@90').candidate.id).toBe('20m:iv:oak@90');
  });

  it('a flat-top ignores a leg bearing (its two supports fix the wire)', () => {
    const two: SiteFile = { ...site, supports: [...site.supports, { id: 'ash', kind: 'tree', ...at(-20, 0), heightM: 12, attachHeightM: 11 }] };
    const spot = { stationId: 'st', band: '20m' as const, shape: 'flat' as const, supportIds: ['oak', 'ash'] };
    expect(evaluateSpot(two, { ...spot, legAzimuthDeg: 45 })!.candidate).toEqual(evaluateSpot(two, spot)!.candidate);
  });
});
