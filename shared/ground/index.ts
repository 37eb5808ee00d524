/*
 * shared/ground — the earth under an antenna.
 *   Ground                      free space, a perfect conductor, or real ground by σ (S/m) and εr
 *   GROUND_CLASSES / names      named classes (amateur table [doc] and ITU-R P.527 [memory])
 *   groundFromClass(name)       Ground for a class name; throws a clear Error for an unknown name
 *   customGround(σ, εr)         Ground from measured values (validated)
 *   complexPermittivity, fresnelCoefficients, wavelengthM
 */
import { GROUND_CLASSES, GROUND_CLASS_NAMES, isGroundClassName } from './ground-classes';

export type Ground = { kind: 'free-space' } | { kind: 'perfect' } | { kind: 'real'; sigmaSPerM: number; epsR: number };

export { GROUND_CLASSES, GROUND_CLASS_NAMES, isGroundClassName } from './ground-classes';
export type { GroundClassInfo, GroundClassName } from './ground-classes';
export { complexPermittivity } from './permittivity';
export type { Complex } from './permittivity';
export { fresnelCoefficients, fresnelInto, csqrt } from './fresnel';
export type { FresnelPair } from './fresnel';
export { SPEED_OF_LIGHT_M_PER_US, wavelengthM } from './constants';

export function groundFromClass(name: string): Ground {
  if (!isGroundClassName(name)) {
    throw new Error(`unknown ground class "${name}" (known: ${GROUND_CLASS_NAMES.join(', ')})`);
  }
  const c = GROUND_CLASSES[name];
  if (c.kind === 'real') return { kind: 'real', sigmaSPerM: c.sigmaSPerM, epsR: c.epsR };
  return { kind: c.kind };
}

/** Real ground from measured constants; the limits match the site record's (shared/schemas). */
export function customGround(sigmaSPerM: number, epsR: number): Ground {
  if (!Number.isFinite(sigmaSPerM) || sigmaSPerM <= 0 || sigmaSPerM > 10) {
    throw new Error(`ground conductivity must be above 0 and at most 10 S/m (got ${sigmaSPerM})`);
  }
  if (!Number.isFinite(epsR) || epsR < 1 || epsR > 100) {
    throw new Error(`ground relative permittivity must be between 1 and 100 (got ${epsR})`);
  }
  return { kind: 'real', sigmaSPerM, epsR };
}
