import { checkLatLon, destination, distanceBearing, type LatLon } from './geodesic';

/*
 * Local east/north metres around a site's reference point. The frame is the azimuthal equidistant
 * projection centred on the reference: a point's distance and bearing from the reference are the geodesic
 * ones, so east = s·sin(α), north = s·cos(α) and the way back is the geodesic direct problem. Distances
 * from the reference are exact; between two other points across a field-day site (< a few km) the frame's
 * distortion is far below GPS error.
 */

export type EastNorth = { eastM: number; northM: number };

export function toLocalEastNorth(ref: LatLon, p: LatLon): EastNorth {
  checkLatLon(ref, 'reference point');
  checkLatLon(p, 'point');
  const { distanceM, bearingDeg } = distanceBearing(ref, p);
  const a = (bearingDeg * Math.PI) / 180;
  return { eastM: distanceM * Math.sin(a), northM: distanceM * Math.cos(a) };
}

export function fromLocalEastNorth(ref: LatLon, p: EastNorth): LatLon {
  checkLatLon(ref, 'reference point');
  if (!p || !Number.isFinite(p.eastM) || !Number.isFinite(p.northM)) throw new Error('east/north must be numbers of metres');
  const s = Math.hypot(p.eastM, p.northM);
  if (s === 0) return { lat: ref.lat, lon: ref.lon };
  return destination(ref, s, (Math.atan2(p.eastM, p.northM) * 180) / Math.PI);
}
