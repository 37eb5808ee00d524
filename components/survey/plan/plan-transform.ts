/*
 * The site plan's drawing transform: the world is east/north metres around the site's reference point
 * (north up, as on a paper site sketch), the screen is pixels with y growing downwards. Everything here is
 * pure so the pan, zoom and fit behaviour can be tested without a renderer.
 */

export type WorldPoint = { eastM: number; northM: number };
export type ScreenPoint = { x: number; y: number };
export type PlanSize = { widthPx: number; heightPx: number };

/** What the plan shows: the world point at the centre of the drawing and the scale. */
export type PlanView = { centreEastM: number; centreNorthM: number; pxPerM: number };

export type WorldBounds = { minEastM: number; maxEastM: number; minNorthM: number; maxNorthM: number };

/** Zoom limits: 1 px per 20 m shows a 7 km wide field day on a phone; 200 px/m shows a trunk's width. */
export const MIN_PX_PER_M = 0.05;
export const MAX_PX_PER_M = 200;

export function clampScale(pxPerM: number): number {
  if (!Number.isFinite(pxPerM) || pxPerM <= 0) return MIN_PX_PER_M;
  return Math.min(MAX_PX_PER_M, Math.max(MIN_PX_PER_M, pxPerM));
}

export function worldToScreen(view: PlanView, size: PlanSize, p: WorldPoint): ScreenPoint {
  return {
    x: size.widthPx / 2 + (p.eastM - view.centreEastM) * view.pxPerM,
    y: size.heightPx / 2 - (p.northM - view.centreNorthM) * view.pxPerM,
  };
}

export function screenToWorld(view: PlanView, size: PlanSize, s: ScreenPoint): WorldPoint {
  return {
    eastM: view.centreEastM + (s.x - size.widthPx / 2) / view.pxPerM,
    northM: view.centreNorthM - (s.y - size.heightPx / 2) / view.pxPerM,
  };
}

/** Bounds of a set of points, or null when there are none. */
export function boundsOf(points: readonly WorldPoint[]): WorldBounds | null {
  if (points.length === 0) return null;
  let minE = Infinity, maxE = -Infinity, minN = Infinity, maxN = -Infinity;
  for (const p of points) {
    if (!Number.isFinite(p.eastM) || !Number.isFinite(p.northM)) continue;
    minE = Math.min(minE, p.eastM); maxE = Math.max(maxE, p.eastM);
    minN = Math.min(minN, p.northM); maxN = Math.max(maxN, p.northM);
  }
  if (minE === Infinity) return null;
  return { minEastM: minE, maxEastM: maxE, minNorthM: minN, maxNorthM: maxN };
}

/**
 * The view that shows all of `bounds` inside the drawing with `paddingPx` free on every side.
 * A single point or a tiny cluster is shown at least `minSpanM` across, so one tree does not fill the screen.
 */
export function fitToContent(bounds: WorldBounds | null, size: PlanSize, paddingPx = 32, minSpanM = 60): PlanView {
  const b = bounds ?? { minEastM: 0, maxEastM: 0, minNorthM: 0, maxNorthM: 0 };
  const spanE = Math.max(b.maxEastM - b.minEastM, minSpanM);
  const spanN = Math.max(b.maxNorthM - b.minNorthM, minSpanM);
  const usableW = Math.max(size.widthPx - 2 * paddingPx, 1);
  const usableH = Math.max(size.heightPx - 2 * paddingPx, 1);
  return {
    centreEastM: (b.minEastM + b.maxEastM) / 2,
    centreNorthM: (b.minNorthM + b.maxNorthM) / 2,
    pxPerM: clampScale(Math.min(usableW / spanE, usableH / spanN)),
  };
}

/** Zoom by `factor` keeping the world point under `anchor` (the pinch centre or the mouse) where it is. */
export function zoomAbout(view: PlanView, size: PlanSize, anchor: ScreenPoint, factor: number): PlanView {
  const pxPerM = clampScale(view.pxPerM * factor);
  const under = screenToWorld(view, size, anchor);
  // Solve worldToScreen(newView, under) === anchor for the new centre.
  return {
    pxPerM,
    centreEastM: under.eastM - (anchor.x - size.widthPx / 2) / pxPerM,
    centreNorthM: under.northM + (anchor.y - size.heightPx / 2) / pxPerM,
  };
}

/** Move the drawing by a drag of (dx, dy) screen pixels: the world follows the finger. */
export function panBy(view: PlanView, dxPx: number, dyPx: number): PlanView {
  return { ...view, centreEastM: view.centreEastM - dxPx / view.pxPerM, centreNorthM: view.centreNorthM + dyPx / view.pxPerM };
}

/** Mouse-wheel steps to a zoom factor: one notch (deltaY ≈ 100) zooms by about 1.2×, smooth for trackpads. */
export function wheelZoomFactor(deltaY: number): number {
  const clamped = Math.max(-500, Math.min(500, deltaY));
  return Math.exp(-clamped * 0.0018);
}

export type PinchState = { distancePx: number; centre: ScreenPoint };

/** One pinch step: the scale follows the finger spread and the centre follows the fingers' midpoint. */
export function pinchStep(view: PlanView, size: PlanSize, from: PinchState, to: PinchState): PlanView {
  if (from.distancePx <= 0 || to.distancePx <= 0) return view;
  const zoomed = zoomAbout(view, size, from.centre, to.distancePx / from.distancePx);
  return panBy(zoomed, to.centre.x - from.centre.x, to.centre.y - from.centre.y);
}

/** Distance from a screen point to a segment, px: how a tap finds the line it landed on. */
export function distanceToSegmentPx(p: ScreenPoint, a: ScreenPoint, b: ScreenPoint): number {
  const dx = b.x - a.x, dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}
