import { LAUNCH_METHODS, SUPPORT_KINDS, supportFieldsSchema, type CollectionFields } from '../../../shared/schemas';
import { checkWith, type FormCheck } from './field-errors';
import { parseDecimal } from './parse-decimal';

/*
 * The support form's rules, apart from the screen: what the scout typed (text, in their own units) becomes
 * the support's fields in SI, checked by the shared zod schema, plus the questions a careful lead would ask
 * ("a 45 m tree?").
 */

export type SupportFields = CollectionFields<'supports'>;
export type SupportKind = (typeof SUPPORT_KINDS)[number];
export type LaunchMethod = (typeof LAUNCH_METHODS)[number];

export type SupportDraft = {
  kind: SupportKind;
  label: string;
  lat: number | null;
  lon: number | null;
  positionAccuracyM: number | null;
  /** Typed in the person's units; empty when not known yet. */
  heightText: string;
  attachHeightText: string;
  launchMethod: LaunchMethod | null;
  maxEndsText: string;
  species: string;
  condition: string;
  mastModel: string;
  notes: string;
  /**
   * Stored lengths as first shown in the form (rounded for reading). When the text is left as shown, the
   * stored metres are kept exactly: opening and saving a record never rounds what was measured.
   */
  shown?: Partial<Record<'heightM' | 'attachHeightM', { text: string; m: number }>>;
};

export const emptySupportDraft = (kind: SupportKind = 'tree'): SupportDraft => ({
  kind, label: '', lat: null, lon: null, positionAccuracyM: null, heightText: '', attachHeightText: '', launchMethod: kind === 'mast' ? 'none' : null,
  maxEndsText: kind === 'mast' ? '1' : '2', species: '', condition: '', mastModel: '', notes: '',
});

/** Questioned, not refused: taller than nearly every tree a line is thrown over at a field day (common practice). */
export const TALL_TREE_QUESTION_M = 40;
/** Telescopic masts clubs carry are rarely above ~18 m (common practice). */
export const TALL_MAST_QUESTION_M = 20;
/** A fix this poor cannot tell one tree from the next (common practice). */
export const POOR_FIX_QUESTION_M = 15;

export type SiteContext = { siteSpanM: number | null };

function lengthOrError(text: string, toM: (v: number) => number, what: string, errors: Record<string, string>, key: string, shown?: { text: string; m: number }): number | null {
  if (text.trim() === '') return null;
  if (shown && text === shown.text) return shown.m;
  const v = parseDecimal(text);
  if (v === null) { errors[key] = `Type the ${what} as a number, for example 12.5`; return null; }
  return toM(v);
}

export function checkSupport(draft: SupportDraft, siteId: string, toM: (v: number) => number, ctx: SiteContext = { siteSpanM: null }): FormCheck<SupportFields> {
  const errors: Record<string, string> = {};
  const questions: string[] = [];
  const heightM = lengthOrError(draft.heightText, toM, 'height', errors, 'heightM', draft.shown?.heightM);
  const attachHeightM = lengthOrError(draft.attachHeightText, toM, 'attachment height', errors, 'attachHeightM', draft.shown?.attachHeightM);
  const maxEnds = parseDecimal(draft.maxEndsText);
  if (draft.lat === null || draft.lon === null) errors.lat = errors.lon = 'Place the support: take a GPS fix here, or give distance and bearing from where you stand';
  if (heightM !== null && attachHeightM !== null && attachHeightM > heightM) errors.attachHeightM = 'The attachment point cannot be higher than the support itself';
  if (maxEnds === null || !Number.isInteger(maxEnds)) errors.maxEnds = 'How many wire ends it can hold: a whole number from 1 to 4';

  if (heightM !== null && heightM <= 120) {
    if (draft.kind === 'tree' && heightM > TALL_TREE_QUESTION_M) questions.push(`A ${Math.round(heightM)} m tree is taller than nearly any tree a line is thrown over. Check the measurement.`);
    if (draft.kind === 'mast' && heightM > TALL_MAST_QUESTION_M) questions.push(`A ${Math.round(heightM)} m mast is taller than the portable masts clubs usually carry. Check the height.`);
  }
  if (draft.positionAccuracyM !== null) {
    if (ctx.siteSpanM !== null && ctx.siteSpanM > 0 && draft.positionAccuracyM > ctx.siteSpanM / 2) {
      questions.push(`The fix is only good to ${Math.round(draft.positionAccuracyM)} m, more than half the size of the site. Wait for a better fix if you can.`);
    } else if (draft.positionAccuracyM > POOR_FIX_QUESTION_M) {
      questions.push(`The fix is only good to ${Math.round(draft.positionAccuracyM)} m: it may not tell this support from its neighbours.`);
    }
  }
  if (draft.kind === 'tree' && draft.launchMethod === null && heightM !== null) questions.push('How will a line get over it? Pick a launch method.');

  const value = {
    siteId, kind: draft.kind, label: draft.label, lat: draft.lat ?? Number.NaN, lon: draft.lon ?? Number.NaN,
    positionAccuracyM: draft.positionAccuracyM, heightM, attachHeightM, launchMethod: draft.launchMethod, maxEnds: maxEnds ?? 0,
    species: draft.species, condition: draft.condition, mastModel: draft.mastModel, notes: draft.notes,
  };
  return checkWith(supportFieldsSchema, value, errors, questions);
}

/** A stored support back into a draft for editing, in the person's units. */
export function draftFromSupport(s: SupportFields, fromM: (m: number) => number): SupportDraft {
  const txt = (m: number | null) => (m === null ? '' : String(Math.round(fromM(m) * 10) / 10));
  const shown: SupportDraft['shown'] = {};
  if (s.heightM !== null) shown.heightM = { text: txt(s.heightM), m: s.heightM };
  if (s.attachHeightM !== null) shown.attachHeightM = { text: txt(s.attachHeightM), m: s.attachHeightM };
  return {
    shown,
    kind: s.kind, label: s.label, lat: s.lat, lon: s.lon, positionAccuracyM: s.positionAccuracyM, heightText: txt(s.heightM), attachHeightText: txt(s.attachHeightM),
    launchMethod: s.launchMethod, maxEndsText: String(s.maxEnds), species: s.species, condition: s.condition, mastModel: s.mastModel, notes: s.notes,
  };
}
