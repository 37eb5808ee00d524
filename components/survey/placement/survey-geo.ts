import { averageFixes, destination, distanceBearing, toLocalEastNorth } from '../../../shared/geo';
import type { LatLon } from '../../../shared/schemas';
import type { Projection } from '../plan/plan-features';
import type { PlacementGeo } from './placement-logic';

/** The survey's doorway to shared/geo: fix averaging, points by distance and bearing, the plan's local frame. */
export const surveyGeo: PlacementGeo = {
  average(fixes) {
    const a = averageFixes(fixes);
    return { lat: a.lat, lon: a.lon, accuracyM: a.uncertaintyM };
  },
  destination: (from, distanceM, bearingDeg) => destination(from, distanceM, bearingDeg),
  distanceM: (a, b) => distanceBearing(a, b).distanceM,
};

/** East/north metres around the site's reference point (azimuthal equidistant, shared/geo). */
export function projector(ref: LatLon): Projection {
  return (lat, lon) => toLocalEastNorth(ref, { lat, lon });
}
