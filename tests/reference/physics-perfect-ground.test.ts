import { describe, expect, it } from 'vitest';
import { elevationCut, feedImpedance, summarizePattern, type DipoleInput } from '../../shared/pattern';
import { prepareDipole } from '../../shared/pattern/model';
import { radiatedFraction } from '../../shared/pattern/power';

const F = 29.9792458; // λ = 10 m
const at = (hWl: number, ground: DipoleInput['ground'] = { kind: 'perfect' }): DipoleInput => ({
  freqMhz: F,
  ground,
  shape: 'flat',
  heightM: hWl * 10,
  lengthM: 5,
  wireDiameterM: 2e-4,
});
const asinDeg = (x: number) => (Math.asin(x) * 180) / Math.PI;

describe('horizontal λ/2 dipole over perfect ground (image theory, Balanis §4.7)', () => {
  for (const [h, lobe] of [[0.375, 41.81], [0.5, 30.0], [0.75, 19.47], [1.0, 14.48], [1.5, 9.59]] as const) {
    it(`first lobe at h = ${h} λ peaks at ${lobe}° (sin Δ = λ/4h [calc])`, () => {
      const s = summarizePattern(at(h));
      expect(s.lobes[0].elevationDeg).toBeCloseTo(lobe, 1);
      expect(Math.abs(s.takeoffDeg - lobe)).toBeLessThan(0.02);
    });
  }

  it('nulls at sin Δ = nλ/2h for h = 1.5 λ (image theory)', () => {
    const s = summarizePattern(at(1.5));
    const expected = [1, 2].map((n) => asinDeg(n / 3)); // 19.47°, 41.81°; n = 3 is the zenith
    expect(s.nulls.map((n) => n.elevationDeg)).toHaveLength(2);
    s.nulls.forEach((n, i) => expect(Math.abs(n.elevationDeg - expected[i])).toBeLessThan(0.01));
    // lobes at sin Δ = (2n+1)λ/4h: 9.59°, 30°, 56.44°
    expect(s.lobes.map((l) => Math.round(l.elevationDeg * 100) / 100)).toEqual([9.59, 30, 56.44]);
  });

  for (const [h, lo, hi] of [[0.5, 14.48, 48.59], [0.75, 9.59, 30.0], [1.0, 7.18, 22.02]] as const) {
    it(`half-power points at h = ${h} λ: ${lo}° … ${hi}° ([calc] from 2|sin(kh sinΔ)|)`, () => {
      const s = summarizePattern(at(h));
      expect(Math.abs(s.halfPower.lowDeg - lo)).toBeLessThan(0.01);
      expect(Math.abs(s.halfPower.highDeg - hi)).toBeLessThan(0.01);
    });
  }

  // Z_in = Z11 − Z12(2h) [calc]; the textbook curve (ARRL Antenna Book "effects of ground") from memory
  for (const [h, r] of [[0.1, 21.7], [0.25, 85.7], [0.333, 98.5], [0.5, 69.1], [0.6, 57.9], [1.0, 72.0]] as const) {
    it(`feed resistance at h = ${h} λ is ${r} Ω`, () => {
      expect(Math.abs(feedImpedance(at(h)).resistanceOhm - r)).toBeLessThan(0.25);
    });
  }

  it('feed resistance tends to the free-space 73.1 Ω as the wire goes up (10.05 λ within 1 Ω)', () => {
    expect(Math.abs(feedImpedance(at(10.05)).resistanceOhm - 73.08)).toBeLessThan(1);
  });

  it('peak gain 8.42 dBi at h = 0.5 λ and 9.19 dBi at 0.6 λ (D0·4·R11/R_in [calc]; >9 dBi at 0.6 λ, IEEE Trans. AP July 1967 [doc, secondary])', () => {
    expect(summarizePattern(at(0.5)).peakGainDbi).toBeCloseTo(8.42, 1);
    expect(Math.abs(summarizePattern(at(0.5)).peakGainDbi - 8.42)).toBeLessThan(0.02);
    expect(Math.abs(summarizePattern(at(0.6)).peakGainDbi - 9.19)).toBeLessThan(0.02);
  });

  it('the elevation cut is 0 at the horizon and matches 2|sin(kh sinΔ)| shape at h = λ/2', () => {
    const cut = elevationCut(at(0.5), 0.5);
    expect(cut).toHaveLength(181);
    expect(cut[0].gainDbi).toBe(-99);
    const peak = summarizePattern(at(0.5)).peakGainDbi;
    for (const p of cut.filter((c) => c.deg > 2)) {
      const af = Math.abs(Math.sin(Math.PI * Math.sin((p.deg * Math.PI) / 180)));
      const expected = peak + 20 * Math.log10(af);
      if (expected > -60) expect(p.gainDbi).toBeCloseTo(expected, 3);
      else expect(p.gainDbi).toBeLessThan(-50); // the zenith null
    }
  });
});

describe('energy: the far field returns the feed power (within 1 %)', () => {
  it('free space: the sphere integral equals the feed power for λ/2, an inverted-V and a 1.45 λ wire', () => {
    for (const input of [
      { ...at(1, { kind: 'free-space' }) },
      { ...at(1, { kind: 'free-space' }), shape: 'inverted-v' as const, apexDeg: 90 },
      { ...at(1, { kind: 'free-space' }), lengthM: 14.5 },
    ]) {
      expect(Math.abs(radiatedFraction(prepareDipole(input), 2) - 1)).toBeLessThan(0.01);
    }
  });

  it('perfect ground: the upper hemisphere returns the feed power at 0.1 … 2 λ, flat and inverted-V', () => {
    for (const h of [0.1, 0.25, 0.5, 1, 2]) {
      expect(Math.abs(radiatedFraction(prepareDipole(at(h)), 2) - 1)).toBeLessThan(0.01);
      const v = { ...at(h + 0.3), shape: 'inverted-v' as const };
      expect(Math.abs(radiatedFraction(prepareDipole(v), 2) - 1)).toBeLessThan(0.01);
    }
  });

  it('summary reports no ground loss over free space and perfect ground', () => {
    expect(summarizePattern(at(0.5)).groundLossDb).toBe(0);
    expect(summarizePattern(at(0.5, { kind: 'free-space' })).groundLossDb).toBe(0);
  });
});
