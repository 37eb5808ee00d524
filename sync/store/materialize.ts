import type { WireRecord } from '../protocol';
import type { LocalView, OutboxEntry } from './types';

/**
 * The view of a record: the server's copy with this device's outbox entries laid over it in the order they were
 * made. A person always sees their own unsynced changes; once the server has answered and the next pull has
 * brought its copy, the entries are dropped and the view is the server's copy again (which may keep another
 * device's later value: the server decides by clock).
 */
export function materialize(base: WireRecord | null, entries: OutboxEntry[], clubId: string): LocalView | null {
  let view: LocalView | null = base
    ? {
        collection: base.collection,
        id: base.id,
        clubId: base.clubId,
        fields: { ...base.fields },
        createdAt: base.createdAt,
        updatedAt: base.updatedAt,
        deletedAt: base.deletedAt,
      }
    : null;
  const ordered = [...entries].sort((a, b) => a.mutationId - b.mutationId);
  for (const m of ordered) {
    if (m.op === 'upsert') {
      if (!view) {
        view = { collection: m.collection, id: m.recordId, clubId, fields: { ...m.fields }, createdAt: m.madeAt, updatedAt: m.madeAt, deletedAt: null };
      } else {
        view = { ...view, fields: { ...view.fields, ...m.fields }, updatedAt: m.madeAt };
      }
    } else if (view) {
      view = { ...view, deletedAt: m.op === 'delete' ? m.madeAt : null, updatedAt: m.madeAt };
    }
  }
  return view;
}
