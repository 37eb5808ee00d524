import { describe, expect, it } from 'vitest';
import { M_PER_FT } from '../../../hooks/length-format';
import { niceFloor, scaleBar } from './scale-bar';

describe('scale bar (1-2-5 series, metres or feet)', () => {
  it('niceFloor picks the largest 1·2·5 × 10^k not above the value', () => {
    expect(niceFloor(7.3)).toBe(5);
    expect(niceFloor(19.99)).toBe(10);
    expect(niceFloor(20)).toBe(20);
    expect(niceFloor(0.034)).toBeCloseTo(0.02, 12);
    expect(niceFloor(4999)).toBe(2000);
    expect(niceFloor(0)).toBe(0);
  });

  it('metric: at 1.5 px/m with 120 px room the bar is 50 m = 75 px', () => {
    expect(scaleBar(1.5, 120, 'metric')).toEqual({ lengthM: 50, px: 75, label: '50 m' });
  });

  it('metric: long bars switch to km', () => {
    expect(scaleBar(0.05, 120, 'metric').label).toBe('2 km');
  });

  it('imperial: the bar is a round number of feet (1 ft = 0.3048 m exactly, NIST SP 811)', () => {
    const bar = scaleBar(1.5, 120, 'imperial');
    // 120 px / (1.5 px/m × 0.3048 m/ft) = 262 ft → 200 ft
    expect(bar.label).toBe('200 ft');
    expect(bar.lengthM).toBeCloseTo(200 * M_PER_FT, 12);
    expect(bar.px).toBeCloseTo(200 * M_PER_FT * 1.5, 9);
  });

  it('imperial: very long bars switch to miles', () => {
    expect(scaleBar(0.05, 200, 'imperial').label).toBe('2 mi');
  });

  it('the bar never exceeds the room it is given', () => {
    for (const pxPerM of [0.05, 0.3, 1, 2.2, 7, 40, 200]) {
      for (const system of ['metric', 'imperial'] as const) {
        const bar = scaleBar(pxPerM, 140, system);
        expect(bar.px).toBeLessThanOrEqual(140 + 1e-9);
        expect(bar.px).toBeGreaterThan(140 / 5.5);
      }
    }
  });
});
