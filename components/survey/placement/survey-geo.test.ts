import { describe, expect, it } from 'vitest';
import { averaged, placeByOffset } from './placement-logic';
import { projector, surveyGeo } from './survey-geo';

const ref = { lat: 44.9, lon: -93.1 };

describe('survey placement through shared/geo (WGS84 geodesics)', () => {
  it('a point 40 m at 90° from the reference lands 40 m east on the plan (geodesic direct + local frame)', () => {
    const r = placeByOffset({ ...ref, accuracyM: 2, count: 4 }, { distanceText: '40', bearingText: '90' }, (v) => v, surveyGeo);
    expect(r.ok).toBe(true);
    if (r.ok) {
      const p = projector(ref)(r.at.lat, r.at.lon);
      expect(p.eastM).toBeCloseTo(40, 6);
      expect(p.northM).toBeCloseTo(0, 6);
    }
  });

  it('two equally good readings 10 m apart average to the middle; a 3× worse one counts 1/9 as much (inverse-variance weighting)', () => {
    const north10 = surveyGeo.destination(ref, 10, 0);
    const mid = averaged([{ ...ref, accuracyM: 4, atMs: 1 }, { ...north10, accuracyM: 4, atMs: 2 }], surveyGeo)!;
    expect(projector(ref)(mid.lat, mid.lon).northM).toBeCloseTo(5, 3);
    const skew = averaged([{ ...ref, accuracyM: 3, atMs: 1 }, { ...north10, accuracyM: 9, atMs: 2 }], surveyGeo)!;
    expect(projector(ref)(skew.lat, skew.lon).northM).toBeCloseTo(10 * (1 / 81) / (1 / 9 + 1 / 81), 3);
  });
});
