import { describe, expect, it } from 'vitest';
import {
  MODE_DUTY_FACTOR,
  densityAtMwPerCm2,
  distanceForDensityM,
  eirpW,
  exposureCheck,
  exposureDistances,
  mpeLimitMwPerCm2,
} from '../../shared/exposure';
import { type PlanePoint, SAFETY_CAUTION } from '../../shared/clearance';

const FT = 0.3048;

describe('MPE limits (47 CFR 1.1310 Table 1; cell values from memory, consistent with 1842/f and 824/f V/m)', () => {
  it.each([
    [7.15, 900 / 7.15 ** 2, 180 / 7.15 ** 2],
    [14.175, 900 / 14.175 ** 2, 180 / 14.175 ** 2],
    [28.5, 900 / 28.5 ** 2, 180 / 28.5 ** 2],
    [52, 1.0, 0.2],
    [146, 1.0, 0.2],
    [440, 440 / 300, 440 / 1500],
    [2400, 5, 1],
  ])('at %s MHz: controlled %s, uncontrolled %s mW/cm² (47 CFR 1.1310 Table 1)', (f, c, u) => {
    expect(mpeLimitMwPerCm2(f, 'controlled')).toBeCloseTo(c, 9);
    expect(mpeLimitMwPerCm2(f, 'uncontrolled')).toBeCloseTo(u, 9);
  });

  it('the power-density limits match the E-field limits 1842/f and 824/f V/m via S = E²/3770 (47 CFR 1.1310)', () => {
    for (const f of [3.5, 7, 14, 21, 28]) {
      expect(mpeLimitMwPerCm2(f, 'controlled')).toBeCloseTo((1842 / f) ** 2 / 3770, 1);
      expect(mpeLimitMwPerCm2(f, 'uncontrolled')).toBeCloseTo((824 / f) ** 2 / 3770, 1);
    }
  });

  it('limits are continuous at 30 MHz (1.0 and 0.2 mW/cm², 47 CFR 1.1310) and refuse frequencies outside the table', () => {
    expect(mpeLimitMwPerCm2(29.999, 'controlled')).toBeCloseTo(1.0, 3);
    expect(mpeLimitMwPerCm2(29.999, 'uncontrolled')).toBeCloseTo(0.2, 3);
    expect(() => mpeLimitMwPerCm2(0.1, 'controlled')).toThrow(/no 1.1310 limit/);
  });
});

describe('OET Bulletin 65 Supplement B far-field estimate with ground reflection', () => {
  // Supplement B's worked example: 144 MHz, a 24 dBi array, the stated power taken as the average power
  // (100 % duty, continuous transmission, as the example assumes) → 91 ft / 203 ft at 150 W.
  it.each([
    [150, 91, 203],
    [500, 166, 371],
    [1500, 287, 642],
  ])('144 MHz, 24 dBi, %s W → %s ft controlled, %s ft uncontrolled (OET-65 Supplement B worked example)', (w, cFt, uFt) => {
    const d = exposureDistances({ freqMhz: 144, powerW: w, dutyFactor: 1, transmitFraction: 1, gainDbi: 24 });
    expect(Math.abs(d.distanceM.controlled / FT - cFt)).toBeLessThan(1);
    expect(Math.abs(d.distanceM.uncontrolled / FT - uFt)).toBeLessThan(1);
  });

  it('S = 0.64·EIRP/(πR²) round-trips with R = √(0.64·EIRP/(πS)); 0.25 without reflection (OET-65 Supplement B)', () => {
    const e = eirpW(100, 2.15);
    expect(e).toBeCloseTo(164.06, 1);
    const r = distanceForDensityM(e, 1.0);
    expect(densityAtMwPerCm2(e, r)).toBeCloseTo(1.0, 9);
    expect(distanceForDensityM(e, 1.0, 0.25) / r).toBeCloseTo(Math.sqrt(0.25 / 0.64), 9);
  });

  it('duty factors: SSB 20 %, CW 40 %, FM and digital 100 % (OET-65 Supplement B Table 1, from memory)', () => {
    expect(MODE_DUTY_FACTOR).toEqual({ ssb: 0.2, cw: 0.4, digital: 1.0, fm: 1.0 });
    const ssb = exposureDistances({ freqMhz: 14.2, powerW: 100, dutyFactor: 0.2, transmitFraction: 1, gainDbi: 2.15 });
    const fm = exposureDistances({ freqMhz: 14.2, powerW: 100, dutyFactor: 1, transmitFraction: 1, gainDbi: 2.15 });
    expect(ssb.averagePowerW).toBeCloseTo(20, 9);
    expect(fm.distanceM.uncontrolled / ssb.distanceM.uncontrolled).toBeCloseTo(Math.sqrt(5), 9);
  });
});

describe('exposure check around a wire', () => {
  const wire: [PlanePoint, PlanePoint][] = [[{ eastM: -10, northM: 0 }, { eastM: 10, northM: 0 }]];
  const base = { freqMhz: 28.5, powerW: 1500, dutyFactor: 1, transmitFraction: 1, gainDbi: 8, gainNote: 'peak', wire };
  it('a path inside the public distance needs review; outside it is clear; every result carries the caution (47 CFR 1.1310)', () => {
    const u = exposureDistances(base).distanceM.uncontrolled;
    const path = (n: number) => ({ id: 'P1', kind: 'path', shape: { points: [{ eastM: -50, northM: n }, { eastM: 50, northM: n }], closed: false } });
    const inside = exposureCheck({ ...base, publicAreas: [path(u - 0.1)], operatingPositions: [] });
    expect(inside.results[0].level).toBe('needs-review');
    const outside = exposureCheck({ ...base, publicAreas: [path(u + 0.1)], operatingPositions: [{ id: 'OP', at: { eastM: 0, northM: -100 } }] });
    expect(outside.results.map((r) => r.level)).toEqual(['clear', 'clear']);
    for (const r of [...inside.results, ...outside.results]) expect(r.caution).toBe(SAFETY_CAUTION);
  });
  it('no recorded operating position is never called clear for the operators', () => {
    const r = exposureCheck({ ...base, publicAreas: [], operatingPositions: [] });
    expect(r.results.map((x) => [x.key, x.level])).toEqual([
      ['rf-exposure:public', 'needs-review'],
      ['rf-exposure:operators', 'needs-review'],
    ]);
    expect(r.results[1].message).toMatch(/No operating position is recorded/);
  });

  it('no recorded public area is never called clear: needs review with the distance to keep', () => {
    const r = exposureCheck({ ...base, publicAreas: [], operatingPositions: [{ id: 'OP1', at: { eastM: 0, northM: 1 } }] });
    expect(r.results.map((x) => [x.key, x.level])).toEqual([
      ['rf-exposure:public', 'needs-review'],
      ['rf-exposure:operators', 'needs-review'],
    ]);
  });
});
