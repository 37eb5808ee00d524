import type { LatLon } from '../../../shared/schemas';
import { parseDecimal } from '../forms/parse-decimal';

/*
 * Placing a thing on the site: where the scout stands (several GPS readings averaged, weighted by the
 * accuracy each one reports) or by distance and bearing from where they stand. The geodesy itself is
 * shared/geo's; it is passed in as `PlacementGeo` so this stays a pure, testable rule book.
 */

export type Fix = { lat: number; lon: number; accuracyM: number | null; atMs: number };
export type AveragedFix = { lat: number; lon: number; accuracyM: number; count: number };

export type PlacementGeo = {
  distanceM(a: LatLon, b: LatLon): number;
  average(fixes: readonly { lat: number; lon: number; accuracyM: number }[]): { lat: number; lon: number; accuracyM: number };
  destination(from: LatLon, distanceM: number, bearingDeg: number): LatLon;
};

/** Readings worse than this say "somewhere in town": never averaged in (the support schema stops at 500 m). */
export const WORST_READING_M = 500;
/** A fix is offered once this many readings agree; more keep improving it while the scout waits. */
export const MIN_READINGS = 3;

/** A reading up to this old when the session starts still says where the scout stands now (common practice). */
export const FRESH_READING_MS = 5000;

/**
 * Add a reading to the session unless it repeats one already held, has no usable accuracy, or was taken
 * before the session started (where the scout stood before walking over here).
 */
export function addReading(readings: readonly Fix[], r: Fix, sessionStartMs = -Infinity): Fix[] {
  if (r.accuracyM === null || !(r.accuracyM > 0) || r.accuracyM > WORST_READING_M) return [...readings];
  if (r.atMs < sessionStartMs - FRESH_READING_MS) return [...readings];
  if (readings.some((x) => x.atMs === r.atMs)) return [...readings];
  return [...readings, r];
}

/**
 * A reading this far outside the session's average means the scout has walked on: averaging starts again from
 * the new reading instead of blending two places. The yardstick is the spread of the DIFFERENCE of two
 * independent position errors, whose variances add (textbook error propagation), so the two accuracies are
 * combined as √(a² + b²), not a + b; three of those is the usual "clearly not the same place" (common practice).
 */
export const MOVED_FACTOR = 3;

/** Distance beyond which a reading is taken to come from somewhere else (MOVED_FACTOR × √(a² + b²)). */
export const movedBeyondM = (sessionAccuracyM: number, readingAccuracyM: number): number => MOVED_FACTOR * Math.hypot(sessionAccuracyM, readingAccuracyM);

/** addReading, but a reading from somewhere clearly else restarts the session there. */
export function addReadingWhereStanding(readings: readonly Fix[], r: Fix, sessionStartMs: number, geo: PlacementGeo): Fix[] {
  const next = addReading(readings, r, sessionStartMs);
  if (next.length === readings.length || readings.length === 0) return next;
  const avg = averaged(readings, geo);
  if (avg && r.accuracyM !== null && geo.distanceM(avg, r) > movedBeyondM(avg.accuracyM, r.accuracyM)) return [r];
  return next;
}

export function averaged(readings: readonly Fix[], geo: PlacementGeo): AveragedFix | null {
  const usable = readings.filter((r): r is Fix & { accuracyM: number } => r.accuracyM !== null);
  if (usable.length === 0) return null;
  const a = geo.average(usable.map((r) => ({ lat: r.lat, lon: r.lon, accuracyM: r.accuracyM })));
  return { ...a, count: usable.length };
}

/** Error budget of a point placed by distance and bearing (common practice: hand compass ±5°, paced or taped distance ±5 %). */
export const BEARING_ERROR_DEG = 5;
export const DISTANCE_ERROR_FRACTION = 0.05;

export function offsetAccuracyM(fromAccuracyM: number, distanceM: number): number {
  const across = distanceM * Math.tan((BEARING_ERROR_DEG * Math.PI) / 180);
  const along = distanceM * DISTANCE_ERROR_FRACTION;
  return Math.sqrt(fromAccuracyM ** 2 + across ** 2 + along ** 2);
}

export type OffsetInput = { distanceText: string; bearingText: string };
export type OffsetResult =
  | { ok: true; at: LatLon; accuracyM: number; distanceM: number; bearingDeg: number }
  | { ok: false; errors: { distance?: string; bearing?: string; from?: string } };

/** Farther than this, a paced distance and a compass bearing are guesses (common practice). */
export const MAX_OFFSET_M = 300;

export function placeByOffset(from: AveragedFix | null, input: OffsetInput, toM: (v: number) => number, geo: PlacementGeo): OffsetResult {
  const errors: { distance?: string; bearing?: string; from?: string } = {};
  const d = parseDecimal(input.distanceText);
  const b = parseDecimal(input.bearingText);
  const distanceM = d === null ? null : toM(d);
  if (distanceM === null) errors.distance = 'Type the distance from where you stand, for example 25';
  else if (distanceM <= 0) errors.distance = 'The distance must be above 0';
  else if (distanceM > MAX_OFFSET_M) errors.distance = `Farther than ${MAX_OFFSET_M} m a paced distance is a guess: walk closer and measure again`;
  if (b === null) errors.bearing = 'Type the bearing in degrees from north, 0 to 360';
  else if (b < 0 || b > 360) errors.bearing = 'A bearing is between 0 and 360 degrees';
  if (!from) errors.from = 'Waiting for a GPS fix of where you stand';
  if (Object.keys(errors).length > 0 || !from || distanceM === null || b === null) return { ok: false, errors };
  const bearingDeg = b % 360;
  const at = geo.destination({ lat: from.lat, lon: from.lon }, distanceM, bearingDeg);
  return { ok: true, at, accuracyM: offsetAccuracyM(from.accuracyM, distanceM), distanceM, bearingDeg };
}

/** The `measurements` record of a placement: raw inputs kept so it can be recomputed and audited. */
export function fixMeasurementInputs(fix: AveragedFix, readings: readonly Fix[]): Record<string, number | string> {
  const times = readings.map((r) => r.atMs);
  return {
    lat: fix.lat, lon: fix.lon, readings: fix.count,
    bestReadingM: Math.min(...readings.map((r) => r.accuracyM ?? Infinity)),
    worstReadingM: Math.max(...readings.map((r) => r.accuracyM ?? 0)),
    spanS: times.length ? Math.round((Math.max(...times) - Math.min(...times)) / 100) / 10 : 0,
  };
}

export function offsetMeasurementInputs(from: AveragedFix, r: Extract<OffsetResult, { ok: true }>): Record<string, number | string> {
  return { fromLat: from.lat, fromLon: from.lon, fromAccuracyM: from.accuracyM, fromReadings: from.count, distanceM: r.distanceM, bearingDeg: r.bearingDeg, lat: r.at.lat, lon: r.at.lon };
}
