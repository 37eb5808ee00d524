/** Speed of light in m/µs, so that λ(m) = 299.792458 / f(MHz). */
export const SPEED_OF_LIGHT_M_PER_US = 299.792458;

/** Wavelength in metres for a frequency in MHz. */
export function wavelengthM(freqMhz: number): number {
  return SPEED_OF_LIGHT_M_PER_US / freqMhz;
}
