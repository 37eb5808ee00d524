import { useCallback, useState } from 'react';
import type { CollectionFields, CollectionName } from '@/shared/schemas';
import { changedFields } from './undo-stack';
import { useSurveyWrites } from './use-survey-undo';

/**
 * How every survey form saves: a new record is created; an edit writes only the fields that changed (so
 * it does not overwrite what someone else changed meanwhile). A failed write keeps the form as it is and
 * says why in plain words.
 */
export function useRecordSave() {
  const writes = useSurveyWrites();
  const [busy, setBusy] = useState(false);
  const [saveError, setSaveError] = useState<string | null>(null);

  const run = useCallback(async (fn: () => Promise<void>) => {
    setBusy(true);
    setSaveError(null);
    try {
      await fn();
    } catch (e) {
      setSaveError(`Could not save on this phone: ${e instanceof Error ? e.message : String(e)}. The form still holds what you typed; try again.`);
    } finally {
      setBusy(false);
    }
  }, []);

  const upsert = useCallback(async <C extends CollectionName>(collection: C, existing: { id: string } | undefined, fields: CollectionFields<C>, label: string): Promise<string> => {
    if (!existing) return writes.create(collection, fields, `Add ${label}`);
    const before = existing as unknown as Record<string, unknown>;
    const patch = changedFields(before, fields as Record<string, unknown>) as Partial<CollectionFields<C>>;
    if (Object.keys(patch).length > 0) await writes.update(collection, existing.id, patch, before, `Edit ${label}`);
    return existing.id;
  }, [writes]);

  return { busy, saveError, run, upsert, append: writes.append };
}
