import { describe, expect, it } from 'vitest';
import { BAND_NAMES as RECORD_BANDS } from '../../shared/schemas/records';
import { BANDS, BAND_NAMES, bandCentreMhz, bandForFrequency } from '../../shared/bands';
import { apexDegForEndHeight, flatTopSpan, halfWaveCutM, invertedV, spanFit, spanSagM, WIRE_14AWG_N_PER_M } from '../../shared/wire';

const FT = 0.3048;
const LBF = 4.4482216152605;

describe('half-wave cut length', () => {
  it('468/f ft: 7.1 MHz → 65.92 ft, 14.175 MHz → 33.02 ft (US Technician pool T9A09 [doc]; values [calc])', () => {
    expect(halfWaveCutM(7.1) / FT).toBeCloseTo(65.915, 2);
    expect(halfWaveCutM(14.175) / FT).toBeCloseTo(33.016, 2);
  });
  it('the rule is ~95 % of a free-space half wave; the factor is configurable (143/f m is the Canadian Basic pool rule [doc])', () => {
    expect(halfWaveCutM(10) / (299.792458 / 20)).toBeCloseTo(0.9516, 4);
    expect(halfWaveCutM(10, { endEffectFactor: 143 / (299.792458 / 2) })).toBeCloseTo(14.3, 9);
    expect(() => halfWaveCutM(-1)).toThrow(/positive/);
    expect(() => halfWaveCutM(7, { endEffectFactor: 2 })).toThrow(/end-effect factor/);
  });
});

describe('span sag (statics: catenary a[cosh(L/2a) − 1], parabola wL²/8T, point load PL/4T)', () => {
  it('14 AWG copper, 100 ft span, 20 lb → 0.777 ft; 10 lb → 1.554 ft (REFERENCES.md [calc], wire 12.43 lb/1000 ft [doc])', () => {
    expect(WIRE_14AWG_N_PER_M).toBeCloseTo((12.43 * LBF) / 304.8, 9);
    expect(spanSagM({ spanM: 100 * FT, tensionN: 20 * LBF, method: 'parabola' }) / FT).toBeCloseTo(0.777, 3);
    expect(spanSagM({ spanM: 100 * FT, tensionN: 10 * LBF, method: 'parabola' }) / FT).toBeCloseTo(1.554, 3);
  });
  it('catenary and parabola agree for shallow spans (within 0.01 %) and the catenary sags more on slack ones', () => {
    const c = spanSagM({ spanM: 30, tensionN: 90 });
    const p = spanSagM({ spanM: 30, tensionN: 90, method: 'parabola' });
    expect(Math.abs(c - p) / p).toBeLessThan(1e-4);
    const slackC = spanSagM({ spanM: 30, tensionN: 1 });
    const slackP = spanSagM({ spanM: 30, tensionN: 1, method: 'parabola' });
    expect(slackC).toBeGreaterThan(slackP);
  });
  it('a 20 N feed-point load at mid-span adds PL/4T', () => {
    const base = spanSagM({ spanM: 30, tensionN: 150 });
    expect(spanSagM({ spanM: 30, tensionN: 150, pointLoadN: 20 }) - base).toBeCloseTo((20 * 30) / (4 * 150), 9);
  });
  it('flat-top between supports of unequal height: feed below the chord midpoint by the sag, lowest point found', () => {
    const s = flatTopSpan({ spanM: 30, tensionN: 150, pointLoadN: 20, endHeightsM: [12, 11] });
    const sag = spanSagM({ spanM: 30, tensionN: 150, pointLoadN: 20, method: 'parabola' });
    expect(s.feedHeightM).toBeCloseTo(11.5 - sag, 6);
    expect(s.lowestM).toBeLessThanOrEqual(s.feedHeightM);
    expect(s.lowestFromEnd1M).toBeCloseTo(15, 6); // the feed's load puts a kink (the low point) at mid-span
    // without a point load the lowest point moves towards the lower support
    expect(flatTopSpan({ spanM: 30, tensionN: 20, endHeightsM: [12, 11] }).lowestFromEnd1M).toBeGreaterThan(15);
    expect(s.arcLengthM).toBeGreaterThan(Math.hypot(30, 1));
    // a steep span whose low end is below the sagging mid-point: the lowest point is that support
    expect(flatTopSpan({ spanM: 30, tensionN: 150, pointLoadN: 20, endHeightsM: [12, 9] }).lowestM).toBeCloseTo(9, 9);
  });
});

describe('inverted-V and span fit', () => {
  it('apex 12 m, 20 m of wire, 120° → ends at 12 − 10·cos 60° = 7 m, spread 2·10·sin 60° = 17.32 m (geometry)', () => {
    const v = invertedV({ apexHeightM: 12, wireLengthM: 20, apexDeg: 120 });
    expect(v.endHeightM).toBeCloseTo(7, 9);
    expect(v.endSpreadM).toBeCloseTo(17.3205, 4);
    expect(apexDegForEndHeight({ apexHeightM: 12, wireLengthM: 20, endHeightM: 7 })).toBeCloseTo(120, 9);
    expect(() => invertedV({ apexHeightM: 5, wireLengthM: 20, apexDeg: 60 })).toThrow(/below ground/);
  });
  it('a 20.1 m wire needs 20.1 + 2·0.1 + 2·1 = 22.3 m between supports (common practice allowances)', () => {
    expect(spanFit({ distanceM: 22.3, wireLengthM: 20.1 }).fits).toBe(true);
    const short = spanFit({ distanceM: 21, wireLengthM: 20.1 });
    expect(short.fits).toBe(false);
    expect(short.shortByM).toBeCloseTo(1.3, 9);
    expect(short.ropePerEndM).toBeCloseTo(0.35, 9);
  });
});

describe('US amateur bands (47 CFR 97.301 [doc])', () => {
  it('uses the record band names and the regulation edges', () => {
    expect(BAND_NAMES).toBe(RECORD_BANDS);
    expect(BANDS['40m']).toMatchObject({ lowMhz: 7.0, highMhz: 7.3 });
    expect(BANDS['20m']).toMatchObject({ lowMhz: 14.0, highMhz: 14.35 });
    expect(BANDS['17m']).toMatchObject({ lowMhz: 18.068, highMhz: 18.168 });
    expect(BANDS['10m']).toMatchObject({ lowMhz: 28.0, highMhz: 29.7 });
    expect(BANDS['160m']).toMatchObject({ lowMhz: 1.8, highMhz: 2.0 });
    expect(bandCentreMhz('20m')).toBeCloseTo(14.175, 9);
    expect(bandForFrequency(21.3)).toBe('15m');
    expect(bandForFrequency(11)).toBeNull();
    for (const b of BAND_NAMES) expect(BANDS[b].lowMhz).toBeLessThan(BANDS[b].highMhz);
  });
});
