import { wavelengthM } from '../ground/constants';

/*
 * Cut length of a half-wave dipole. The practical rule L(ft) = 468/f(MHz) (US Technician pool T9A09 [doc];
 * ≈ 142.6/f metres; the Canadian Basic pool uses 143/f m) is about 95 % of a free-space half wave: the
 * shortening ("end effect") comes from the wire's thickness, the end insulators and nearby objects.
 * The factor is configurable because every installation trims to its own SWR anyway.
 */

/** 468 ft expressed in metres: the numerator of the practical rule. */
export const PRACTICAL_RULE_M_MHZ = 468 * 0.3048;
/** End-effect factor of the practical rule: 468 ft / (c/2) ≈ 0.9516. */
export const DEFAULT_END_EFFECT_FACTOR = PRACTICAL_RULE_M_MHZ / (wavelengthM(1) / 2);

export type CutOptions = { endEffectFactor?: number };

function checkFreq(freqMhz: number): void {
  if (!Number.isFinite(freqMhz) || freqMhz <= 0) throw new Error(`frequency must be a positive number of MHz (got ${freqMhz})`);
}

/** Total wire length (end insulator to end insulator) of a half-wave dipole for freqMhz. */
export function halfWaveCutM(freqMhz: number, opts: CutOptions = {}): number {
  checkFreq(freqMhz);
  const factor = opts.endEffectFactor ?? DEFAULT_END_EFFECT_FACTOR;
  if (!Number.isFinite(factor) || factor < 0.8 || factor > 1.05) {
    throw new Error(`end-effect factor must be between 0.8 and 1.05 (got ${factor})`);
  }
  return (factor * wavelengthM(freqMhz)) / 2;
}

/** Length of each leg of a centre-fed dipole (half the total, less half the centre insulator's gap). */
export function legLengthM(totalLengthM: number, centreGapM = 0): number {
  if (!(totalLengthM > 0)) throw new Error(`wire length must be above 0 (got ${totalLengthM})`);
  if (centreGapM < 0 || centreGapM >= totalLengthM) throw new Error('centre insulator gap must be ≥ 0 and shorter than the wire');
  return (totalLengthM - centreGapM) / 2;
}

export type Allowances = {
  /** Extra wire folded back through each end insulator to wrap (common practice: ~0.15 m). */
  wrapPerEndM?: number;
  /** Length of each end insulator (common practice: ~0.1 m). */
  insulatorM?: number;
  /** Shortest rope from each end insulator to its support (common practice: 1 m, keeps the wire end clear of the tree). */
  minRopePerEndM?: number;
};

export const DEFAULT_ALLOWANCES: Required<Allowances> = { wrapPerEndM: 0.15, insulatorM: 0.1, minRopePerEndM: 1 };

/** Wire to cut from the spool: the electrical length plus the wrap at both ends and both sides of the feed. */
export function wireToCutM(electricalLengthM: number, a: Allowances = {}): number {
  const wrap = a.wrapPerEndM ?? DEFAULT_ALLOWANCES.wrapPerEndM;
  if (!(electricalLengthM > 0)) throw new Error(`wire length must be above 0 (got ${electricalLengthM})`);
  if (wrap < 0) throw new Error('wrap allowance must be ≥ 0');
  return electricalLengthM + 4 * wrap;
}
