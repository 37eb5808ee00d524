import type { OperatorWindowId } from './types';

/*
 * Elevation windows that matter to operators (common practice, chosen for Loftline):
 *  - long-distance 3°–15°: multi-hop HF paths arrive at low angles; below ~3° real ground eats the signal anyway.
 *  - regional 15°–45°: one-hop contacts at a few hundred to ~1500 km.
 *  - near-vertical 60°–90°: near-vertical incidence skywave (NVIS), 0–400 km on the low bands.
 */
export const OPERATOR_WINDOWS: readonly { id: OperatorWindowId; fromDeg: number; toDeg: number; label: string }[] = [
  { id: 'long-distance', fromDeg: 3, toDeg: 15, label: 'Long distance (low angles)' },
  { id: 'regional', fromDeg: 15, toDeg: 45, label: 'Regional (middle angles)' },
  { id: 'near-vertical', fromDeg: 60, toDeg: 90, label: 'Near-vertical, short range (NVIS)' },
];

/** Gains are floored here (an exact null would be −∞ dBi, which JSON cannot carry). */
export const GAIN_FLOOR_DBI = -99;
