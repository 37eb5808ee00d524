import { type IDBPDatabase, openDB } from 'idb';
import { settleIdbTransaction } from '../store/idb-transaction';
import { createPhotoStoreFromTx } from './photo-store-core';
import type { PhotoStore, PhotoStoreTx, QueuedPhoto } from './types';

/*
 * Photo bytes and the upload queue in IndexedDB through `idb`: a database of its own beside the records, two
 * object stores written in one transaction. Bytes are kept as ArrayBuffers (structured-clone friendly on every
 * browser we target). A full device surfaces as StorageFullError, the same as for records.
 */

const DB_VERSION = 1;
const STORES = ['photos', 'photoBytes'] as const;

/** One photo database per signed-in person on the device. */
export function idbPhotoDatabaseName(userId: string): string {
  return `loftline-photos-${userId}`;
}

async function open(name: string): Promise<IDBPDatabase> {
  return openDB(name, DB_VERSION, {
    upgrade(db) {
      const photos = db.createObjectStore('photos', { keyPath: 'key' });
      photos.createIndex('byClub', 'clubId');
      db.createObjectStore('photoBytes');
    },
  });
}

export async function openIdbPhotoStore(name: string): Promise<PhotoStore> {
  const db = await open(name);
  return createPhotoStoreFromTx(
    async (mode, fn) => {
      const tx = db.transaction([...STORES], mode);
      const photos = tx.objectStore('photos');
      const bytes = tx.objectStore('photoBytes');
      const ops: PhotoStoreTx = {
        getEntry: (key) => photos.get(key),
        putEntry: async (entry: QueuedPhoto) => void (await photos.put!(entry)),
        entriesOfClub: (clubId) => photos.index('byClub').getAll(clubId),
        getBytes: (key) => bytes.get(key),
        putBytes: async (key, data) => void (await bytes.put!(data, key)),
      };
      return settleIdbTransaction(tx, () => fn(ops));
    },
    async () => db.close(),
  );
}
