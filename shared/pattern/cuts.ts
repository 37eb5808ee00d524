import { DEG, toDbi } from './db';
import { gainLinear, gainLinearDeg, prepareDipole } from './model';
import type { AzimuthPoint, DipoleInput, ElevationPoint } from './types';

function checkStep(stepDeg: number, max: number): void {
  if (!Number.isFinite(stepDeg) || stepDeg <= 0 || stepDeg > max) throw new Error(`angle step must be above 0 and at most ${max}° (got ${stepDeg})`);
}

function steps(from: number, to: number, step: number, includeEnd: boolean): number[] {
  const n = Math.round((to - from) / step);
  const out: number[] = [];
  for (let i = 0; i <= n; i++) {
    const v = Math.min(to, from + i * step);
    if (!includeEnd && v >= to) break;
    out.push(Number(v.toFixed(6)));
  }
  if (includeEnd && out[out.length - 1] !== to) out.push(to);
  return out;
}

/** Broadside elevation cut (azimuth 90°, across the wire) from 0° to 90°, every stepDeg (default 0.5°). */
export function elevationCut(input: DipoleInput, stepDeg = 0.5): ElevationPoint[] {
  checkStep(stepDeg, 45);
  const m = prepareDipole(input);
  return steps(0, 90, stepDeg, true).map((deg) => {
    const e = deg * DEG;
    return { deg, gainDbi: toDbi(gainLinear(m, Math.sin(e), Math.cos(e), 1, 0)) };
  });
}

/**
 * Azimuth cut at one elevation, 0° ≤ azimuth < 360° every stepDeg (default 1°). Azimuth 0° points along the
 * wire towards end 1 (the first of endHeightsM), 90° is broadside; add the wire's compass bearing to map it.
 */
export function azimuthCut(input: DipoleInput, elevationDeg: number, stepDeg = 1): AzimuthPoint[] {
  checkStep(stepDeg, 90);
  if (!(elevationDeg >= -90 && elevationDeg <= 90)) throw new Error(`elevation must be between −90° and 90° (got ${elevationDeg})`);
  const m = prepareDipole(input);
  return steps(0, 360, stepDeg, false).map((azimuthDeg) => ({ azimuthDeg, gainDbi: toDbi(gainLinearDeg(m, elevationDeg, azimuthDeg)) }));
}

/** Gain in one direction, dBi. */
export function gainAt(input: DipoleInput, elevationDeg: number, azimuthDeg: number): number {
  if (!(elevationDeg >= -90 && elevationDeg <= 90)) throw new Error(`elevation must be between −90° and 90° (got ${elevationDeg})`);
  if (!Number.isFinite(azimuthDeg)) throw new Error('azimuth must be a number of degrees');
  return toDbi(gainLinearDeg(prepareDipole(input), elevationDeg, azimuthDeg));
}

/** Gain over the sky (elevation 0…90°, azimuth 0…<360°) on a stepDeg grid: gainDbi[elevation index][azimuth index]. */
export function pattern3d(input: DipoleInput, stepDeg = 5): { elevationsDeg: number[]; azimuthsDeg: number[]; gainDbi: number[][] } {
  checkStep(stepDeg, 45);
  const m = prepareDipole(input);
  const elevationsDeg = steps(0, 90, stepDeg, true);
  const azimuthsDeg = steps(0, 360, stepDeg, false);
  const gainDbi = elevationsDeg.map((e) => azimuthsDeg.map((a) => toDbi(gainLinearDeg(m, e, a))));
  return { elevationsDeg, azimuthsDeg, gainDbi };
}
