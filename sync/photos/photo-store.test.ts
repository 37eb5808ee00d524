import 'fake-indexeddb/auto';
import { openDB } from 'idb';
import { openIdbPhotoStore } from './idb-photo-store';
import { MemoryPhotoDatabase, createMemoryPhotoStore } from './memory-photo-store';
import { photoStoreContract } from './photo-store.contract';

const memoryDbs = new Map<string, MemoryPhotoDatabase>();
const memoryDb = (name: string) => {
  if (!memoryDbs.has(name)) memoryDbs.set(name, new MemoryPhotoDatabase());
  return memoryDbs.get(name)!;
};

photoStoreContract(
  'memory-photo-store',
  async (name) => createMemoryPhotoStore(memoryDb(name)),
  async (name, key) => {
    memoryDb(name).entries.set(key, { key, clubId: key.split('/')[0], state: 'lost-in-the-woods' });
  },
);

// IndexedDB through idb, on fake-indexeddb (a spec-following IndexedDB for Node).
photoStoreContract(
  'idb-photo-store (fake-indexeddb)',
  (name) => openIdbPhotoStore(name),
  async (name, key) => {
    const db = await openDB(name);
    await db.put('photos', { key, clubId: key.split('/')[0], state: 'lost-in-the-woods' });
    db.close();
  },
);
