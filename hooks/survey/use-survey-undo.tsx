import { createContext, useCallback, useContext, useMemo, useRef, useState, type ReactNode } from 'react';
import type { CollectionFields, CollectionName } from '@/shared/schemas';
import { useMutate } from '@/hooks/sync';
import { applyUndo, popUndo, pushUndo, undoForCreate, undoForRemove, undoForUpdate, type UndoEntry } from './undo-stack';

/*
 * The survey's writes, each remembered with its reverse so the scout can undo the last change. Every
 * write goes through the sync client (local store first, synced later); undo is just more writes.
 */

type Writes = {
  create: <C extends CollectionName>(collection: C, fields: CollectionFields<C>, label: string) => Promise<string>;
  /** `before` is the record as shown, so the undo restores exactly what the scout saw. */
  update: <C extends CollectionName>(collection: C, id: string, patch: Partial<CollectionFields<C>>, before: Record<string, unknown>, label: string) => Promise<void>;
  remove: (collection: CollectionName, id: string, label: string) => Promise<void>;
  /** Appended records (measurements) are never undone on their own: the reading happened. */
  append: <C extends CollectionName>(collection: C, fields: CollectionFields<C>) => Promise<string>;
  undo: () => Promise<string | null>;
  lastLabel: string | null;
  busy: boolean;
};

const Ctx = createContext<Writes | null>(null);

export function SurveyUndoProvider({ children }: { children: ReactNode }) {
  const mutate = useMutate();
  const [stack, setStack] = useState<UndoEntry[]>([]);
  const [busy, setBusy] = useState(false);
  const stackRef = useRef(stack);
  stackRef.current = stack;
  const push = useCallback((e: UndoEntry | null) => setStack((s) => pushUndo(s, e)), []);

  const create = useCallback<Writes['create']>(async (collection, fields, label) => {
    const id = await mutate.create(collection, fields);
    push(undoForCreate(label, collection, id));
    return id;
  }, [mutate, push]);
  const append = useCallback<Writes['append']>((collection, fields) => Promise.resolve(mutate.create(collection, fields)), [mutate]);
  const update = useCallback<Writes['update']>(async (collection, id, patch, before, label) => {
    await mutate.update(collection, id, patch);
    push(undoForUpdate(label, collection, id, before, patch as Record<string, unknown>));
  }, [mutate, push]);
  const remove = useCallback<Writes['remove']>(async (collection, id, label) => {
    await mutate.remove(collection, id);
    push(undoForRemove(label, collection, id));
  }, [mutate, push]);
  const undo = useCallback(async () => {
    const { entry, rest } = popUndo(stackRef.current);
    if (!entry) return null;
    setBusy(true);
    try {
      await applyUndo(entry, {
        update: (c, id, f) => mutate.update(c as CollectionName, id, f as never),
        remove: (c, id) => mutate.remove(c as CollectionName, id),
        undelete: (c, id) => mutate.undelete(c as CollectionName, id),
      });
      setStack(rest);
      return entry.label;
    } finally {
      setBusy(false);
    }
  }, [mutate]);

  const value = useMemo<Writes>(() => ({ create, update, remove, append, undo, busy, lastLabel: stack.length ? stack[stack.length - 1].label : null }), [create, update, remove, append, undo, busy, stack]);
  return <Ctx.Provider value={value}>{children}</Ctx.Provider>;
}

export function useSurveyWrites(): Writes {
  const v = useContext(Ctx);
  if (!v) throw new Error('useSurveyWrites must be used inside <SurveyUndoProvider> (the survey screen mounts it)');
  return v;
}
