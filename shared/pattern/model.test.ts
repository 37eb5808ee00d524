import { describe, expect, it } from 'vitest';
import { dipoleGeometry } from './geometry';
import { ETA0_OHM } from './induced-emf';
import { gainLinearDeg, prepareDipole } from './model';
import type { DipoleInput } from './types';

// Independent check of the closed-form radiation integral: brute-force midpoint sum of I(s)·e^{jk r̂·r(s)}
// along the legs (and the mirrored image with Fresnel-free perfect reflection), then the same gain formula.
function bruteGain(input: DipoleInput, elevDeg: number, azDeg: number): number {
  const m = prepareDipole(input);
  const g = dipoleGeometry(input);
  const e = (elevDeg * Math.PI) / 180, a = (azDeg * Math.PI) / 180;
  const r = [Math.cos(e) * Math.cos(a), Math.cos(e) * Math.sin(a), Math.sin(e)];
  const N = [0, 0, 0, 0, 0, 0];
  const n = 4000;
  const add = (img: boolean) => {
    for (const leg of g.legs) {
      for (let i = 0; i < n; i++) {
        const s = ((i + 0.5) * leg.lengthM) / n;
        const p = [leg.px + leg.tx * s, 0, (img ? -1 : 1) * (leg.pz + leg.tz * s)];
        const c = [leg.tx * leg.sign * (img ? -1 : 1), 0, leg.tz * leg.sign * (img ? -1 : 1) * (img ? -1 : 1)];
        // image of a current: horizontal part reversed, vertical kept (perfect conductor)
        const cur = Math.sin(m.k * (g.halfLengthM - s)) * (leg.lengthM / n);
        const ph = m.k * (r[0] * p[0] + r[2] * p[2]);
        for (let d = 0; d < 3; d++) {
          N[2 * d] += c[d] * cur * Math.cos(ph);
          N[2 * d + 1] += c[d] * cur * Math.sin(ph);
        }
      }
    }
  };
  add(false);
  if (input.ground.kind === 'perfect') add(true);
  const th = [Math.sin(e) * Math.cos(a), Math.sin(e) * Math.sin(a), -Math.cos(e)];
  const phv = [-Math.sin(a), Math.cos(a), 0];
  const dot = (v: number[], re: boolean) => v.reduce((acc, x, d) => acc + x * N[2 * d + (re ? 0 : 1)], 0);
  const n2 = dot(th, true) ** 2 + dot(th, false) ** 2 + dot(phv, true) ** 2 + dot(phv, false) ** 2;
  const iin = Math.sin(m.k * g.halfLengthM);
  return (ETA0_OHM * m.k * m.k * n2) / (4 * Math.PI * iin * iin * m.feed.resistanceOhm);
}

describe('closed-form far field equals a brute-force radiation integral', () => {
  const cases: DipoleInput[] = [
    { freqMhz: 14.2, ground: { kind: 'free-space' }, shape: 'flat', heightM: 10 },
    { freqMhz: 14.2, ground: { kind: 'perfect' }, shape: 'flat', heightM: 10 },
    { freqMhz: 7.1, ground: { kind: 'perfect' }, shape: 'inverted-v', heightM: 14, apexDeg: 100 },
    { freqMhz: 21.2, ground: { kind: 'perfect' }, shape: 'flat', heightM: 9, endHeightsM: [12, 10.5], lengthM: 20 },
  ];
  for (const c of cases) {
    it(`${c.shape} over ${c.ground.kind}${c.lengthM ? `, ${c.lengthM} m wire` : ''}`, () => {
      for (const [el, az] of [[10, 90], [35, 60], [60, 10], [85, 170], [20, 300]]) {
        const fast = gainLinearDeg(prepareDipole(c), el, az);
        expect(fast).toBeCloseTo(bruteGain(c, el, az), 4);
      }
    });
  }
});

describe('input checks', () => {
  const base: DipoleInput = { freqMhz: 7.1, ground: { kind: 'perfect' }, shape: 'inverted-v', heightM: 12 };
  it('rejects an inverted-V whose ends would be below ground, with the lowest point in the message', () => {
    expect(() => prepareDipole({ ...base, heightM: 3 })).toThrow(/at or below ground \(lowest point -2\.\d\d m\)/);
  });
  it('rejects end heights on an inverted-V and impossible flat-top end heights', () => {
    expect(() => prepareDipole({ ...base, endHeightsM: [5, 5] })).toThrow(/end heights apply to a flat-top/);
    expect(() => prepareDipole({ ...base, shape: 'flat', heightM: 5, endHeightsM: [30, 5] })).toThrow(/more than a leg/);
  });
  it('rejects out-of-range frequency and ground constants', () => {
    expect(() => prepareDipole({ ...base, freqMhz: 0.1 })).toThrow(/frequency/);
    expect(() => prepareDipole({ ...base, ground: { kind: 'real', sigmaSPerM: -1, epsR: 13 } })).toThrow(/conductivity/);
  });
});
