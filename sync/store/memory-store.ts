import type { CollectionName } from '../../shared/schemas';
import { createStoreFromTx, type StoreTx } from './store-core';
import type { BeforeCommitHook, LocalRejection, LocalStore, OutboxEntry, RecordEntry, SyncMeta } from './types';

/**
 * The device database kept in memory (tests, the sync fuzz, and platforms without IndexedDB).
 * `MemoryDatabase` outlives the store that uses it, so a simulated device can "crash" (drop its store and
 * engine) and restart from the same data. Transactions write to a staging copy and commit at the end, so a
 * failure inside one leaves nothing behind, as in IndexedDB.
 */
export class MemoryDatabase {
  records = new Map<string, RecordEntry>();
  outbox = new Map<number, OutboxEntry>();
  rejections = new Map<number, LocalRejection>();
  meta: SyncMeta | undefined;
}

const recordKey = (c: string, id: string) => `${c}/${id}`;
// Hermes (native builds) may lack structuredClone; the stored values are plain JSON either way.
const copy = <T>(v: T): T => (typeof structuredClone === 'function' ? structuredClone(v) : (JSON.parse(JSON.stringify(v)) as T));
// Reads need no copy: the store core parses every read with zod, which builds new objects.
const asRead = <T>(v: T): T => v;

export interface MemoryStoreOptions {
  beforeCommit?: BeforeCommitHook;
}

export function createMemoryStore(db: MemoryDatabase = new MemoryDatabase(), options: MemoryStoreOptions = {}): LocalStore {
  let queue: Promise<unknown> = Promise.resolve();
  let closed = false;

  const runOne = async <T>(mode: 'readonly' | 'readwrite', operation: string, fn: (tx: StoreTx) => Promise<T>): Promise<T> => {
    if (closed) throw new Error('the local store is closed');
    // A read-write transaction works on staging copies committed at the end; a read-only one reads in place.
    const staged = mode === 'readwrite';
    const records = staged ? new Map(db.records) : db.records;
    const outbox = staged ? new Map(db.outbox) : db.outbox;
    const rejections = staged ? new Map(db.rejections) : db.rejections;
    let meta = db.meta;
    const tx: StoreTx = {
      getRecord: async (c, id) => asRead(records.get(recordKey(c, id))),
      putRecord: async (e) => void records.set(recordKey(e.collection, e.id), copy(e)),
      allRecords: async (c: CollectionName) => [...records.values()].filter((r) => r.collection === c).map(asRead),
      clearRecords: async () => records.clear(),
      getOutbox: async (id) => asRead(outbox.get(id)),
      allOutbox: async () => [...outbox.values()].map(asRead),
      pendingOutbox: async (limit) => [...outbox.values()].filter((e) => e.state === 'pending').sort((a, b) => a.mutationId - b.mutationId).slice(0, limit).map(asRead),
      countPending: async () => [...outbox.values()].filter((e) => e.state === 'pending').length,
      outboxForRecord: async (c, id) => [...outbox.values()].filter((e) => e.collection === c && e.recordId === id).map(asRead),
      putOutbox: async (e) => void outbox.set(e.mutationId, copy(e)),
      deleteOutbox: async (id) => void outbox.delete(id),
      getMeta: async () => asRead(meta),
      putMeta: async (m) => void (meta = copy(m)),
      allRejections: async () => [...rejections.values()].map(asRead),
      rejectionsForRecord: async (c, id) => [...rejections.values()].filter((r) => r.collection === c && r.recordId === id).map(asRead),
      putRejection: async (r) => void rejections.set(r.mutationId, copy(r)),
      deleteRejection: async (id) => void rejections.delete(id),
    };
    const result = await fn(tx);
    if (mode === 'readwrite') {
      options.beforeCommit?.(operation as Parameters<BeforeCommitHook>[0]);
      db.records = records;
      db.outbox = outbox;
      db.rejections = rejections;
      db.meta = meta;
    }
    return result;
  };

  // Transactions run one after another, as IndexedDB serialises overlapping read-write transactions.
  const run = <T>(mode: 'readonly' | 'readwrite', operation: string, fn: (tx: StoreTx) => Promise<T>): Promise<T> => {
    const next = queue.then(() => runOne(mode, operation, fn));
    queue = next.catch(() => undefined);
    return next;
  };

  return createStoreFromTx(run, async () => {
    closed = true;
  });
}
