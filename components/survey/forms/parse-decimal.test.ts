import { describe, expect, it } from 'vitest';
import { parseDecimal } from './parse-decimal';

describe('parseDecimal (what a scout types on a phone keyboard)', () => {
  it('reads point and comma decimals, signs and exponents', () => {
    expect(parseDecimal('0.005')).toBe(0.005);
    expect(parseDecimal(' 0,005 ')).toBe(0.005);
    expect(parseDecimal('-12.5')).toBe(-12.5);
    expect(parseDecimal('5e-3')).toBe(0.005);
    expect(parseDecimal('.5')).toBe(0.5);
  });
  it('refuses empty text and junk instead of guessing', () => {
    for (const t of ['', ' ', 'abc', '12m', '1.2.3', '--1', 'Infinity', 'NaN']) expect(parseDecimal(t)).toBeNull();
  });
});
