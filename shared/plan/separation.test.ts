import { describe, expect, it } from 'vitest';
import { harmonicRelation, separationBetween, type SeparatedAntenna } from './separation';

// Horizontal-plane gain of a thin half-wave dipole in free space, for a self-contained test antenna:
// D(φ) = 1.64·[cos(π/2·cos φ)/sin φ]² (Balanis, Antenna Theory §4.6, from memory).
const dipoleGains = Array.from({ length: 360 }, (_, deg) => {
  const phi = (deg * Math.PI) / 180;
  const s = Math.sin(phi);
  const f = Math.abs(s) < 1e-6 ? 0 : Math.cos((Math.PI / 2) * Math.cos(phi)) / s;
  return Math.max(-99, 10 * Math.log10(1.64 * f * f));
});

function ant(needKey: string, band: SeparatedAntenna['band'], freqMhz: number, eastM: number, northM: number, wireAzimuthDeg: number): SeparatedAntenna {
  return { needKey, band, freqMhz, feed: { eastM, northM }, wireAzimuthDeg, azimuthGainsDbi: dipoleGains };
}

describe('station separation', () => {
  it('flags the harmonic relations 40→20 ×2, 40→15 ×3, 40→10 ×4, 20→10 ×2, 80→40 ×2 (47 CFR 97.301 band edges)', () => {
    expect(harmonicRelation('40m', '20m')).toBe(2);
    expect(harmonicRelation('40m', '15m')).toBe(3);
    expect(harmonicRelation('40m', '10m')).toBe(4);
    expect(harmonicRelation('20m', '10m')).toBe(2);
    expect(harmonicRelation('80m', '40m')).toBe(2);
    expect(harmonicRelation('20m', '15m')).toBeNull();
    expect(harmonicRelation('17m', '10m')).toBeNull();
  });

  it('measures in wavelengths of the lower band and refuses pairs under the minimum', () => {
    const lambda40 = 299.792458 / 7.15;
    const r = separationBetween(ant('a', '40m', 7.15, 0, 0, 90), ant('b', '20m', 14.175, 0, 0.4 * lambda40, 90), 0.5, 1);
    expect(r.wavelengths).toBeCloseTo(0.4, 6);
    expect(r.level).toBe('blocked');
    const ok = separationBetween(ant('a', '40m', 7.15, 0, 0, 90), ant('b', '20m', 14.175, 0, 0.7 * lambda40, 90), 0.5, 1);
    expect(ok.level).toBe('needs-review'); // harmonic and under 1 λ
    expect(ok.harmonic).toBe('40m × 2 falls in 20m');
    expect(ok.orientation).toBe('side-by-side');
  });

  it('classifies end-to-end, side-by-side and crossed wires', () => {
    const a = ant('a', '20m', 14.175, 0, 0, 90); // wire east–west
    expect(separationBetween(a, ant('b', '15m', 21.2, 60, 0, 90), 0.5, 1).orientation).toBe('end-to-end');
    expect(separationBetween(a, ant('b', '15m', 21.2, 0, 60, 90), 0.5, 1).orientation).toBe('side-by-side');
    expect(separationBetween(a, ant('b', '15m', 21.2, 0, 60, 0), 0.5, 1).orientation).toBe('crossed');
  });

  it('isolation follows the Friis equation: +6 dB per doubling of distance; end-to-end isolates better than side-by-side', () => {
    const a = ant('a', '20m', 14.175, 0, 0, 90);
    const near = separationBetween(a, ant('b', '20m', 14.175, 0, 50, 90), 0.5, 1).isolationDb;
    const far = separationBetween(a, ant('b', '20m', 14.175, 0, 100, 90), 0.5, 1).isolationDb;
    expect(far - near).toBeCloseTo(20 * Math.log10(2), 6);
    const ends = separationBetween(a, ant('b', '20m', 14.175, 50, 0, 90), 0.5, 1).isolationDb;
    expect(ends).toBeGreaterThan(near + 10);
    // Side by side at 50 m, 14.175 MHz: 20·log10(4π·50/21.15) − 2·2.15 = 25.1 dB (Friis, both at broadside peak).
    expect(near).toBeCloseTo(20 * Math.log10((4 * Math.PI * 50) / (299.792458 / 14.175)) - 2 * 10 * Math.log10(1.64), 1);
  });
});
