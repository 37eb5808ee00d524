import { GAIN_FLOOR_DBI } from './windows';

/** Linear power gain to dBi, floored at GAIN_FLOOR_DBI (exact nulls would be −∞). */
export function toDbi(g: number): number {
  return g > 0 ? Math.max(GAIN_FLOOR_DBI, 10 * Math.log10(g)) : GAIN_FLOOR_DBI;
}

export const DEG = Math.PI / 180;
