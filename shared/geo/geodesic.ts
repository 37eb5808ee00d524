import { Geodesic } from 'geographiclib-geodesic';

/*
 * Distances and bearings on the WGS84 ellipsoid through GeographicLib (C. F. F. Karney, "Algorithms for
 * geodesics", J. Geodesy 87, 2013), accurate to nanometres: no spherical approximation anywhere.
 * Bearings are degrees clockwise from true north, 0 ≤ b < 360.
 */

export type LatLon = { lat: number; lon: number };

const WGS84 = Geodesic.WGS84;

export function checkLatLon(p: LatLon, what = 'point'): void {
  if (!p || !Number.isFinite(p.lat) || !Number.isFinite(p.lon) || Math.abs(p.lat) > 90 || Math.abs(p.lon) > 180) {
    throw new Error(`${what} needs a latitude in −90…90 and a longitude in −180…180 (got ${p ? `${p.lat}, ${p.lon}` : p})`);
  }
}

export function normalizeBearingDeg(deg: number): number {
  const b = deg % 360;
  return b < 0 ? b + 360 : b;
}

/** Geodesic distance and the initial and final bearings from a to b. */
export function distanceBearing(a: LatLon, b: LatLon): { distanceM: number; bearingDeg: number; finalBearingDeg: number } {
  checkLatLon(a, 'from');
  checkLatLon(b, 'to');
  const r = WGS84.Inverse(a.lat, a.lon, b.lat, b.lon);
  return { distanceM: r.s12 ?? 0, bearingDeg: normalizeBearingDeg(r.azi1 ?? 0), finalBearingDeg: normalizeBearingDeg(r.azi2 ?? 0) };
}

/** The point distanceM away from `from` along initial bearing bearingDeg (e.g. a tree the scout ranged). */
export function destination(from: LatLon, distanceM: number, bearingDeg: number): LatLon {
  checkLatLon(from, 'from');
  if (!Number.isFinite(distanceM) || distanceM < 0) throw new Error(`distance must be ≥ 0 m (got ${distanceM})`);
  if (!Number.isFinite(bearingDeg)) throw new Error(`bearing must be a number of degrees (got ${bearingDeg})`);
  const r = WGS84.Direct(from.lat, from.lon, bearingDeg, distanceM);
  return { lat: r.lat2 ?? from.lat, lon: r.lon2 ?? from.lon };
}
