import { describe, expect, it } from 'vitest';
import { azimuthCut, feedImpedance, gainAt, pattern3d, summarizePattern, type DipoleInput } from '../../shared/pattern';
import { dipoleGeometry } from '../../shared/pattern/geometry';
import { defaultOrders, dipoleImpedances, legReaction } from '../../shared/pattern/induced-emf';
import { dipoleImpedancesFast } from '../../shared/pattern/leg-field';
import { illinoisRoot } from '../../shared/pattern/search';

// λ = 10 m at 29.9792458 MHz keeps the arithmetic in wavelengths easy to read.
const F = 29.9792458;
const LAMBDA = 10;
const dipole = (lengthWl: number, radiusWl: number): DipoleInput => ({
  freqMhz: F,
  ground: { kind: 'free-space' },
  shape: 'flat',
  heightM: 10,
  lengthM: lengthWl * LAMBDA,
  wireDiameterM: 2 * radiusWl * LAMBDA,
});

describe('free-space half-wave dipole', () => {
  it('broadside gain of an exact λ/2 is 2.15 dBi (D0 = 4/Cin(2π) = 1.641 [calc]; Balanis §4.6 2.15 dBi [memory])', () => {
    const g = gainAt(dipole(0.5, 1e-5), 0, 90);
    expect(g).toBeCloseTo(2.151, 2);
    expect(summarizePattern(dipole(0.5, 1e-5)).peakGainDbi).toBeCloseTo(2.151, 2);
  });

  it('end-fire gain along the wire is a null (thin-wire pattern, Balanis §4.6)', () => {
    expect(gainAt(dipole(0.5, 1e-5), 0, 0)).toBeLessThan(-60);
  });

  it('self impedance of an exact λ/2 is 73.08 + j42.52 Ω (Orfanidis, coupled antennas chapter [doc], η0 = 376.73 Ω)', () => {
    const z = feedImpedance(dipole(0.5, 1e-5));
    expect(z.resistanceOhm).toBeCloseTo(73.079, 1);
    expect(z.reactanceOhm).toBeCloseTo(42.515, 0);
    expect(Math.abs(z.reactanceOhm - 42.515)).toBeLessThan(0.1);
  });

  it('closed-form leg fields and the independent double integral give the same impedance (two methods, same physics)', () => {
    for (const input of [dipole(0.5, 1e-4), { ...dipole(0.5, 1e-4), shape: 'inverted-v' as const, apexDeg: 100, heightM: 5 }, dipole(1.45, 1e-4)]) {
      const g = dipoleGeometry(input);
      const k = (2 * Math.PI) / LAMBDA;
      const a = dipoleImpedances(g.legs, k, g.halfLengthM, g.radiusM, false, defaultOrders(k, g.halfLengthM, 4), false);
      const b = dipoleImpedancesFast(g.legs, k, g.halfLengthM, g.radiusM, false, false, 3);
      expect(Math.abs(a.self[0] - b.self[0])).toBeLessThan(0.05);
      expect(Math.abs(a.self[1] - b.self[1])).toBeLessThan(0.1);
    }
  });

  it('first resonance of a thin dipole near 0.4857 λ with about 67 Ω (Orfanidis [doc]); the reduced-kernel value depends on thickness', () => {
    // a = 3e-5 λ; thinner wires move towards 0.5 λ, thicker ones shorter (the trend every thin-wire code shows)
    const X = (l: number) => feedImpedance(dipole(l, 3e-5)).reactanceOhm;
    const l0 = illinoisRoot(X, 0.46, 0.5, 1e-6);
    expect(Math.abs(l0 - 0.4857)).toBeLessThan(0.002);
    expect(Math.abs(feedImpedance(dipole(l0, 3e-5)).resistanceOhm - 67.2)).toBeLessThan(1.5);
    const thick = illinoisRoot((l) => feedImpedance(dipole(l, 1e-3)).reactanceOhm, 0.44, 0.5, 1e-6);
    expect(thick).toBeLessThan(l0);
  });

  it('second series resonance near 1.48 λ (REFERENCES.md, thin-wire resonances)', () => {
    const l1 = illinoisRoot((l) => feedImpedance(dipole(l, 3e-5)).reactanceOhm, 1.35, 1.6, 1e-6);
    expect(Math.abs(l1 - 1.48)).toBeLessThan(0.01);
  });
});

describe('mutual impedance of parallel side-by-side λ/2 dipoles (Balanis §8.6 induced-EMF table [calc, η = 120π])', () => {
  // table values for η = 120π; our η0 = 376.73 Ω differs by 0.07 %, scale before comparing
  const table: [number, number, number][] = [
    [0.1, 67.33, 7.54],
    [0.25, 40.79, -28.35],
    [0.5, -12.53, -29.93],
    [0.75, -22.5, 6.63],
    [1.0, 4.01, 17.74],
    [1.5, -1.89, -12.3],
    [2.0, 1.08, 9.36],
  ];
  const k = 2 * Math.PI;
  const H = 0.25;
  const leg = (y: number, dir: 1 | -1) => ({ px: 0, py: y, pz: 0, tx: dir, ty: 0, tz: 0, lengthM: H, sign: dir });
  for (const [d, r12, x12] of table) {
    it(`d = ${d} λ: R12 ${r12} Ω, X12 ${x12} Ω`, () => {
      let re = 0;
      let im = 0;
      for (const a of [leg(0, 1), leg(0, -1)]) {
        for (const b of [leg(d, 1), leg(d, -1)]) {
          const z = legReaction(a, b, k, H, 0, 24, 24);
          re += z[0];
          im += z[1];
        }
      }
      const scale = 376.730313668 / (120 * Math.PI);
      expect(re).toBeCloseTo(r12 * scale, 1);
      expect(im).toBeCloseTo(x12 * scale, 1);
    });
  }
});

describe('cut conventions', () => {
  it('azimuth 0° runs along the wire (nulls at 0° and 180°), 90° and 270° are broadside (free-space λ/2, Balanis §4.6)', () => {
    const cut = azimuthCut(dipole(0.5, 1e-5), 0, 1);
    expect(cut).toHaveLength(360);
    const at = (a: number) => cut[a].gainDbi;
    expect(at(0)).toBeLessThan(-60);
    expect(at(180)).toBeLessThan(-60);
    expect(at(90)).toBeCloseTo(2.151, 2);
    expect(at(270)).toBeCloseTo(2.151, 2);
    // E-plane of a λ/2 dipole: cos(π/2·cos θ)/sin θ, θ from the wire; here θ = 30° (azimuth 30°, elevation 0°)
    const theta = Math.PI / 6;
    const ef = Math.cos((Math.PI / 2) * Math.cos(theta)) / Math.sin(theta);
    expect(at(30)).toBeCloseTo(2.151 + 20 * Math.log10(ef), 2);
  });

  it('pattern3d covers the sky on its grid and agrees with gainAt', () => {
    const input: DipoleInput = { freqMhz: 14.2, ground: { kind: 'perfect' }, shape: 'flat', heightM: 10 };
    const p = pattern3d(input, 15);
    expect(p.elevationsDeg).toEqual([0, 15, 30, 45, 60, 75, 90]);
    expect(p.azimuthsDeg).toHaveLength(24);
    expect(p.gainDbi[2][6]).toBeCloseTo(gainAt(input, 30, 90), 9);
    expect(() => pattern3d(input, 0)).toThrow(/angle step/);
  });
});
