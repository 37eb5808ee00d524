import { DEG, toDbi } from './db';
import { gaussLegendre } from './gauss';
import { gainLinear, prepareDipole, type PreparedDipole } from './model';
import { radiatedFraction } from './power';
import { brentMinimize, illinoisRoot } from './search';
import { swr } from './swr';
import type { DipoleInput, PatternSummary } from './types';
import { modelNotes, OPERATOR_WINDOWS } from './windows';

/*
 * The fast summary. The broadside elevation cut is sampled on a grid uniform in sin Δ (lobes of a wire
 * over flat ground are evenly spaced in sin Δ: image theory), dense enough for ≥ 6 samples per lobe; each
 * lobe and null found on the grid is then refined by Brent's method, each half-power edge by root finding,
 * and the window means by Gauss–Legendre quadrature. tests/bench/pattern.bench.ts compares it with a brute
 * 1° hemisphere grid (shared/pattern/reference.ts).
 */

const ANGLE_TOL_DEG = 0.005;

export function broadsideGain(m: PreparedDipole, elevationDeg: number): number {
  const e = elevationDeg * DEG;
  return gainLinear(m, Math.sin(e), Math.cos(e), 1, 0);
}

/** Number of grid intervals in sin Δ for the broadside cut. */
export function gridIntervals(m: PreparedDipole): number {
  return Math.max(16, Math.ceil((12 * m.input.heightM) / m.lambdaM) + 8);
}

/** Largest angular gap allowed in the grid: near the zenith a uniform sin Δ grid is coarse in angle. */
const MAX_GAP_DEG = 6;

/** Grid angles 0…90°: uniform in sin Δ, with extra points wherever the gap in angle exceeds MAX_GAP_DEG. */
export function gridAngles(m: PreparedDipole): number[] {
  const n = gridIntervals(m);
  const out: number[] = [0];
  for (let i = 1; i <= n; i++) {
    const next = i === n ? 90 : Math.asin(i / n) / DEG;
    const prev = out[out.length - 1];
    const parts = Math.ceil((next - prev) / MAX_GAP_DEG);
    for (let j = 1; j < parts; j++) out.push(prev + ((next - prev) * j) / parts);
    out.push(next);
  }
  return out;
}

/**
 * The main lobe: the strongest, except that lobes within MAIN_LOBE_TIE_DB of the strongest count as equal and
 * the lowest of them wins (over perfect ground every broadside lobe has the same gain: image theory).
 */
export const MAIN_LOBE_TIE_DB = 0.01;
export function mainLobe<T extends { elevationDeg: number }>(lobes: T[], dbOf: (l: T) => number): T {
  let best = -Infinity;
  for (const l of lobes) best = Math.max(best, dbOf(l));
  return lobes.find((l) => dbOf(l) >= best - MAIN_LOBE_TIE_DB) ?? lobes[0];
}

export function summarizePattern(input: DipoleInput): PatternSummary {
  return summarizePrepared(prepareDipole(input));
}

export function summarizePrepared(m: PreparedDipole): PatternSummary {
  const g = (deg: number) => broadsideGain(m, deg);
  const angles = gridAngles(m);
  const n = angles.length - 1;
  const deg = Float64Array.from(angles);
  const val = new Float64Array(n + 1);
  let gMax = 0;
  let gMin = Infinity;
  for (let i = 0; i <= n; i++) {
    val[i] = g(deg[i]);
    if (val[i] > gMax) gMax = val[i];
    if (val[i] < gMin) gMin = val[i];
  }
  const lobes: { elevationDeg: number; gainDbi: number; lin: number; idx: number }[] = [];
  const nulls: { elevationDeg: number }[] = [];
  const flat = gMax - gMin <= 1e-6 * gMax;
  if (flat) {
    lobes.push({ elevationDeg: 0, gainDbi: toDbi(val[0]), lin: val[0], idx: 0 });
  } else {
    const tol = 1e-12 * gMax;
    if (val[0] > val[1] + tol) lobes.push({ elevationDeg: 0, gainDbi: toDbi(val[0]), lin: val[0], idx: 0 });
    for (let i = 1; i < n; i++) {
      if (val[i] >= val[i - 1] && val[i] > val[i + 1] + tol) {
        const r = brentMinimize((x) => -g(x), deg[i - 1], deg[i + 1], ANGLE_TOL_DEG);
        lobes.push({ elevationDeg: r.x, gainDbi: toDbi(-r.fx), lin: -r.fx, idx: i });
      } else if (val[i] <= val[i - 1] && val[i] < val[i + 1] - tol) {
        const r = brentMinimize(g, deg[i - 1], deg[i + 1], ANGLE_TOL_DEG);
        nulls.push({ elevationDeg: r.x });
      }
    }
    if (val[n] > val[n - 1] + tol) lobes.push({ elevationDeg: 90, gainDbi: toDbi(val[n]), lin: val[n], idx: n });
  }
  const main = mainLobe(lobes, (l) => l.gainDbi);
  const half = main.lin / 2;
  let lowDeg = 0;
  let highDeg = 90;
  if (!flat) {
    const f = (x: number) => g(x) - half;
    for (let j = main.idx - (deg[main.idx] > main.elevationDeg ? 1 : 0); j >= 0; j--) {
      if (deg[j] >= main.elevationDeg) continue;
      if (val[j] < half) {
        const hi = j + 1 <= n && deg[j + 1] < main.elevationDeg ? deg[j + 1] : main.elevationDeg;
        lowDeg = illinoisRoot(f, deg[j], hi, ANGLE_TOL_DEG);
        break;
      }
    }
    for (let j = main.idx; j <= n; j++) {
      if (deg[j] <= main.elevationDeg) continue;
      if (val[j] < half) {
        const lo = j - 1 >= 0 && deg[j - 1] > main.elevationDeg ? deg[j - 1] : main.elevationDeg;
        highDeg = illinoisRoot(f, lo, deg[j], ANGLE_TOL_DEG);
        break;
      }
    }
  }
  const windows = OPERATOR_WINDOWS.map((w) => ({ id: w.id, fromDeg: w.fromDeg, toDeg: w.toDeg, meanGainDbi: toDbi(windowMean(m, w.fromDeg, w.toDeg)) }));
  const groundLossDb = m.ground === 'real' ? -10 * Math.log10(radiatedFraction(m, 0.45)) : 0;
  return {
    peakGainDbi: main.gainDbi,
    takeoffDeg: main.elevationDeg,
    halfPower: { lowDeg, highDeg },
    lobes: lobes.map((l) => ({ elevationDeg: l.elevationDeg, gainDbi: l.gainDbi })),
    nulls,
    windows,
    feed: { ...m.feed },
    swr50: swr(m.feed.resistanceOhm, m.feed.reactanceOhm, 50),
    groundLossDb,
    heightWavelengths: m.input.heightM / m.lambdaM,
    modelNotes: modelNotes({ ground: m.ground, heightWavelengths: m.input.heightM / m.lambdaM, lowestWavelengths: m.lowestM / m.lambdaM, lengthWavelengths: (2 * m.H) / m.lambdaM }),
  };
}

/** Mean linear broadside gain over elevations [fromDeg, toDeg], uniform in angle (Gauss–Legendre). */
export function windowMean(m: PreparedDipole, fromDeg: number, toDeg: number): number {
  const du = Math.sin(toDeg * DEG) - Math.sin(fromDeg * DEG);
  const rule = gaussLegendre(4 + Math.ceil((6 * du * m.input.heightM) / m.lambdaM));
  const h = (toDeg - fromDeg) / 2;
  const c = (toDeg + fromDeg) / 2;
  let s = 0;
  for (let i = 0; i < rule.x.length; i++) s += rule.w[i] * broadsideGain(m, c + h * rule.x[i]);
  return s / 2;
}
