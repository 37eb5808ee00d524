import { halfWaveCutM } from '../wire/cut-length';
import { prepareDipole } from './model';
import { brentMinimize, illinoisRoot } from './search';
import { swr } from './swr';
import type { DipoleInput, FeedPoint, ResonanceInfo } from './types';

export { swr } from './swr';

/*
 * The feed point across frequency. The WIRE is fixed (input.lengthM, or the practical cut for input.freqMhz),
 * and only the frequency moves: this is what an SWR sweep of a built dipole shows, including a wire used on a
 * band it was not cut for (a 40 m dipole on 15 m).
 */

function fixedWire(input: DipoleInput): DipoleInput {
  return { ...input, lengthM: input.lengthM ?? halfWaveCutM(input.freqMhz) };
}

function at(wire: DipoleInput, freqMhz: number): FeedPoint {
  const m = prepareDipole({ ...wire, freqMhz });
  const { resistanceOhm, reactanceOhm } = m.feed;
  return { freqMhz, resistanceOhm, reactanceOhm, swr50: swr(resistanceOhm, reactanceOhm, 50) };
}

export function feedImpedance(input: DipoleInput): { resistanceOhm: number; reactanceOhm: number } {
  return { ...prepareDipole(input).feed };
}

function checkRange(fromMhz: number, toMhz: number): void {
  if (!(Number.isFinite(fromMhz) && Number.isFinite(toMhz) && fromMhz > 0 && toMhz > fromMhz)) {
    throw new Error(`frequency range must have 0 < from < to (got ${fromMhz}–${toMhz} MHz)`);
  }
}

export function feedSweep(input: DipoleInput, fromMhz: number, toMhz: number, steps: number): FeedPoint[] {
  checkRange(fromMhz, toMhz);
  if (!Number.isInteger(steps) || steps < 2 || steps > 2001) throw new Error(`steps must be a whole number from 2 to 2001 (got ${steps})`);
  const wire = fixedWire(input);
  const out: FeedPoint[] = [];
  for (let i = 0; i < steps; i++) out.push(at(wire, fromMhz + ((toMhz - fromMhz) * i) / (steps - 1)));
  return out;
}

/**
 * Lowest SWR on 50 Ω and the first upward zero crossing of the reactance (series resonance) in the range.
 * They differ because the resistance at resonance is not 50 Ω and changes with frequency.
 */
export function resonanceInfo(input: DipoleInput, fromMhz: number, toMhz: number): ResonanceInfo {
  checkRange(fromMhz, toMhz);
  const wire = fixedWire(input);
  const n = 40;
  const pts = feedSweep(wire, fromMhz, toMhz, n + 1);
  let best = 0;
  for (let i = 1; i <= n; i++) if (pts[i].swr50 < pts[best].swr50) best = i;
  const lo = pts[Math.max(0, best - 1)].freqMhz;
  const hi = pts[Math.min(n, best + 1)].freqMhz;
  const tol = (toMhz - fromMhz) * 1e-6;
  const r = brentMinimize((f) => at(wire, f).swr50, lo, hi, tol);
  const edge = pts[best].swr50 <= r.fx ? { x: pts[best].freqMhz, fx: pts[best].swr50 } : r;
  let zeroReactanceMhz: number | null = null;
  for (let i = 0; i < n; i++) {
    const a = pts[i].reactanceOhm;
    const b = pts[i + 1].reactanceOhm;
    if (a < 0 && b >= 0) {
      zeroReactanceMhz = illinoisRoot((f) => at(wire, f).reactanceOhm, pts[i].freqMhz, pts[i + 1].freqMhz, tol, a, b);
      break;
    }
  }
  return { lowestSwrMhz: edge.x, lowestSwr: edge.fx, zeroReactanceMhz };
}
