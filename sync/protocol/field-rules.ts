import { z } from 'zod';
import { can, COLLECTIONS, SITE_SURVEY_FIELDS, type CollectionName, type Role } from '../../shared/schemas';
import type { MutationOp } from './messages';

/** The object schema of a collection's fields, without its cross-field refinements. */
export function fieldShape(collection: CollectionName): Record<string, z.ZodType> {
  return (COLLECTIONS[collection].fields as unknown as z.ZodObject).shape as Record<string, z.ZodType>;
}

export function fieldNames(collection: CollectionName): string[] {
  return Object.keys(fieldShape(collection));
}

export type FieldCheck = { ok: true; fields: Record<string, unknown> } | { ok: false; message: string; details: unknown };

function failure(error: z.ZodError): FieldCheck {
  const first = error.issues[0];
  const where = first?.path.length ? `${first.path.join('.')}: ` : '';
  return { ok: false, message: `${where}${first?.message ?? 'invalid'}`, details: z.flattenError(error) };
}

/** A new record: every field, defaults filled in, cross-field rules checked. */
export function checkNewRecordFields(collection: CollectionName, fields: unknown): FieldCheck {
  const r = COLLECTIONS[collection].fields.safeParse(fields);
  return r.success ? { ok: true, fields: r.data as Record<string, unknown> } : failure(r.error);
}

/** An edit: only known fields, each valid on its own (cross-field rules are checked on the merged record). */
export function checkEditedFields(collection: CollectionName, fields: Record<string, unknown>): FieldCheck {
  const shape = fieldShape(collection);
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(fields)) {
    const schema = shape[key];
    if (!schema) return { ok: false, message: `${key}: not a field of ${collection}`, details: { field: key } };
    const r = schema.safeParse(value);
    if (!r.success) {
      const issue = r.error.issues[0];
      return { ok: false, message: `${key}: ${issue?.message ?? 'invalid'}`, details: z.flattenError(r.error) };
    }
    out[key] = r.data;
  }
  return { ok: true, fields: out };
}

/** Crew may change only a spot's state, its reason and the measured SWR (the "spot.status" ability). */
const SPOT_STATUS_FIELDS = new Set(['state', 'stateReason', 'measuredSwr']);
const SITE_SURVEY_FIELD_SET = new Set<string>(SITE_SURVEY_FIELDS);

/** May this role make this change? (The server enforces it on every mutation; the app hides controls with it.) */
export function mayWrite(role: Role, collection: CollectionName, op: MutationOp, fieldKeys: string[], isNew: boolean): boolean {
  if (can(role, COLLECTIONS[collection].ability)) return true;
  // A scout records a site's ground and notes (survey.write) but may not rename, move or create the site.
  if (collection === 'sites' && op === 'upsert' && !isNew && fieldKeys.length > 0 && fieldKeys.every((k) => SITE_SURVEY_FIELD_SET.has(k))) return can(role, 'survey.write');
  return (
    collection === 'antennaSpots' &&
    op === 'upsert' &&
    !isNew &&
    fieldKeys.length > 0 &&
    fieldKeys.every((k) => SPOT_STATUS_FIELDS.has(k)) &&
    can(role, 'spot.status')
  );
}

/**
 * Append-only collections keep what was taken: measurements are never edited (a measurement may be withdrawn
 * and restored), review decisions are never edited or withdrawn (a new decision supersedes).
 */
export function appendOnlyRefusal(collection: CollectionName, op: MutationOp, exists: boolean): string | null {
  if (!COLLECTIONS[collection].appendOnly) return null;
  if (op === 'upsert' && exists) return `${collection} are kept as recorded: add a new one instead of editing`;
  if (collection === 'reviewDecisions' && op !== 'upsert') return 'review decisions cannot be withdrawn: record a new decision';
  return null;
}
