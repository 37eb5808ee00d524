/*
 * shared/geo — positions on the site (WGS84 through geographiclib-geodesic).
 *   distanceBearing(a, b) → { distanceM, bearingDeg, finalBearingDeg }   (degrees clockwise from true north)
 *   destination(from, distanceM, bearingDeg) → { lat, lon }              (a point placed from where the scout stands)
 *   placeFromObserver = destination
 *   toLocalEastNorth(ref, p) → { eastM, northM };  fromLocalEastNorth(ref, { eastM, northM }) → { lat, lon }
 *   averageFixes([{ lat, lon, accuracyM }]) → { lat, lon, uncertaintyM, count }
 */
export { distanceBearing, destination, destination as placeFromObserver, normalizeBearingDeg } from './geodesic';
export type { LatLon } from './geodesic';
export { toLocalEastNorth, fromLocalEastNorth } from './local-frame';
export type { EastNorth } from './local-frame';
export { averageFixes } from './fix-average';
export type { Fix } from './fix-average';
