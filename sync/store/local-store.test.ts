import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import { openIdbStore } from './idb-store';
import { localStoreContract } from './local-store.contract';
import { MemoryDatabase, createMemoryStore } from './memory-store';

const memoryDbs = new Map<string, MemoryDatabase>();
localStoreContract('memory-store', async (name, beforeCommit) => {
  if (!memoryDbs.has(name)) memoryDbs.set(name, new MemoryDatabase());
  return createMemoryStore(memoryDbs.get(name), { beforeCommit });
});

// IndexedDB through idb, on fake-indexeddb (a spec-following IndexedDB for Node).
localStoreContract('idb-store (fake-indexeddb)', (name, beforeCommit) => openIdbStore({ name, beforeCommit }));

describe('stored data is parsed on every read', () => {
  it('refuses a damaged entry rather than handing it to the app (memory-store)', async () => {
    const db = new MemoryDatabase();
    db.records.set('supports/x', { collection: 'supports', id: 'not-a-uuid', base: null, view: null });
    const store = createMemoryStore(db);
    await expect(store.listRecords('supports')).rejects.toThrow();
  });
});
