// The server's merge of one mutation into a record: field by field, the later clock wins; the deletion state is
// a register of its own with its own clock. Pure: the push service feeds it rows and applies what it returns.
import { SAFETY_FIELDS, type CollectionName } from '../../../../shared/schemas';
import { compareHlc, decodeHlc, type MutationOp } from '../../../../sync/protocol';
import type { RowState } from './row-codec';

export interface MergeInput {
  op: MutationOp;
  /** Validated fields (all of them for a new record). */
  fields: Record<string, unknown>;
  baseClocks: Record<string, string | null>;
  /** The clock after clamping. */
  clock: string;
}

export interface FieldConflict {
  field: string;
  keptValue: unknown;
  keptClock: string;
  otherValue: unknown;
  otherClock: string;
}

export interface MergeResult {
  row: RowState;
  changed: boolean;
  conflicts: FieldConflict[];
}

const sameValue = (a: unknown, b: unknown) => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
const nodeOf = (clock: string) => decodeHlc(clock).node;

/**
 * Rules (README "How sync behaves"):
 * - each field keeps the value with the later clock; a tie (one device's edits clamped to the same clock) goes to
 *   the change applied later, which is the device's later change;
 * - delete and undelete set the deletion state if their clock is later than the state's clock; an edit never
 *   changes it. So a delete and a concurrent edit end the same in both orders: the record is deleted and the edit
 *   is kept inside it, shown again if someone restores the record;
 * - a change of a safety-relevant field made without seeing the value it replaces (or loses to) is a conflict
 *   when the two values differ and came from different devices: both are kept for the lead.
 */
export function mergeMutation(collection: CollectionName, current: RowState, m: MergeInput, nowIso: string): MergeResult {
  const row: RowState = { ...current, fields: { ...current.fields }, fieldClocks: { ...current.fieldClocks } };
  const conflicts: FieldConflict[] = [];
  let changed = false;
  if (m.op === 'upsert') {
    const safety = new Set(SAFETY_FIELDS[collection] ?? []);
    for (const [field, value] of Object.entries(m.fields)) {
      const stored = row.fieldClocks[field] ?? null;
      const incomingWins = compareHlc(m.clock, stored) >= 0;
      if (safety.has(field) && stored !== null && stored !== (m.baseClocks[field] ?? null) && nodeOf(stored) !== nodeOf(m.clock) && !sameValue(value, row.fields[field])) {
        conflicts.push(
          incomingWins
            ? { field, keptValue: value, keptClock: m.clock, otherValue: row.fields[field], otherClock: stored }
            : { field, keptValue: row.fields[field], keptClock: stored, otherValue: value, otherClock: m.clock },
        );
      }
      if (incomingWins) {
        if (!sameValue(value, row.fields[field]) || stored !== m.clock) changed = true;
        row.fields[field] = value;
        row.fieldClocks[field] = m.clock;
      }
    }
  } else if (compareHlc(m.clock, row.deletedClock) >= 0) {
    const deleting = m.op === 'delete';
    if (deleting !== (row.deletedAt !== null) || row.deletedClock !== m.clock) changed = true;
    row.deletedClock = m.clock;
    row.deletedAt = deleting ? (row.deletedAt ?? nowIso) : null;
  }
  if (changed) row.updatedAt = nowIso;
  return { row, changed, conflicts };
}

/** A record that does not exist yet, created by an upsert carrying all its fields. */
export function newRow(collection: CollectionName, id: string, clubId: string, fields: Record<string, unknown>, clock: string, nowIso: string): RowState {
  return {
    collection,
    id,
    clubId,
    fields: { ...fields },
    fieldClocks: Object.fromEntries(Object.keys(fields).map((k) => [k, clock])),
    deletedAt: null,
    deletedClock: null,
    createdAt: nowIso,
    updatedAt: nowIso,
    changeSeq: null,
  };
}
