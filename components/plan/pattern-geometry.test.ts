import { describe, expect, test } from 'vitest';
import { azimuthPath, compassPoint, elevationPoint, elevationWedge, radiusFraction, swrPoint } from './pattern-geometry';

describe('pattern picture geometry', () => {
  test('dB-polar scale: the peak reaches the rim, 30 dB below sits at the centre, 15 dB below halfway (linear-in-dB polar plot, common practice)', () => {
    expect(radiusFraction(7, 7)).toBe(1);
    expect(radiusFraction(-23, 7)).toBe(0);
    expect(radiusFraction(-99, 7)).toBe(0);
    expect(radiusFraction(-8, 7)).toBeCloseTo(0.5, 12);
    expect(radiusFraction(Number.NEGATIVE_INFINITY, 7)).toBe(0);
  });

  test('elevation picture: 0° is the right horizon, 90° is straight up (screen y grows downward)', () => {
    const h = elevationPoint(0, 1, 100, 100, 50);
    expect(h.x).toBeCloseTo(150, 9);
    expect(h.y).toBeCloseTo(100, 9);
    const z = elevationPoint(90, 1, 100, 100, 50);
    expect(z.x).toBeCloseTo(100, 9);
    expect(z.y).toBeCloseTo(50, 9);
    expect(elevationWedge(10, 30, 100, 100, 50)).toMatch(/^M100 100 L149\.2 91\.3 A50 50 0 0 0 143\.3 75\.0 Z$/);
  });

  test('compass picture: north is up, east is right; a wire running 90° (east–west) puts model azimuth 90° (broadside) to the south', () => {
    const n = compassPoint(0, 1, 0, 0, 10);
    expect(n.x).toBeCloseTo(0, 9);
    expect(n.y).toBeCloseTo(-10, 9);
    const e = compassPoint(90, 1, 0, 0, 10);
    expect(e.x).toBeCloseTo(10, 9);
    const d = azimuthPath([{ azimuthDeg: 90, gainDbi: 2 }], 2, 90, 0, 0, 10);
    expect(d).toBe('M0.0 10.0 Z');
  });

  test('SWR chart: 1:1 on the bottom edge, the clamp at the top, band edges at the box sides', () => {
    const box = { x: 10, y: 20, width: 200, height: 100 };
    expect(swrPoint(7.0, 1, 7.0, 7.3, 3, box)).toEqual({ x: 10, y: 120 });
    expect(swrPoint(7.3, 9, 7.0, 7.3, 3, box)).toEqual({ x: 210, y: 20 });
    expect(swrPoint(7.15, 2, 7.0, 7.3, 3, box).y).toBeCloseTo(70, 9);
  });
});
