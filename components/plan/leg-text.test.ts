import { describe, expect, it } from 'vitest';
import type { SpotEvaluation } from '@/shared/review';
import { legBearingFor, legChoices, legEndOutM, legsText, spotLegsText } from './leg-text';

describe('how the leg direction of an inverted-V is said and typed', () => {
  it('a wire along 30° has legs to 30° and 210°; 157.5° keeps its half degree; 200° is the same wire as 20°', () => {
    expect(legsText(30)).toBe('legs run 30° – 210°');
    expect(legsText(157.5)).toBe('legs run 157.5° – 337.5°');
    expect(legsText(200)).toBe('legs run 20° – 200°');
  });

  it('each leg end comes down leg·sin(apex/2) out from the support (right-triangle trigonometry): 5 m legs at 120° → 4.33 m', () => {
    expect(legEndOutM({ wireLengthM: 10, apexDeg: 120 })).toBeCloseTo(5 * Math.sin(Math.PI / 3), 12);
    expect(legEndOutM({ wireLengthM: 10, apexDeg: 90 })).toBeCloseTo(5 * Math.SQRT1_2, 12);
    expect(legEndOutM({ wireLengthM: 10, apexDeg: null })).toBeNull();
  });

  it('the choices are the best, each engine direction and a typed bearing; a typed bearing is checked by the record schema', () => {
    expect(legChoices([0, 45, 90, 135]).map((c) => c.value)).toEqual(['best', '0', '45', '90', '135', 'typed']);
    expect(legChoices([45])[1].label).toBe('45° – 225°');
    expect(legBearingFor('best', 12)).toEqual({ bearingDeg: null, error: null });
    expect(legBearingFor('45', null)).toEqual({ bearingDeg: 45, error: null });
    expect(legBearingFor('typed', 30)).toEqual({ bearingDeg: 30, error: null });
    expect(legBearingFor('typed', 0)).toEqual({ bearingDeg: 0, error: null });
    expect(legBearingFor('typed', 200).error).toMatch(/0 to 179\.9°.*a wire along 200° is along 20°/);
    expect(legBearingFor('typed', 180).bearingDeg).toBeNull();
    expect(legBearingFor('typed', -5).error).toMatch(/0 to 179\.9°/);
    expect(legBearingFor('typed', Number.NaN).error).toMatch(/number of degrees/);
    expect(legBearingFor('typed', null).error).toMatch(/Type the bearing/);
  });

  it('a recorded spot says its legs, and whether the lead chose the direction', () => {
    const ev = (shape: 'flat' | 'inverted-v', legAzimuthDeg: number | null, wireAzimuthDeg: number | null) =>
      ({ spot: { shape, legAzimuthDeg }, evaluated: wireAzimuthDeg === null ? null : { candidate: { wireAzimuthDeg } } }) as unknown as SpotEvaluation;
    expect(spotLegsText(ev('inverted-v', 30, 30))).toBe(', legs run 30° – 210°');
    expect(spotLegsText(ev('inverted-v', null, 45))).toBe(', legs run 45° – 225° (the engine’s best direction; none chosen)');
    expect(spotLegsText(ev('inverted-v', 30, null))).toBe(', legs run 30° – 210° (chosen)');
    expect(spotLegsText(ev('flat', null, 90))).toBe('');
  });
});
