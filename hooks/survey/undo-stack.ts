/*
 * The survey's undo: each change the scout makes is pushed with the operations that reverse it, written
 * against the sync client's own verbs (update / remove / undelete), so an undo is just another change
 * that goes through the local store and syncs like any other. Pure: the React hook holds the stack.
 */

export type UndoOp =
  | { op: 'remove'; collection: string; id: string }
  | { op: 'undelete'; collection: string; id: string }
  | { op: 'update'; collection: string; id: string; fields: Record<string, unknown> };

export type UndoEntry = { label: string; ops: UndoOp[] };

/** Only the last few changes are kept: undo is for the slip of a thumb, not a history. */
export const UNDO_DEPTH = 20;

export function undoForCreate(label: string, collection: string, id: string): UndoEntry {
  return { label, ops: [{ op: 'remove', collection, id }] };
}

export function undoForRemove(label: string, collection: string, id: string): UndoEntry {
  return { label, ops: [{ op: 'undelete', collection, id }] };
}

/**
 * Reverse of an update: the previous values of exactly the fields that changed. Fields the patch left
 * as they were are not written back, so an undo does not overwrite someone else's later edit of them.
 */
export function undoForUpdate(label: string, collection: string, id: string, before: Record<string, unknown>, patch: Record<string, unknown>): UndoEntry | null {
  const fields: Record<string, unknown> = {};
  for (const key of Object.keys(patch)) {
    if (!sameValue(before[key], patch[key])) fields[key] = before[key] === undefined ? null : before[key];
  }
  return Object.keys(fields).length === 0 ? null : { label, ops: [{ op: 'update', collection, id, fields }] };
}

/** Several changes made by one action (a support and its measurements) undone together, last first. */
export function combineUndo(label: string, entries: (UndoEntry | null)[]): UndoEntry | null {
  const ops = entries.filter((e): e is UndoEntry => e !== null).flatMap((e) => e.ops);
  return ops.length === 0 ? null : { label, ops };
}

export function pushUndo(stack: readonly UndoEntry[], entry: UndoEntry | null): UndoEntry[] {
  if (!entry) return [...stack];
  const next = [...stack, entry];
  return next.length > UNDO_DEPTH ? next.slice(next.length - UNDO_DEPTH) : next;
}

export function popUndo(stack: readonly UndoEntry[]): { entry: UndoEntry | null; rest: UndoEntry[] } {
  if (stack.length === 0) return { entry: null, rest: [] };
  return { entry: stack[stack.length - 1], rest: stack.slice(0, -1) };
}

export type UndoTarget = {
  update(collection: string, id: string, fields: Record<string, unknown>): Promise<unknown> | unknown;
  remove(collection: string, id: string): Promise<unknown> | unknown;
  undelete(collection: string, id: string): Promise<unknown> | unknown;
};

/** Apply an entry's operations in reverse order of the changes they undo. */
export async function applyUndo(entry: UndoEntry, target: UndoTarget): Promise<void> {
  for (const op of [...entry.ops].reverse()) {
    if (op.op === 'remove') await target.remove(op.collection, op.id);
    else if (op.op === 'undelete') await target.undelete(op.collection, op.id);
    else await target.update(op.collection, op.id, op.fields);
  }
}

function sameValue(a: unknown, b: unknown): boolean {
  if (a === b) return true;
  return JSON.stringify(a ?? null) === JSON.stringify(b ?? null);
}

/** Only the fields whose value differs: an edit writes just those, so it does not overwrite others' edits of the rest. */
export function changedFields<T extends Record<string, unknown>>(before: Record<string, unknown>, after: T): Partial<T> {
  const out: Partial<T> = {};
  for (const key of Object.keys(after) as (keyof T & string)[]) {
    if (!sameValue(before[key], after[key])) out[key] = after[key];
  }
  return out;
}
