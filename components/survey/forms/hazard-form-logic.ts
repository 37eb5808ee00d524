import { HAZARD_KINDS, VOLTAGE_CLASSES, hazardFieldsSchema, type CollectionFields, type LatLon } from '../../../shared/schemas';
import { checkWith, type FormCheck } from './field-errors';
import { parseDecimal } from './parse-decimal';

export type HazardFields = CollectionFields<'hazards'>;
export type HazardKind = (typeof HAZARD_KINDS)[number];
export type VoltageClass = (typeof VOLTAGE_CLASSES)[number];

export type HazardDraft = {
  kind: HazardKind;
  label: string;
  points: LatLon[];
  isArea: boolean;
  heightText: string;
  voltageClass: VoltageClass | null;
  voltageKvText: string;
  notes: string;
  /** The stored height as first shown (rounded); left unchanged, the stored metres are kept exactly. */
  shownHeight?: { text: string; m: number };
};

/** Which kinds are outlines by default: a parking area, a building and a pond are areas; lines are lines. */
export const AREA_BY_DEFAULT: Record<HazardKind, boolean> = { 'power-line': false, path: false, road: false, parking: true, building: true, water: true };

export const emptyHazardDraft = (kind: HazardKind): HazardDraft => ({
  kind, label: '', points: [], isArea: AREA_BY_DEFAULT[kind], heightText: '', voltageClass: kind === 'power-line' ? 'unknown' : null, voltageKvText: '', notes: '',
});

export const POWER_LINE_CAUTION =
  'Stay well clear: treat every line as energised, even one that looks dead or is only a service drop. Never touch it or throw a line near it. Unknown voltage is planned as transmission.';

/** How to tell the classes apart from the ground (common practice; typical voltages from REFERENCES.md). */
export const VOLTAGE_HELP: Record<VoltageClass, { label: string; help: string }> = {
  'service-drop': { label: 'Service drop', help: 'One short cable from a pole to a single building, often twisted together, at about roof height. 120/240 V, still deadly.' },
  distribution: { label: 'Distribution', help: 'Wooden or concrete poles along a road or field edge, 2–4 wires on cross-arms with small insulators, often a transformer drum. Typically 4–35 kV, most often 12.47 kV.' },
  transmission: { label: 'Transmission', help: 'Tall steel towers or very tall poles, long strings of insulator discs, wires far above the ground. 69 kV and up.' },
  unknown: { label: 'Not sure', help: 'If you cannot tell, say so: Loftline then plans with the largest clearances (as transmission).' },
};

export const HAZARD_KIND_LABEL: Record<HazardKind, string> = {
  'power-line': 'Power line', path: 'Path', road: 'Road', parking: 'Parking', building: 'Building', water: 'Water',
};

/** Distribution conductors sit well above this; a lower estimate is usually a misread (common practice). */
const LOW_POWER_LINE_QUESTION_M = 4;

export function checkHazard(draft: HazardDraft, siteId: string, toM: (v: number) => number): FormCheck<HazardFields> {
  const errors: Record<string, string> = {};
  const questions: string[] = [];
  let heightM: number | null = null;
  if (draft.heightText.trim() !== '') {
    const v = parseDecimal(draft.heightText);
    if (draft.shownHeight && draft.heightText === draft.shownHeight.text) heightM = draft.shownHeight.m;
    else if (v === null) errors.heightM = 'Type the height as a number, for example 9';
    else heightM = toM(v);
  }
  let voltageKv: number | null = null;
  if (draft.voltageKvText.trim() !== '') {
    const v = parseDecimal(draft.voltageKvText);
    if (v === null) errors.voltageKv = 'Type the voltage in kV as a number, for example 12.47';
    else voltageKv = v;
  }
  const isPower = draft.kind === 'power-line';
  if (isPower && draft.points.length < 2) errors.points = 'Mark at least two points along the line (walk under it, or place them by distance and bearing)';
  if (draft.isArea && draft.points.length > 0 && draft.points.length < 3) errors.points = 'An area needs at least three corners';
  if (isPower) {
    if (heightM === null && !errors.heightM) questions.push('No height given: Loftline will plan as if the line were as low as it could be. Estimate it if you can.');
    if (heightM !== null && heightM < LOW_POWER_LINE_QUESTION_M && heightM > 0) questions.push(`A power line ${heightM.toFixed(1)} m up is unusually low. Check it, and keep well clear.`);
    if (draft.voltageClass === 'service-drop' && voltageKv !== null && voltageKv > 1) questions.push('A service drop is 120/240 V; the kV you typed is a distribution voltage. Check the class.');
    if (draft.voltageClass === 'distribution' && voltageKv !== null && (voltageKv < 2 || voltageKv > 46)) questions.push('Distribution lines are typically 4–35 kV. Check the class or the voltage.');
  }
  const value = {
    siteId, kind: draft.kind, label: draft.label, points: draft.points, isArea: isPower ? false : draft.isArea,
    heightM, voltageClass: isPower ? draft.voltageClass ?? 'unknown' : null, voltageKv: isPower ? voltageKv : null, notes: draft.notes,
  };
  return checkWith(hazardFieldsSchema, value, errors, questions);
}

export function draftFromHazard(h: HazardFields, fromM: (m: number) => number): HazardDraft {
  const heightText = h.heightM === null ? '' : String(Math.round(fromM(h.heightM) * 10) / 10);
  return {
    shownHeight: h.heightM === null ? undefined : { text: heightText, m: h.heightM },
    kind: h.kind, label: h.label, points: h.points, isArea: h.isArea, heightText,
    voltageClass: h.voltageClass, voltageKvText: h.voltageKv === null ? '' : String(h.voltageKv), notes: h.notes,
  };
}
