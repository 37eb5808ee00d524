/*
 * Lengths are stored in metres; feet appear only on screen. The international foot is exactly
 * 0.3048 m (NIST Handbook 44, Appendix C; the 1959 international yard and pound agreement).
 */

export const M_PER_FT = 0.3048;
export type UnitSystem = 'metric' | 'imperial';

export function lengthUnitOf(system: UnitSystem): 'm' | 'ft' {
  return system === 'metric' ? 'm' : 'ft';
}

/** Metres to the display number in the chosen system (not rounded). */
export function metresToDisplay(m: number, system: UnitSystem): number {
  return system === 'metric' ? m : m / M_PER_FT;
}

/** A number typed in the chosen system back to metres. */
export function displayToMetres(value: number, system: UnitSystem): number {
  return system === 'metric' ? value : value * M_PER_FT;
}

/** "12.5 m" / "41 ft": one decimal below 100 m (about a hand's width on a tree), whole feet from 10 ft. */
export function formatLength(m: number | null | undefined, system: UnitSystem): string {
  if (m === null || m === undefined || !Number.isFinite(m)) return '—';
  const v = metresToDisplay(m, system);
  const unit = lengthUnitOf(system);
  const digits = system === 'metric' ? (Math.abs(v) < 100 ? 1 : 0) : Math.abs(v) < 10 ? 1 : 0;
  return `${v.toFixed(digits)} ${unit}`;
}
