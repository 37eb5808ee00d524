import { describe, expect, it } from 'vitest';
import { M_PER_FT } from '../../../hooks/length-format';
import { checkHeight, emptyHeightTexts } from './height-form-logic';
import { heightMath } from './height-math';

const ft = (v: number) => v * M_PER_FT;
const m = (v: number) => v;

describe('guided height form (readings → shared/heights → checked result)', () => {
  it('percent scale: 50 ft away, top +124 %, base −16 % → 70 ft (DeYoung, Forest Measurements §2.3, REFERENCES.md)', () => {
    const r = checkHeight('percent', { ...emptyHeightTexts(), distance: '50', top: '124', base: '-16' }, ft, heightMath);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expect(r.heightM / M_PER_FT).toBeCloseTo(70, 6);
      expect(r.inputs).toEqual({ distanceM: 50 * M_PER_FT, topPercent: 124, basePercent: -16 });
      expect(r.method).toBe('percent');
    }
  });

  it('two-angle: h = d(tan αtop − tan αbase), 20 m, +40°, −5° → 18.53 m (Sewanee forestry notes formula, REFERENCES.md)', () => {
    const r = checkHeight('two-angle', { ...emptyHeightTexts(), distance: '20', top: '40', base: '-5' }, m, heightMath);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.heightM).toBeCloseTo(20 * (Math.tan((40 * Math.PI) / 180) - Math.tan((-5 * Math.PI) / 180)), 6);
  });

  it('tangent with eye height: 20 m, +35°, eye 1.6 m → 20·tan35° + 1.6 = 15.60 m (level-ground clinometer method)', () => {
    const r = checkHeight('tangent', { ...emptyHeightTexts('1.6'), distance: '20', top: '35' }, m, heightMath);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.heightM).toBeCloseTo(20 * Math.tan((35 * Math.PI) / 180) + 1.6, 6);
  });

  it('rangefinder sine: 105 ft slant at 47° is 76.8 ft above the eye (Native Tree Society example, REFERENCES.md), plus eye height', () => {
    const r = checkHeight('sine', { ...emptyHeightTexts('5'), slant: '105', top: '47' }, ft, heightMath);
    expect(r.ok).toBe(true);
    if (r.ok) expect(r.heightM / M_PER_FT).toBeCloseTo(76.79 + 5, 1);
  });

  it('refuses a base above the top, a 0° top angle and a missing distance, each on its own field', () => {
    const r = checkHeight('two-angle', { ...emptyHeightTexts(), distance: '', top: '0', base: '10' }, m, heightMath);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.errors.distance).toMatch(/distance/);
      expect(r.errors.top).toMatch(/above 0°/);
      expect(r.errors.base).toMatch(/below the top/);
    }
  });

  it('refuses readings that give a 300 m tree and questions a 45 m one', () => {
    const huge = checkHeight('tangent', { ...emptyHeightTexts('1.6'), distance: '150', top: '63' }, m, heightMath);
    expect(huge.ok).toBe(false);
    if (!huge.ok) expect(huge.errors.top).toMatch(/120 m/);
    const tall = checkHeight('tangent', { ...emptyHeightTexts('1.6'), distance: '50', top: '41' }, m, heightMath);
    expect(tall.ok).toBe(true);
    expect(tall.questions.join(' ')).toMatch(/taller than nearly any tree/);
  });

  it('questions standing too close (steep top angle)', () => {
    const r = checkHeight('tangent', { ...emptyHeightTexts('1.6'), distance: '4', top: '75' }, m, heightMath);
    expect(r.questions.join(' ')).toMatch(/Step back/);
  });
});
