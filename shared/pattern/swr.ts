/** SWR of a load R + jX on a line of real characteristic impedance z0 (|Γ| = |Z − Z0| / |Z + Z0|). */
export function swr(resistanceOhm: number, reactanceOhm: number, z0Ohm = 50): number {
  if (!(z0Ohm > 0)) throw new Error(`line impedance must be above 0 Ω (got ${z0Ohm})`);
  if (!(resistanceOhm > 0)) return Infinity;
  const nr = resistanceOhm - z0Ohm;
  const dr = resistanceOhm + z0Ohm;
  const x2 = reactanceOhm * reactanceOhm;
  const gamma = Math.sqrt((nr * nr + x2) / (dr * dr + x2));
  return gamma >= 1 ? Infinity : (1 + gamma) / (1 - gamma);
}
