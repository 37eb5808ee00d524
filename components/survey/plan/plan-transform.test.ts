import { describe, expect, it } from 'vitest';
import {
  MAX_PX_PER_M, boundsOf, distanceToSegmentPx, fitToContent, panBy, pinchStep, screenToWorld, wheelZoomFactor, worldToScreen, zoomAbout,
} from './plan-transform';

const size = { widthPx: 390, heightPx: 500 };

describe('plan transform (east/north metres ↔ screen pixels, north up)', () => {
  it('puts north up and east right: a point 10 m north-east of the centre lands up and to the right', () => {
    const view = { centreEastM: 0, centreNorthM: 0, pxPerM: 2 };
    expect(worldToScreen(view, size, { eastM: 10, northM: 10 })).toEqual({ x: 215, y: 230 });
  });

  it('screenToWorld inverts worldToScreen for any view', () => {
    const view = { centreEastM: -123.4, centreNorthM: 56.7, pxPerM: 3.7 };
    for (const p of [{ eastM: 0, northM: 0 }, { eastM: 250, northM: -80 }, { eastM: -1e4, northM: 3e3 }]) {
      const back = screenToWorld(view, size, worldToScreen(view, size, p));
      expect(back.eastM).toBeCloseTo(p.eastM, 9);
      expect(back.northM).toBeCloseTo(p.northM, 9);
    }
  });

  it('fitToContent shows every point inside the padding', () => {
    const pts = [{ eastM: -200, northM: 40 }, { eastM: 120, northM: -90 }, { eastM: 30, northM: 160 }];
    const view = fitToContent(boundsOf(pts), size, 24);
    for (const p of pts) {
      const s = worldToScreen(view, size, p);
      expect(s.x).toBeGreaterThanOrEqual(24 - 1e-9);
      expect(s.x).toBeLessThanOrEqual(size.widthPx - 24 + 1e-9);
      expect(s.y).toBeGreaterThanOrEqual(24 - 1e-9);
      expect(s.y).toBeLessThanOrEqual(size.heightPx - 24 + 1e-9);
    }
    // The limiting axis (east, 320 m over 342 px) touches the padding exactly.
    expect(view.pxPerM).toBeCloseTo(342 / 320, 9);
  });

  it('fitToContent shows a lone point with at least the minimum span around it, and an empty site around the reference point', () => {
    const one = fitToContent(boundsOf([{ eastM: 5, northM: 5 }]), size, 0, 60);
    expect(one.centreEastM).toBe(5);
    expect(one.pxPerM).toBeCloseTo(390 / 60, 9);
    const none = fitToContent(boundsOf([]), size);
    expect(none.centreEastM).toBe(0);
    expect(none.centreNorthM).toBe(0);
  });

  it('zoomAbout keeps the world point under the anchor fixed', () => {
    const view = { centreEastM: 10, centreNorthM: -20, pxPerM: 1.5 };
    const anchor = { x: 300, y: 80 };
    const before = screenToWorld(view, size, anchor);
    const zoomed = zoomAbout(view, size, anchor, 2.5);
    expect(zoomed.pxPerM).toBeCloseTo(3.75, 12);
    const after = screenToWorld(zoomed, size, anchor);
    expect(after.eastM).toBeCloseTo(before.eastM, 9);
    expect(after.northM).toBeCloseTo(before.northM, 9);
  });

  it('zoom stops at the limits instead of running away', () => {
    const view = { centreEastM: 0, centreNorthM: 0, pxPerM: 100 };
    expect(zoomAbout(view, size, { x: 0, y: 0 }, 100).pxPerM).toBe(MAX_PX_PER_M);
  });

  it('panBy makes the world follow the finger', () => {
    const view = { centreEastM: 0, centreNorthM: 0, pxPerM: 2 };
    const p = { eastM: 7, northM: 3 };
    const s0 = worldToScreen(view, size, p);
    const s1 = worldToScreen(panBy(view, 40, -10), size, p);
    expect(s1.x - s0.x).toBeCloseTo(40, 9);
    expect(s1.y - s0.y).toBeCloseTo(-10, 9);
  });

  it('a pinch that spreads the fingers twice as far doubles the scale', () => {
    const view = { centreEastM: 0, centreNorthM: 0, pxPerM: 1 };
    const next = pinchStep(view, size, { distancePx: 100, centre: { x: 195, y: 250 } }, { distancePx: 200, centre: { x: 195, y: 250 } });
    expect(next.pxPerM).toBeCloseTo(2, 12);
    expect(next.centreEastM).toBeCloseTo(0, 12);
  });

  it('wheel up zooms in, wheel down zooms out, by the same ratio', () => {
    expect(wheelZoomFactor(-100)).toBeGreaterThan(1);
    expect(wheelZoomFactor(100)).toBeLessThan(1);
    expect(wheelZoomFactor(-100) * wheelZoomFactor(100)).toBeCloseTo(1, 12);
  });

  it('distance to a segment is perpendicular inside it and to the nearer end outside it', () => {
    expect(distanceToSegmentPx({ x: 5, y: 3 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toBeCloseTo(3, 12);
    expect(distanceToSegmentPx({ x: 13, y: 4 }, { x: 0, y: 0 }, { x: 10, y: 0 })).toBeCloseTo(5, 12);
  });
});
