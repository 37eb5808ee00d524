import { describe, expect, it } from 'vitest';
import { MAX_OFFSET_M, addReading, movedBeyondM, addReadingWhereStanding, averaged, fixMeasurementInputs, offsetAccuracyM, placeByOffset, type PlacementGeo } from './placement-logic';

// A stand-in for shared/geo that records what it was asked: this suite checks the rules around the
// geodesy (which readings count, which inputs are refused), not the geodesy itself.
const calls: unknown[] = [];
const geo: PlacementGeo = {
  average(fixes) {
    calls.push(fixes);
    const w = fixes.map((f) => 1 / f.accuracyM ** 2);
    const sw = w.reduce((a, b) => a + b, 0);
    return { lat: fixes.reduce((s, f, i) => s + f.lat * w[i], 0) / sw, lon: fixes.reduce((s, f, i) => s + f.lon * w[i], 0) / sw, accuracyM: 1 / Math.sqrt(sw) };
  },
  distanceM: (a, b) => Math.hypot((a.lat - b.lat) * 111_000, (a.lon - b.lon) * 80_000),
  destination(from, distanceM, bearingDeg) {
    return { lat: from.lat + (distanceM * Math.cos((bearingDeg * Math.PI) / 180)) / 111_000, lon: from.lon + (distanceM * Math.sin((bearingDeg * Math.PI) / 180)) / 80_000 };
  },
};

describe('placement rules (fix averaging session, distance and bearing)', () => {
  it('keeps each reading once and drops readings with no accuracy or worse than 500 m', () => {
    let rs = addReading([], { lat: 1, lon: 2, accuracyM: 5, atMs: 1 });
    rs = addReading(rs, { lat: 1, lon: 2, accuracyM: 5, atMs: 1 });
    rs = addReading(rs, { lat: 1, lon: 2, accuracyM: null, atMs: 2 });
    rs = addReading(rs, { lat: 1, lon: 2, accuracyM: 900, atMs: 3 });
    rs = addReading(rs, { lat: 1.0001, lon: 2, accuracyM: 10, atMs: 4 });
    expect(rs.map((r) => r.atMs)).toEqual([1, 4]);
    const a = averaged(rs, geo);
    expect(a?.count).toBe(2);
    expect(calls.at(-1)).toEqual([{ lat: 1, lon: 2, accuracyM: 5 }, { lat: 1.0001, lon: 2, accuracyM: 10 }]);
    expect(averaged([], geo)).toBeNull();
  });

  it('ignores a reading taken well before the session started (where the scout stood before walking over)', () => {
    expect(addReading([], { lat: 1, lon: 2, accuracyM: 5, atMs: 1_000 }, 10_000)).toEqual([]);
    expect(addReading([], { lat: 1, lon: 2, accuracyM: 5, atMs: 7_000 }, 10_000)).toHaveLength(1);
  });

  it('a reading from clearly elsewhere (beyond 3× the accuracies) restarts the session there; a nearby one joins it', () => {
    const here = [{ lat: 1, lon: 2, accuracyM: 5, atMs: 1 }, { lat: 1.00001, lon: 2, accuracyM: 5, atMs: 2 }];
    const near = addReadingWhereStanding(here, { lat: 1.00005, lon: 2, accuracyM: 5, atMs: 3 }, 0, geo);
    expect(near).toHaveLength(3);
    const far = addReadingWhereStanding(here, { lat: 1.002, lon: 2, accuracyM: 5, atMs: 4 }, 0, geo);
    expect(far).toEqual([{ lat: 1.002, lon: 2, accuracyM: 5, atMs: 4 }]);
  });

  it('"clearly elsewhere" adds the two accuracies in quadrature (variances of independent errors add: textbook error propagation)', () => {
    // 12 m and 9 m → √(144 + 81) = 15 m, three of them 45 m (the old a + b rule said 63 m).
    expect(movedBeyondM(12, 9)).toBeCloseTo(45, 12);
    expect(movedBeyondM(3, 4)).toBeCloseTo(15, 12);
    // A phone still reporting the reference point 50 m back (12 m accuracy) no longer joins a session at a tree
    // (9 m): it restarts the session there rather than blending the two places.
    const flat = { ...geo, distanceM: (a: { lat: number }, b: { lat: number }) => Math.abs(a.lat - b.lat) * 111_320 };
    const atTree = [{ lat: 1, lon: 2, accuracyM: 9, atMs: 1 }, { lat: 1, lon: 2, accuracyM: 9, atMs: 2 }, { lat: 1, lon: 2, accuracyM: 9, atMs: 3 }];
    const avg = averaged(atTree, flat)!;
    const stale = { lat: 1 + 50 / 111_320, lon: 2, accuracyM: 12, atMs: 4 };
    expect(flat.distanceM(avg, stale)).toBeGreaterThan(movedBeyondM(avg.accuracyM, 12));
    expect(addReadingWhereStanding(atTree, stale, 0, flat)).toEqual([stale]);
  });

  it('the fix measurement keeps the count, best and worst readings and how long the scout waited', () => {
    const rs = [{ lat: 1, lon: 2, accuracyM: 8, atMs: 1000 }, { lat: 1, lon: 2, accuracyM: 4, atMs: 6500 }];
    expect(fixMeasurementInputs(averaged(rs, geo)!, rs)).toMatchObject({ readings: 2, bestReadingM: 4, worstReadingM: 8, spanS: 5.5 });
  });

  it('places a point by distance (in the person’s units) and bearing from the averaged fix', () => {
    const from = { lat: 44.5, lon: -93.2, accuracyM: 3, count: 5 };
    const r = placeByOffset(from, { distanceText: '100', bearingText: '90' }, (v) => v * 0.3048, geo);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.distanceM).toBeCloseTo(30.48, 9);
      expect(r.at.lat).toBeCloseTo(44.5, 9);
      expect(r.at.lon).toBeGreaterThan(-93.2);
      expect(r.accuracyM).toBeCloseTo(offsetAccuracyM(3, 30.48), 12);
    }
  });

  it('the offset error grows with distance: 3 m fix, 40 m away → √(3² + (40·tan5°)² + (0.05·40)²) ≈ 5.02 m (common-practice budget)', () => {
    expect(offsetAccuracyM(3, 40)).toBeCloseTo(Math.sqrt(9 + (40 * Math.tan((5 * Math.PI) / 180)) ** 2 + 4), 12);
    expect(offsetAccuracyM(3, 40)).toBeCloseTo(5.02, 2);
  });

  it('refuses a missing fix, junk, a bearing outside 0–360 and a distance beyond what can be paced', () => {
    const none = placeByOffset(null, { distanceText: 'far', bearingText: '400' }, (v) => v, geo);
    expect(none.ok).toBe(false);
    if (!none.ok) {
      expect(none.errors.from).toMatch(/GPS fix/);
      expect(none.errors.distance).toMatch(/distance/);
      expect(none.errors.bearing).toMatch(/0 and 360/);
    }
    const far = placeByOffset({ lat: 0, lon: 0, accuracyM: 2, count: 3 }, { distanceText: String(MAX_OFFSET_M + 1), bearingText: '10' }, (v) => v, geo);
    expect(far.ok).toBe(false);
  });
});
