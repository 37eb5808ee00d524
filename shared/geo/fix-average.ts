import { checkLatLon, type LatLon } from './geodesic';
import { fromLocalEastNorth, toLocalEastNorth } from './local-frame';

/*
 * Several GPS fixes of one spot, each with the receiver's reported horizontal accuracy (taken as a 1-σ radius),
 * combined by inverse-variance weighting in a local east/north frame around the first fix:
 *   x̂ = Σ wᵢxᵢ / Σ wᵢ, wᵢ = 1/σᵢ²;  σ̂ = 1/√Σwᵢ   (standard weighted mean of independent measurements).
 * Fixes taken seconds apart are not independent (receivers smooth their output), so the uncertainty also
 * never drops below the scatter of the fixes about the mean, nor below the best single fix / 2 (common practice).
 */

export type Fix = LatLon & { accuracyM: number };

export function averageFixes(fixes: readonly Fix[]): LatLon & { uncertaintyM: number; count: number } {
  if (!Array.isArray(fixes) || fixes.length === 0) throw new Error('at least one GPS fix is needed');
  for (const f of fixes) {
    checkLatLon(f, 'GPS fix');
    if (!Number.isFinite(f.accuracyM) || f.accuracyM <= 0) throw new Error(`GPS fix accuracy must be above 0 m (got ${f.accuracyM})`);
  }
  const ref = fixes[0];
  let sw = 0, se = 0, sn = 0;
  const pts = fixes.map((f) => ({ ...toLocalEastNorth(ref, f), w: 1 / (f.accuracyM * f.accuracyM) }));
  for (const p of pts) {
    sw += p.w;
    se += p.w * p.eastM;
    sn += p.w * p.northM;
  }
  const e = se / sw, n = sn / sw;
  let scatter = 0;
  for (const p of pts) scatter += (p.w / sw) * ((p.eastM - e) ** 2 + (p.northM - n) ** 2);
  const best = Math.min(...fixes.map((f) => f.accuracyM));
  const uncertaintyM = Math.max(1 / Math.sqrt(sw), Math.sqrt(scatter), best / 2);
  const at = fromLocalEastNorth(ref, { eastM: e, northM: n });
  return { lat: at.lat, lon: at.lon, uncertaintyM, count: fixes.length };
}
