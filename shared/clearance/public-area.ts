import { SAFETY_CAUTION } from './cautions';
import { pointShapeDistanceM } from './planar';
import { type AntennaFootprint, type Clearance, type FootprintSupport, type RecordedHazard, fmtM } from './types';

export const PUBLIC_AREA_KINDS = ['path', 'road', 'parking'] as const;
export const GUY_RADIUS_FRACTION = 0.5;
export const PUBLIC_AREA_SOURCE =
  'common practice: guy anchors at least half the mast height out; keep the public out of the fall zone';

/**
 * The zone to rope off around one support: a mast can fall its full height and its guys reach half of it
 * (common practice); from any support the wire and ropes can swing down as far as swingReachM.
 * A tree or a building is not assumed to fall because an antenna hangs from it.
 */
export function ropeOffRadiusM(s: FootprintSupport, swingReachM: number): number {
  if (s.kind === 'mast') return Math.max(s.heightM, swingReachM); // the guys (half the height) lie inside the fall zone
  return swingReachM;
}

function isPublic(kind: RecordedHazard['kind']): boolean {
  return (PUBLIC_AREA_KINDS as readonly string[]).includes(kind);
}

/**
 * Paths, roads and parking inside a fall zone or guy radius: never blocked (the zone can be roped off),
 * always reviewed, with the distance to rope off. Buildings inside a fall zone are reviewed as property.
 */
function worstSupport(fp: AntennaFootprint, h: RecordedHazard) {
  let worst: { s: FootprintSupport; distanceM: number; radiusM: number } | null = null;
  for (const s of fp.supports) {
    const distanceM = pointShapeDistanceM(s.at, h.shape);
    const radiusM = ropeOffRadiusM(s, fp.swingReachM);
    if (!worst || distanceM - radiusM < worst.distanceM - worst.radiusM) worst = { s, distanceM, radiusM };
  }
  return worst;
}

/** How many public areas and buildings lie inside a fall zone (each one a needs-review result). */
export function countFallZoneOverlaps(fp: AntennaFootprint, hazards: readonly RecordedHazard[]): number {
  let n = 0;
  for (const h of hazards) {
    if (!isPublic(h.kind) && h.kind !== 'building') continue;
    const w = worstSupport(fp, h);
    if (w && w.distanceM < w.radiusM) n++;
  }
  return n;
}

export function publicAreaClearances(fp: AntennaFootprint, hazards: readonly RecordedHazard[]): Clearance[] {
  const out: Clearance[] = [];
  for (const h of hazards) {
    const pub = isPublic(h.kind);
    if (!pub && h.kind !== 'building') continue;
    const worst = worstSupport(fp, h);
    if (!worst) continue;
    const inside = worst.distanceM < worst.radiusM;
    const what = pub ? `${h.kind} ${h.id}` : `building ${h.id}`;
    const guyText =
      worst.s.kind === 'mast' ? `; guy anchors at least ${fmtM(worst.s.heightM * GUY_RADIUS_FRACTION)} out` : '';
    // Only a mast is assumed to fall over; around a tree or structure the zone is where the wire, insulators
    // and ropes can come down, and the message says so rather than calling it the support's fall zone.
    const zone = worst.s.kind === 'mast' ? 'fall zone' : 'zone where the wire and ropes can come down';
    out.push({
      key: `${pub ? 'public-area' : 'property'}:${h.id}`,
      kind: pub ? 'public-area' : 'property',
      level: inside ? 'needs-review' : 'clear',
      distanceM: worst.distanceM,
      requiredM: worst.radiusM,
      rule: pub
        ? 'fall zone and guy radius must not overlap a path, road or parking unless roped off'
        : 'a fall zone over a building needs the owner’s agreement',
      source: PUBLIC_AREA_SOURCE,
      message: inside
        ? `${what} is ${fmtM(worst.distanceM)} from ${worst.s.kind} ${worst.s.supportId}, inside its ${zone}: ` +
          `rope off ${fmtM(worst.radiusM)} around it${guyText}.`
        : `${what} is ${fmtM(worst.distanceM)} from ${worst.s.kind} ${worst.s.supportId}, outside its ${fmtM(worst.radiusM)} ${zone}${guyText}.`,
      caution: SAFETY_CAUTION,
    });
  }
  return out;
}
