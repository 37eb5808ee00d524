import { describe, expect, it } from 'vitest';
import { elevationFromBetaDeg, steadyAngle } from './tilt-angle';

describe('phone clinometer (W3C DeviceOrientation frame: elevation of the top edge = asin(sin β))', () => {
  it('flat phone reads 0°, top edge tilted up 35° reads 35°, pointing down reads negative', () => {
    expect(elevationFromBetaDeg(0)).toBeCloseTo(0, 12);
    expect(elevationFromBetaDeg(35)).toBeCloseTo(35, 12);
    expect(elevationFromBetaDeg(-12)).toBeCloseTo(-12, 12);
  });
  it('a phone held face down (β past 90°) still gives the top edge’s true elevation', () => {
    expect(elevationFromBetaDeg(150)).toBeCloseTo(30, 9);
    expect(elevationFromBetaDeg(-170)).toBeCloseTo(-10, 9);
    expect(elevationFromBetaDeg(90)).toBeCloseTo(90, 9);
  });
  it('a steady hand gives a steady mean; a shaking one is not offered', () => {
    const steady = [40.1, 40.3, 39.9, 40.0, 40.2].map((e, i) => ({ elevationDeg: e, atMs: 1000 + i * 100 }));
    const s = steadyAngle(steady, 1450);
    expect(s?.steady).toBe(true);
    expect(s?.meanDeg).toBeCloseTo(40.1, 9);
    const shaky = [38, 42, 40, 37, 43].map((e, i) => ({ elevationDeg: e, atMs: 1000 + i * 100 }));
    expect(steadyAngle(shaky, 1450)?.steady).toBe(false);
    expect(steadyAngle(steady, 5000)).toBeNull();
  });
});
