/*
 * Plane geometry in the site's local east/north metres (small parks: a flat projection around the
 * site reference is accurate to centimetres over a few kilometres). All distances are horizontal.
 */
export type PlanePoint = { eastM: number; northM: number };

export function planeDistanceM(a: PlanePoint, b: PlanePoint): number {
  return Math.hypot(a.eastM - b.eastM, a.northM - b.northM);
}

/** Distance from p to the segment a–b. */
export function pointSegmentDistanceM(p: PlanePoint, a: PlanePoint, b: PlanePoint): number {
  const dx = b.eastM - a.eastM;
  const dy = b.northM - a.northM;
  const len2 = dx * dx + dy * dy;
  let t = len2 === 0 ? 0 : ((p.eastM - a.eastM) * dx + (p.northM - a.northM) * dy) / len2;
  t = Math.max(0, Math.min(1, t));
  return Math.hypot(p.eastM - (a.eastM + t * dx), p.northM - (a.northM + t * dy));
}

function cross(o: PlanePoint, a: PlanePoint, b: PlanePoint): number {
  return (a.eastM - o.eastM) * (b.northM - o.northM) - (a.northM - o.northM) * (b.eastM - o.eastM);
}

function segmentsCross(a: PlanePoint, b: PlanePoint, c: PlanePoint, d: PlanePoint): boolean {
  const d1 = cross(c, d, a);
  const d2 = cross(c, d, b);
  const d3 = cross(a, b, c);
  const d4 = cross(a, b, d);
  return ((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0));
}

/** Distance between segments a–b and c–d (0 when they cross). */
export function segmentSegmentDistanceM(a: PlanePoint, b: PlanePoint, c: PlanePoint, d: PlanePoint): number {
  if (segmentsCross(a, b, c, d)) return 0;
  return Math.min(
    pointSegmentDistanceM(a, c, d),
    pointSegmentDistanceM(b, c, d),
    pointSegmentDistanceM(c, a, b),
    pointSegmentDistanceM(d, a, b),
  );
}

/** Even-odd rule: is p inside the closed outline? */
export function insidePolygon(p: PlanePoint, ring: readonly PlanePoint[]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const a = ring[i];
    const b = ring[j];
    if (a.northM > p.northM !== b.northM > p.northM) {
      const x = a.eastM + ((p.northM - a.northM) * (b.eastM - a.eastM)) / (b.northM - a.northM);
      if (p.eastM < x) inside = !inside;
    }
  }
  return inside;
}

/** A recorded hazard in plane coordinates: a line, a single spot, or (closed) an outline. */
export type PlaneShape = { points: readonly PlanePoint[]; closed: boolean };

/** Distance from p to the shape (0 inside a closed outline). */
export function pointShapeDistanceM(p: PlanePoint, shape: PlaneShape): number {
  const pts = shape.points;
  if (pts.length === 1) return planeDistanceM(p, pts[0]);
  if (shape.closed && pts.length >= 3 && insidePolygon(p, pts)) return 0;
  let best = Infinity;
  const n = shape.closed ? pts.length : pts.length - 1;
  for (let i = 0; i < n; i++) best = Math.min(best, pointSegmentDistanceM(p, pts[i], pts[(i + 1) % pts.length]));
  return best;
}

/** Distance from the segment a–b to the shape (0 when they touch or the segment is inside). */
export function segmentShapeDistanceM(a: PlanePoint, b: PlanePoint, shape: PlaneShape): number {
  const pts = shape.points;
  if (pts.length === 1) return pointSegmentDistanceM(pts[0], a, b);
  if (shape.closed && pts.length >= 3 && insidePolygon(a, pts)) return 0;
  let best = Infinity;
  const n = shape.closed ? pts.length : pts.length - 1;
  for (let i = 0; i < n; i++) best = Math.min(best, segmentSegmentDistanceM(a, b, pts[i], pts[(i + 1) % pts.length]));
  return best;
}

/** Compass bearing (degrees clockwise from north) from a to b. */
export function planeBearingDeg(a: PlanePoint, b: PlanePoint): number {
  const deg = (Math.atan2(b.eastM - a.eastM, b.northM - a.northM) * 180) / Math.PI;
  return (deg + 360) % 360;
}

function closestOnSegment(p: PlanePoint, a: PlanePoint, b: PlanePoint): PlanePoint {
  const dx = b.eastM - a.eastM;
  const dy = b.northM - a.northM;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.eastM - a.eastM) * dx + (p.northM - a.northM) * dy) / len2));
  return { eastM: a.eastM + t * dx, northM: a.northM + t * dy };
}

/** The point of the shape nearest to p (p itself when inside a closed outline). */
export function closestPointOnShape(p: PlanePoint, shape: PlaneShape): PlanePoint {
  const pts = shape.points;
  if (pts.length === 1) return pts[0];
  if (shape.closed && pts.length >= 3 && insidePolygon(p, pts)) return p;
  let best = pts[0];
  let bestD = Infinity;
  const n = shape.closed ? pts.length : pts.length - 1;
  for (let i = 0; i < n; i++) {
    const q = closestOnSegment(p, pts[i], pts[(i + 1) % pts.length]);
    const d = planeDistanceM(p, q);
    if (d < bestD) {
      bestD = d;
      best = q;
    }
  }
  return best;
}
