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

/** Notes on where a case stretches the model; the same text for the fast summary and the reference. */
export function modelNotes(o: { ground: 'free-space' | 'perfect' | 'real'; heightWavelengths: number; lowestWavelengths: number; lengthWavelengths: number }): string[] {
  const notes: string[] = [];
  if (o.ground === 'real' && o.lowestWavelengths < 0.1) {
    notes.push('Part of the wire is lower than 0.1 wavelength over real ground: the ground model is rough this low (it leaves out the surface wave and the coupling to the earth), so treat gain and feed figures as approximate.');
  }
  const nearWhole = Math.round(o.lengthWavelengths);
  if (nearWhole >= 1 && Math.abs(o.lengthWavelengths - nearWhole) < 0.15) {
    notes.push(`The wire is close to ${nearWhole === 1 ? 'a full wavelength' : `${nearWhole} wavelengths`} long at this frequency: the feed impedance is very high and only a rough figure; expect a tuner or a different feed.`);
  }
  if (o.lengthWavelengths > 1.6) {
    notes.push('The wire is much longer than a half wave here: its strongest lobes point away from broadside, and this summary reads only the broadside cut.');
  }
  return notes;
}
