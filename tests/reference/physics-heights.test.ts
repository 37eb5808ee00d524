import { describe, expect, it } from 'vitest';
import { laserSineHeightM, percentHeightM, tangentHeightM, twoAngleHeightM, usableAttachmentHeightM } from '../../shared/heights';

const FT = 0.3048;

describe('tree heights (forestry worked examples)', () => {
  it('percent scale: 50 ft away, top +124 %, base −16 % → 70 ft (DeYoung, Forest Measurements §2.3 [doc])', () => {
    expect(percentHeightM({ distanceM: 50 * FT, topPercent: 124, basePercent: -16 }) / FT).toBeCloseTo(70, 6);
  });

  it('laser sine method: 105 ft slant × sin 47° = 76.8 ft above the eye (Native Tree Society [doc])', () => {
    expect(laserSineHeightM({ slantTopM: 105 * FT, topDeg: 47, eyeHeightM: 0 }) / FT).toBeCloseTo(76.79, 2);
  });

  it('two-angle method h = d(tan α_top − tan α_base) with the base below eye level (Sewanee forestry notes [doc]; values [calc])', () => {
    // 20 m away, top +45°, base −10°: 20·(1 + 0.17633) = 23.527 m
    expect(twoAngleHeightM({ distanceM: 20, topDeg: 45, baseDeg: -10 })).toBeCloseTo(23.5265, 3);
    // on a downhill slope where the base is above eye level the base angle is positive and subtracts
    expect(twoAngleHeightM({ distanceM: 20, topDeg: 45, baseDeg: 5 })).toBeCloseTo(20 * (1 - Math.tan((5 * Math.PI) / 180)), 6);
  });

  it('tangent method on level ground adds the eye height (textbook): 30 m at 30°, eye 1.6 m → 18.92 m', () => {
    expect(tangentHeightM({ distanceM: 30, topDeg: 30, eyeHeightM: 1.6 })).toBeCloseTo(30 * Math.tan(Math.PI / 6) + 1.6, 9);
  });

  it('laser with a base reading below the eye matches the two-angle method for the same geometry', () => {
    const d = 25;
    const top = 40, base = -8;
    const slantTop = d / Math.cos((top * Math.PI) / 180);
    const slantBase = d / Math.cos((base * Math.PI) / 180);
    expect(laserSineHeightM({ slantTopM: slantTop, topDeg: top, slantBaseM: slantBase, baseDeg: base })).toBeCloseTo(
      twoAngleHeightM({ distanceM: d, topDeg: top, baseDeg: base }),
      9,
    );
  });

  it('impossible readings get a clear error', () => {
    expect(() => twoAngleHeightM({ distanceM: 20, topDeg: -5, baseDeg: 10 })).toThrow(/top reading is above the base/);
    expect(() => percentHeightM({ distanceM: 0, topPercent: 50, basePercent: 0 })).toThrow(/distance/);
    expect(() => tangentHeightM({ distanceM: 10, topDeg: 95, eyeHeightM: 1.6 })).toThrow(/between −90° and 90°/);
  });
});

describe('usable attachment height (defaults are common practice [memory])', () => {
  it("the scout's estimate wins", () => {
    expect(usableAttachmentHeightM({ treeHeightM: 20, method: 'hand-throw', scoutEstimateM: 12 })).toMatchObject({ heightM: 12, basis: 'scout-estimate' });
  });
  it('otherwise 80 % of the tree, capped by what the launch method reaches', () => {
    expect(usableAttachmentHeightM({ treeHeightM: 10, method: 'hand-throw' })).toMatchObject({ heightM: 8, basis: 'tree-fraction' });
    expect(usableAttachmentHeightM({ treeHeightM: 25, method: 'hand-throw' })).toMatchObject({ heightM: 8, basis: 'launch-reach' });
    expect(usableAttachmentHeightM({ treeHeightM: 25, method: 'slingshot' }).heightM).toBeCloseTo(20, 9);
    expect(usableAttachmentHeightM({ treeHeightM: 40, method: 'throw-bag' }).heightM).toBe(15);
  });
  it('rejects an estimate above the tree and unknown methods', () => {
    expect(() => usableAttachmentHeightM({ treeHeightM: 10, method: 'slingshot', scoutEstimateM: 12 })).toThrow(/no higher than the tree/);
    expect(() => usableAttachmentHeightM({ treeHeightM: 10, method: 'crossbow' as never })).toThrow(/unknown launch method/);
  });
});
