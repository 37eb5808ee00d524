import type { Hazard, OperatingPosition, Support } from '../../../shared/schemas';
import { distanceToSegmentPx, worldToScreen, type PlanSize, type PlanView, type ScreenPoint, type WorldPoint } from './plan-transform';

/*
 * What the site plan draws, already in east/north metres around the site's reference point. The
 * projection from lat/lon is passed in (shared/geo does it), so this file stays a pure view-model.
 */

export type Projection = (lat: number, lon: number) => WorldPoint;

export type SupportFeature = { type: 'support'; id: string; kind: Support['kind']; label: string; at: WorldPoint; accuracyM: number | null; heightM: number | null };
export type HazardFeature = { type: 'hazard'; id: string; kind: Hazard['kind']; label: string; points: WorldPoint[]; isArea: boolean; voltageClass: Hazard['voltageClass'] };
export type PositionFeature = { type: 'position'; id: string; label: string; at: WorldPoint };
export type PlanFeature = SupportFeature | HazardFeature | PositionFeature;
export type FeatureRef = { collection: 'supports' | 'hazards' | 'operatingPositions'; id: string };

export type SurveyRecords = { supports: readonly Support[]; hazards: readonly Hazard[]; operatingPositions: readonly OperatingPosition[] };

export function buildFeatures(records: SurveyRecords, project: Projection): PlanFeature[] {
  const live = <T extends { deletedAt: string | null }>(xs: readonly T[]) => xs.filter((x) => !x.deletedAt);
  const hazards: HazardFeature[] = live(records.hazards).map((h) => ({
    type: 'hazard', id: h.id, kind: h.kind, label: h.label, isArea: h.isArea, voltageClass: h.voltageClass,
    points: h.points.map((p) => project(p.lat, p.lon)),
  }));
  // Areas first (underneath), then lines, power lines last so nothing hides them.
  const order = (h: HazardFeature) => (h.isArea ? 0 : h.kind === 'power-line' ? 2 : 1);
  hazards.sort((a, b) => order(a) - order(b));
  const positions: PositionFeature[] = live(records.operatingPositions).map((o) => ({ type: 'position', id: o.id, label: o.label, at: project(o.lat, o.lon) }));
  const supports: SupportFeature[] = live(records.supports).map((s) => ({
    type: 'support', id: s.id, kind: s.kind, label: s.label, at: project(s.lat, s.lon), accuracyM: s.positionAccuracyM, heightM: s.heightM,
  }));
  return [...hazards, ...positions, ...supports];
}

export function featureRef(f: PlanFeature): FeatureRef {
  return { collection: f.type === 'support' ? 'supports' : f.type === 'hazard' ? 'hazards' : 'operatingPositions', id: f.id };
}

export function featurePoints(features: readonly PlanFeature[]): WorldPoint[] {
  return features.flatMap((f) => (f.type === 'hazard' ? f.points : [f.at]));
}

/**
 * The feature a tap at `tap` means: the nearest point symbol or line within `tolerancePx` (a thumb is
 * about 48 px wide), point symbols winning over lines they sit on, or an area the tap falls inside.
 */
export function hitTest(features: readonly PlanFeature[], view: PlanView, size: PlanSize, tap: ScreenPoint, tolerancePx = 24): PlanFeature | null {
  let best: { f: PlanFeature; d: number } | null = null;
  const consider = (f: PlanFeature, d: number) => {
    if (d <= tolerancePx && (!best || d < best.d)) best = { f, d };
  };
  for (const f of features) {
    if (f.type === 'hazard') continue;
    const s = worldToScreen(view, size, f.at);
    consider(f, Math.hypot(s.x - tap.x, s.y - tap.y) - 8);
  }
  if (best) return (best as { f: PlanFeature }).f;
  for (const f of features) {
    if (f.type !== 'hazard') continue;
    const pts = f.points.map((p) => worldToScreen(view, size, p));
    if (pts.length === 1) consider(f, Math.hypot(pts[0].x - tap.x, pts[0].y - tap.y));
    const n = f.isArea ? pts.length : pts.length - 1;
    for (let i = 0; i < n; i++) consider(f, distanceToSegmentPx(tap, pts[i], pts[(i + 1) % pts.length]));
    if (f.isArea && pts.length >= 3 && insidePolygon(tap, pts)) consider(f, tolerancePx);
  }
  return best ? (best as { f: PlanFeature }).f : null;
}

/** Even-odd ray casting. */
export function insidePolygon(p: ScreenPoint, poly: readonly ScreenPoint[]): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i], b = poly[j];
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}
