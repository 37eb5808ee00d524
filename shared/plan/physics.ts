/*
 * The planner's only doorway to the physics modules (issue 3): geodesy, wire cut and sag, the ground and
 * the radiation pattern. Nothing here computes physics itself; it adapts their index APIs to the planner.
 */
import { wavelengthM } from '../ground';
import type { PlanePoint } from '../clearance/planar';
import { type DipoleInput, type PatternSummary, azimuthCut, summarizePattern } from '../pattern';
import { flatTopSpan, halfWaveCutM, spanSagM } from '../wire';
import { fromLocalEastNorth, toLocalEastNorth } from '../geo';

export type { DipoleInput, PatternSummary };

export function wavelengthAtM(freqMhz: number): number {
  return wavelengthM(freqMhz);
}

/** East/north metres of p around the site reference. */
export function localPlanePoint(ref: { lat: number; lon: number }, p: { lat: number; lon: number }): PlanePoint {
  const en = toLocalEastNorth(ref, p);
  return { eastM: en.eastM, northM: en.northM };
}

/** Practical half-wave dipole length for freqMhz, end insulator to end insulator. */
export function dipoleCutLengthM(freqMhz: number): number {
  return halfWaveCutM(freqMhz);
}

/**
 * A sagging flat-top between attachments at heights h1 and h2 spanM apart, under horizontal tension with the
 * feed line hanging at mid-span (14 AWG copper): feed height, mid-span sag and the lowest point (null when
 * the lowest point is certainly above minHeightM).
 */
export function sagSpan(spanM: number, endHeightsM: [number, number], tensionN: number, feedLoadN: number, minHeightM: number) {
  // The closed-form sag gives the feed height (the wire model's curve is the parabola plus the point-load
  // triangle); the sampled curve is only needed when the lowest point could be under minHeightM.
  const sagM = spanSagM({ spanM, tensionN, pointLoadN: feedLoadN, method: 'parabola' });
  const feedHeightM = (endHeightsM[0] + endHeightsM[1]) / 2 - sagM;
  if (Math.min(endHeightsM[0], endHeightsM[1]) - sagM >= minHeightM) return { feedHeightM, sagM, lowestM: null };
  const s = flatTopSpan({ spanM, tensionN, pointLoadN: feedLoadN, endHeightsM });
  return { feedHeightM: s.feedHeightM, sagM: s.sagM, lowestM: s.lowestM };
}

export function patternSummary(input: DipoleInput): PatternSummary {
  return summarizePattern(input);
}

/** Free-space azimuth gain (dBi) in the horizontal plane, index = degrees from the wire axis 0…359. */
export function freeSpaceAzimuthGainsDbi(input: Omit<DipoleInput, 'ground'>): number[] {
  const cut = azimuthCut({ ...input, ground: { kind: 'free-space' } }, 0, 1);
  const out = new Array<number>(360).fill(-99);
  for (const p of cut) out[((Math.round(p.azimuthDeg) % 360) + 360) % 360] = p.gainDbi;
  return out;
}

/** Latitude/longitude of a point given in east/north metres around the site reference. */
export function latLonFromPlane(ref: { lat: number; lon: number }, p: PlanePoint): { lat: number; lon: number } {
  return fromLocalEastNorth(ref, p);
}
