import { SPEED_OF_LIGHT_M_PER_US } from './constants';

/** A complex number as a plain pair; the physics code keeps its own arithmetic (no dependency). */
export type Complex = { re: number; im: number };

/**
 * Complex relative permittivity of ground, εc = εr − j·60·σ·λ (λ in metres, σ in S/m), the time convention
 * being e^{+jωt}. Equivalent to εr − j·17 975·σ/f(MHz) (ITU-R Handbook on ground-wave propagation).
 */
export function complexPermittivity(sigmaSPerM: number, epsR: number, freqMhz: number): Complex {
  const lambdaM = SPEED_OF_LIGHT_M_PER_US / freqMhz;
  return { re: epsR, im: -60 * sigmaSPerM * lambdaM };
}
