import { describe, expect, it } from 'vitest';
import { averageFixes, destination, distanceBearing, fromLocalEastNorth, toLocalEastNorth } from '../../shared/geo';

const dms = (d: number, m: number, s: number) => Math.sign(d) * (Math.abs(d) + m / 60 + s / 3600);

describe('geodesics on WGS84 (geographiclib-geodesic)', () => {
  it('Karney 2013 short line: s12 = 4.944208 m, α1 = 77.04353354237° (J. Geodesy 87 [doc])', () => {
    const r = distanceBearing({ lat: -30.12345, lon: 0 }, { lat: -30.12344, lon: 0.00005 });
    expect(r.distanceM).toBeCloseTo(4.944208, 6);
    expect(r.bearingDeg).toBeCloseTo(77.04353354237, 8);
  });

  it('Karney 2013 near-antipodal: s12 = 19 989 832.827610 m, α1 = 161.890524736° [doc]', () => {
    const r = distanceBearing({ lat: -30, lon: 0 }, { lat: 29.9, lon: 179.8 });
    expect(r.distanceM).toBeCloseTo(19989832.82761, 4);
    expect(r.bearingDeg).toBeCloseTo(161.890524736, 8);
  });

  it('Geoscience Australia: Flinders Peak → Buninyong 54 972.271 m at 306°52′05.37″ [doc]', () => {
    const flinders = { lat: dms(-37, 57, 3.7203), lon: dms(144, 25, 29.5244) };
    const buninyong = { lat: dms(-37, 39, 10.1561), lon: dms(143, 55, 35.3839) };
    const r = distanceBearing(flinders, buninyong);
    expect(r.distanceM).toBeCloseTo(54972.271, 3);
    expect(Math.abs(r.bearingDeg - dms(306, 52, 5.37))).toBeLessThan(0.01 / 3600);
    const back = destination(flinders, r.distanceM, r.bearingDeg);
    expect(back.lat).toBeCloseTo(buninyong.lat, 9);
    expect(back.lon).toBeCloseTo(buninyong.lon, 9);
  });

  it('local east/north frame: a point 100 m due east is (100, 0) and converts back (round trip < 1 mm)', () => {
    const ref = { lat: 44.95, lon: -93.1 };
    const east = destination(ref, 100, 90);
    const en = toLocalEastNorth(ref, east);
    expect(en.eastM).toBeCloseTo(100, 6);
    expect(en.northM).toBeCloseTo(0, 6);
    for (const p of [{ eastM: 250, northM: -120 }, { eastM: -3, northM: 800 }, { eastM: 0, northM: 0 }]) {
      const back = toLocalEastNorth(ref, fromLocalEastNorth(ref, p));
      expect(Math.abs(back.eastM - p.eastM)).toBeLessThan(1e-3);
      expect(Math.abs(back.northM - p.northM)).toBeLessThan(1e-3);
    }
  });

  it('across a field-day site the local frame keeps distances between any two points to well under a centimetre (vs the geodesic)', () => {
    const ref = { lat: 44.95, lon: -93.1 };
    const a = destination(ref, 450, 30);
    const b = destination(ref, 600, 250);
    const ea = toLocalEastNorth(ref, a), eb = toLocalEastNorth(ref, b);
    const planar = Math.hypot(ea.eastM - eb.eastM, ea.northM - eb.northM);
    expect(Math.abs(planar - distanceBearing(a, b).distanceM)).toBeLessThan(0.01);
  });

  it('rejects impossible coordinates with a clear message', () => {
    expect(() => distanceBearing({ lat: 91, lon: 0 }, { lat: 0, lon: 0 })).toThrow(/latitude/);
    expect(() => destination({ lat: 0, lon: 0 }, -5, 0)).toThrow(/distance/);
  });
});

describe('averaging GPS fixes (inverse-variance weighted mean)', () => {
  const ref = { lat: 44.95, lon: -93.1 };
  it('two fixes 10 m apart with accuracies 3 m and 6 m land 2 m from the better one (weights 1/9 : 1/36)', () => {
    const a = { ...ref, accuracyM: 3 };
    const b = { ...destination(ref, 10, 0), accuracyM: 6 };
    const avg = averageFixes([a, b]);
    expect(toLocalEastNorth(ref, avg).northM).toBeCloseTo(2, 3);
    // σ = 1/√(1/9 + 1/36) = 2.68 m, but the scatter (4 m RMS about the mean) is larger and wins
    expect(avg.uncertaintyM).toBeCloseTo(4, 3);
    expect(avg.count).toBe(2);
  });

  it('identical fixes: uncertainty is the weighted σ, floored at half the best accuracy (common practice)', () => {
    const fixes = Array.from({ length: 4 }, () => ({ ...ref, accuracyM: 4 }));
    expect(averageFixes(fixes).uncertaintyM).toBeCloseTo(2, 6);
    expect(() => averageFixes([])).toThrow(/at least one/);
    expect(() => averageFixes([{ ...ref, accuracyM: 0 }])).toThrow(/accuracy/);
  });
});
