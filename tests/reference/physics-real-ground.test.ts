import { describe, expect, it } from 'vitest';
import { complexPermittivity, fresnelCoefficients, groundFromClass, GROUND_CLASSES, GROUND_CLASS_NAMES } from '../../shared/ground';
import { summarizePattern, type DipoleInput } from '../../shared/pattern';
import { prepareDipole } from '../../shared/pattern/model';
import { radiatedFraction } from '../../shared/pattern/power';
import { brentMinimize } from '../../shared/pattern/search';

describe('ground constants and Fresnel reflection', () => {
  it('εc = εr − j·60σλ = εr − j·17 975σ/f(MHz) (ITU-R Handbook on ground-wave propagation [doc, secondary])', () => {
    const e = complexPermittivity(0.005, 13, 14.2);
    expect(e.re).toBe(13);
    expect(e.im).toBeCloseTo((-17975 * 0.005) / 14.2, 2);
  });

  it('ψ = 10°, 14.2 MHz, σ = 0.005, εr = 13: Γh = −0.9123 + j0.0207, Γv = −0.1918 − j0.1021 (REFERENCES.md [calc]; formulas textbook [memory])', () => {
    const { h, v } = fresnelCoefficients(complexPermittivity(0.005, 13, 14.2), 10);
    expect(h.re).toBeCloseTo(-0.9123, 4);
    expect(h.im).toBeCloseTo(0.0207, 4);
    expect(v.re).toBeCloseTo(-0.1918, 4);
    expect(v.im).toBeCloseTo(-0.1021, 4);
  });

  it('pseudo-Brewster angle (least |Γv|) for that ground at 14.2 MHz is 14.8° (REFERENCES.md [calc])', () => {
    const eps = complexPermittivity(0.005, 13, 14.2);
    const mag = (deg: number) => {
      const { v } = fresnelCoefficients(eps, deg);
      return Math.hypot(v.re, v.im);
    };
    expect(brentMinimize(mag, 1, 60, 1e-6).x).toBeCloseTo(14.8, 1);
  });

  it('a very good conductor reflects like a perfect one: Γh → −1, Γv → +1 (textbook limit)', () => {
    const { h, v } = fresnelCoefficients({ re: 1, im: -1e9 }, 30);
    expect(h.re).toBeCloseTo(-1, 3);
    expect(v.re).toBeCloseTo(1, 3);
  });

  it('ground classes carry the amateur table values [doc] and the ITU-R P.527 ones marked [memory]', () => {
    expect(GROUND_CLASSES.average).toMatchObject({ sigmaSPerM: 0.005, epsR: 13 });
    expect(GROUND_CLASSES['very-good']).toMatchObject({ sigmaSPerM: 0.0303, epsR: 20 });
    expect(GROUND_CLASSES['salt-water']).toMatchObject({ sigmaSPerM: 5, epsR: 81 });
    for (const n of ['sea-water', 'wet-ground', 'medium-dry-ground', 'very-dry-ground'] as const) {
      expect(GROUND_CLASSES[n].source).toMatch(/P\.527.*memory/);
    }
    expect(groundFromClass('poor')).toEqual({ kind: 'real', sigmaSPerM: 0.002, epsR: 13 });
    expect(groundFromClass('perfect')).toEqual({ kind: 'perfect' });
    expect(() => groundFromClass('swamp')).toThrow(/unknown ground class "swamp"/);
    expect(GROUND_CLASS_NAMES.every((n) => /^[a-z]+(-[a-z]+)*$/.test(n))).toBe(true);
  });
});

const F = 14.2;
const LAMBDA = 299.792458 / F;
const wire = (hWl: number, ground: DipoleInput['ground'], shape: DipoleInput['shape'] = 'flat'): DipoleInput => ({
  freqMhz: F,
  ground,
  shape,
  heightM: hWl * LAMBDA,
  lengthM: LAMBDA / 2,
});
const heights = [0.25, 0.375, 0.5, 0.75, 1, 1.25, 1.5, 2];

describe('real ground against perfect ground (reflection-coefficient model)', () => {
  for (const name of ['average', 'poor', 'very-dry-ground', 'very-good'] as const) {
    it(`${name}: lower peak gain than perfect ground at every height λ/4 … 2λ, the difference reported as ground loss`, () => {
      for (const h of heights) {
        for (const shape of ['flat', 'inverted-v'] as const) {
          const hh = shape === 'inverted-v' ? h + 0.2 : h;
          const real = summarizePattern(wire(hh, groundFromClass(name), shape));
          const perfect = summarizePattern(wire(hh, { kind: 'perfect' }, shape));
          expect(real.peakGainDbi).toBeLessThan(perfect.peakGainDbi);
          expect(real.groundLossDb).toBeGreaterThan(0.05);
        }
      }
    });
  }

  it('the takeoff angle over real ground stays within a few degrees of perfect ground from λ/2 up (and moves LOWER, see note)', () => {
    // Note: the issue expected "slightly higher". In this model the phase of Γh (−Γh = ρe^{−jβ}, β > 0) and
    // |Γh| falling with angle both pull the lobe down: 27.9° vs 30° at λ/2 over average ground.
    for (const h of [0.5, 0.75, 1, 1.5, 2]) {
      const real = summarizePattern(wire(h, groundFromClass('average')));
      const perfect = summarizePattern(wire(h, { kind: 'perfect' }));
      expect(real.takeoffDeg).toBeLessThanOrEqual(perfect.takeoffDeg);
      expect(perfect.takeoffDeg - real.takeoffDeg).toBeLessThan(2.5);
    }
  });

  it('sea water comes close to perfect ground: within 0.2 dB and 0.5° at λ/2 … 2λ', () => {
    for (const h of [0.5, 1, 2]) {
      const sea = summarizePattern(wire(h, groundFromClass('sea-water')));
      const perfect = summarizePattern(wire(h, { kind: 'perfect' }));
      expect(Math.abs(sea.peakGainDbi - perfect.peakGainDbi)).toBeLessThan(0.2);
      expect(Math.abs(sea.takeoffDeg - perfect.takeoffDeg)).toBeLessThan(0.5);
      expect(sea.groundLossDb).toBeLessThan(0.1);
    }
  });

  it('over lossy ground the far field returns less than the feed power; the deficit is the reported ground loss', () => {
    for (const h of [0.25, 0.5, 1]) {
      const input = wire(h, groundFromClass('average'));
      const frac = radiatedFraction(prepareDipole(input), 3);
      expect(frac).toBeLessThan(0.95);
      expect(summarizePattern(input).groundLossDb).toBeCloseTo(-10 * Math.log10(frac), 2);
    }
  });

  it('real ground changes the feed resistance from its perfect-ground value towards free space at low height (0.1 λ: 21.7 Ω → ~45 Ω)', () => {
    const perfect = prepareDipole(wire(0.1, { kind: 'perfect' })).feed.resistanceOhm;
    const real = prepareDipole(wire(0.1, groundFromClass('average'))).feed.resistanceOhm;
    expect(perfect).toBeLessThan(23);
    expect(real).toBeGreaterThan(35);
    expect(real).toBeLessThan(73);
  });
});
