import { describe, expect, it } from 'vitest';
import { displayToMetres, formatLength, metresToDisplay, M_PER_FT } from './length-format';

describe('length display', () => {
  it('uses the international foot, 0.3048 m exactly (NIST Handbook 44 App. C)', () => {
    expect(M_PER_FT).toBe(0.3048);
    expect(metresToDisplay(0.3048, 'imperial')).toBeCloseTo(1, 12);
    expect(displayToMetres(100, 'imperial')).toBeCloseTo(30.48, 12);
  });
  it('round-trips a typed value through metres in both systems', () => {
    for (const v of [0.5, 7.3, 41, 123.4]) {
      expect(metresToDisplay(displayToMetres(v, 'imperial'), 'imperial')).toBeCloseTo(v, 9);
      expect(metresToDisplay(displayToMetres(v, 'metric'), 'metric')).toBe(v);
    }
  });
  it('formats 12.5 m as "12.5 m" and as "41 ft" (12.5 / 0.3048 = 41.01)', () => {
    expect(formatLength(12.5, 'metric')).toBe('12.5 m');
    expect(formatLength(12.5, 'imperial')).toBe('41 ft');
    expect(formatLength(2, 'imperial')).toBe('6.6 ft');
  });
  it('shows a dash, never 0, for an unknown length', () => {
    expect(formatLength(null, 'metric')).toBe('—');
    expect(formatLength(Number.NaN, 'imperial')).toBe('—');
  });
});
