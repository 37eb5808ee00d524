/*
 * Maximum permissible exposure, 47 CFR 1.1310 Table 1 (power density, mW/cm²).
 * Occupational/controlled limits average over 6 minutes, general population/uncontrolled over 30 minutes.
 * The table's structure and averaging times were read in the rule; the cell values are from memory,
 * consistent with the E-field limits 1842/f and 824/f V/m (see shared REFERENCES.md).
 */
export type ExposureTier = 'controlled' | 'uncontrolled';

export const MPE_SOURCE = '47 CFR 1.1310 Table 1';
export const AVERAGING_MINUTES: Record<ExposureTier, number> = { controlled: 6, uncontrolled: 30 };

/** Power density limit in mW/cm² at freqMhz (0.3–100 000 MHz). */
export function mpeLimitMwPerCm2(freqMhz: number, tier: ExposureTier): number {
  const f = freqMhz;
  if (!(f >= 0.3 && f <= 100_000)) throw new RangeError(`no 1.1310 limit at ${freqMhz} MHz (table covers 0.3–100 000 MHz)`);
  if (tier === 'controlled') {
    if (f < 3) return 100;
    if (f < 30) return 900 / (f * f);
    if (f < 300) return 1.0;
    if (f < 1500) return f / 300;
    return 5;
  }
  if (f < 1.34) return 100;
  if (f < 30) return 180 / (f * f);
  if (f < 300) return 0.2;
  if (f < 1500) return f / 1500;
  return 1.0;
}
