import { createPhotoStoreFromTx } from './photo-store-core';
import type { PhotoStore, PhotoStoreTx } from './types';

/**
 * The photo database in memory, for tests and platforms without IndexedDB. `MemoryPhotoDatabase` outlives its
 * store, so a simulated device can restart from the same data. Writes are staged and committed at the end of the
 * transaction, as in IndexedDB.
 */
export class MemoryPhotoDatabase {
  entries = new Map<string, unknown>();
  bytes = new Map<string, ArrayBuffer>();
}

export function createMemoryPhotoStore(db: MemoryPhotoDatabase = new MemoryPhotoDatabase()): PhotoStore {
  let queue: Promise<unknown> = Promise.resolve();
  return createPhotoStoreFromTx(
    (mode, fn) => {
      const next = queue.then(async () => {
        const entries = new Map(db.entries);
        const bytes = new Map(db.bytes);
        const ops: PhotoStoreTx = {
          getEntry: async (key) => structuredClone(entries.get(key)),
          putEntry: async (entry) => void entries.set(entry.key, structuredClone(entry)),
          entriesOfClub: async (clubId) =>
            [...entries.values()].filter((e) => (e as { clubId?: string }).clubId === clubId).map((e) => structuredClone(e)),
          getBytes: async (key) => {
            const b = bytes.get(key);
            return b ? b.slice(0) : undefined;
          },
          putBytes: async (key, data) => void bytes.set(key, data.slice(0)),
        };
        const result = await fn(ops);
        if (mode === 'readwrite') {
          db.entries = entries;
          db.bytes = bytes;
        }
        return result;
      });
      queue = next.catch(() => undefined);
      return next;
    },
    async () => undefined,
  );
}
