import { parseDecimal } from './parse-decimal';

/*
 * The guided tree-height form: the readings the scout typed (or took with the phone's tilt), checked,
 * turned into a height by shared/heights (passed in as `HeightMath`), and kept as a measurement record
 * with its method and raw inputs. Methods (forestry practice, see REFERENCES.md "Tree heights"):
 *   tangent    distance to the trunk, angle to the top, eye height (level ground)
 *   two-angle  distance, angles to the top and to the base (sloping ground; base negative below eye level)
 *   percent    distance, percent-scale readings to the top and the base
 *   sine       rangefinder slant distance to the top and its angle, plus eye height
 */

export type HeightMethod = 'tangent' | 'two-angle' | 'percent' | 'sine';
export const HEIGHT_METHODS: readonly HeightMethod[] = ['tangent', 'two-angle', 'percent', 'sine'];

export type HeightMath = {
  tangent(distanceM: number, topDeg: number, eyeHeightM: number): number;
  twoAngle(distanceM: number, topDeg: number, baseDeg: number): number;
  percent(distanceM: number, topPercent: number, basePercent: number): number;
  sine(slantM: number, topDeg: number, eyeHeightM: number): number;
};

export type HeightTexts = { distance: string; eyeHeight: string; top: string; base: string; slant: string };
export const emptyHeightTexts = (eyeHeightText = ''): HeightTexts => ({ distance: '', eyeHeight: eyeHeightText, top: '', base: '', slant: '' });

export type HeightResult =
  | { ok: true; heightM: number; method: HeightMethod; inputs: Record<string, number>; questions: string[] }
  | { ok: false; errors: Partial<Record<keyof HeightTexts, string>>; questions: string[] };

/** Eye height of a standing adult, a default the scout can change (common practice). */
export const DEFAULT_EYE_HEIGHT_M = 1.6;

export function checkHeight(method: HeightMethod, t: HeightTexts, toM: (v: number) => number, math: HeightMath): HeightResult {
  const errors: Partial<Record<keyof HeightTexts, string>> = {};
  const questions: string[] = [];
  const num = (key: keyof HeightTexts, what: string) => {
    const v = parseDecimal(t[key]);
    if (v === null) errors[key] = `Type the ${what}`;
    return v;
  };
  const needs = {
    tangent: ['distance', 'top', 'eyeHeight'], 'two-angle': ['distance', 'top', 'base'], percent: ['distance', 'top', 'base'], sine: ['slant', 'top', 'eyeHeight'],
  }[method] as (keyof HeightTexts)[];
  const what: Record<keyof HeightTexts, string> = {
    distance: 'level distance to the trunk', eyeHeight: 'your eye height', slant: 'slant distance to the top',
    top: method === 'percent' ? 'percent reading to the top' : 'angle to the top in degrees', base: method === 'percent' ? 'percent reading to the base' : 'angle to the base in degrees',
  };
  const v: Partial<Record<keyof HeightTexts, number | null>> = {};
  for (const k of needs) v[k] = num(k, what[k]);

  const lengthM = (k: 'distance' | 'slant' | 'eyeHeight') => (v[k] === null || v[k] === undefined ? null : toM(v[k] as number));
  const dM = needs.includes('distance') ? lengthM('distance') : null;
  const sM = needs.includes('slant') ? lengthM('slant') : null;
  const eyeM = needs.includes('eyeHeight') ? lengthM('eyeHeight') : null;
  if (dM !== null && (dM <= 0 || dM > 200)) errors.distance = 'Stand between 1 and 200 m from the trunk';
  if (dM !== null && dM > 0 && dM < 3) questions.push('Closer than 3 m the top is hard to see: step back to about the tree’s height away.');
  if (sM !== null && (sM <= 0 || sM > 250)) errors.slant = 'A rangefinder reading between 1 and 250 m';
  if (eyeM !== null && (eyeM < 0.3 || eyeM > 3)) errors.eyeHeight = 'Eye height is between 0.3 and 3 m';
  const top = v.top ?? null, base = v.base ?? null;
  if (method === 'percent') {
    if (top !== null && (top <= 0 || top > 600)) errors.top = 'The reading to the top is above 0 and at most 600 %';
    if (top !== null && base !== null && base >= top) errors.base = 'The base reading must be below the top reading';
  } else {
    if (top !== null && (top <= 0 || top >= 89)) errors.top = 'The angle to the top is above 0° and below 89°';
    if (top !== null && top > 70) questions.push(`At ${top}° you are very close: a small error in the angle makes a large error in height. Step back.`);
    if (base !== null && (base <= -60 || base >= 60)) errors.base = 'The angle to the base is between −60° and 60° (negative below eye level)';
    if (top !== null && base !== null && base >= top) errors.base = 'The base must be below the top';
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors, questions };

  let heightM: number;
  let inputs: Record<string, number>;
  if (method === 'tangent') { heightM = math.tangent(dM!, top!, eyeM!); inputs = { distanceM: dM!, topDeg: top!, eyeHeightM: eyeM! }; }
  else if (method === 'two-angle') { heightM = math.twoAngle(dM!, top!, base!); inputs = { distanceM: dM!, topDeg: top!, baseDeg: base! }; }
  else if (method === 'percent') { heightM = math.percent(dM!, top!, base!); inputs = { distanceM: dM!, topPercent: top!, basePercent: base! }; }
  else { heightM = math.sine(sM!, top!, eyeM!); inputs = { slantM: sM!, topDeg: top!, eyeHeightM: eyeM! }; }

  if (!Number.isFinite(heightM) || heightM <= 0) return { ok: false, errors: { top: 'These readings give no height: check the angles' }, questions };
  if (heightM > 120) return { ok: false, errors: { top: `These readings give ${Math.round(heightM)} m: no support here is taller than 120 m. Check them.` }, questions };
  if (heightM > 40) questions.push(`${Math.round(heightM)} m is taller than nearly any tree a line is thrown over. Measure again if you can.`);
  return { ok: true, heightM, method, inputs, questions };
}
