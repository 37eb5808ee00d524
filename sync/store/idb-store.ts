import { openDB, type IDBPDatabase, type IDBPTransaction } from 'idb';
import type { CollectionName } from '../../shared/schemas';
import { createStoreFromTx, type StoreTx, type TxMode } from './store-core';
import { settleIdbTransaction } from './idb-transaction';
import type { BeforeCommitHook, LocalStore } from './types';

/*
 * The device database in IndexedDB through `idb`. One database per signed-in person and club, four object
 * stores; every LocalStore method is a single IndexedDB transaction over all of them, so a record change and its
 * outbox entry (or a pull page and its cursor) commit together or not at all (idb-transaction.ts waits for the commit).
 */

const DB_VERSION = 1;
const STORES = ['records', 'outbox', 'rejections', 'meta'] as const;
const META_KEY = 'sync';

type Tx = IDBPTransaction<unknown, typeof STORES extends readonly (infer S)[] ? S[] : never, 'readonly' | 'readwrite'>;

export interface IdbStoreOptions {
  /** Database name, e.g. `loftline-<userId>-<clubId>`. */
  name: string;
  beforeCommit?: BeforeCommitHook;
}

export function idbDatabaseName(userId: string, clubId: string): string {
  return `loftline-sync-${userId}-${clubId}`;
}

async function open(name: string): Promise<IDBPDatabase> {
  return openDB(name, DB_VERSION, {
    upgrade(db) {
      const records = db.createObjectStore('records', { keyPath: ['collection', 'id'] });
      records.createIndex('byCollection', 'collection');
      const outbox = db.createObjectStore('outbox', { keyPath: 'mutationId' });
      outbox.createIndex('byRecord', ['collection', 'recordId']);
      // Within one state the index keeps primary-key (mutation id) order: the oldest pending entries come first.
      outbox.createIndex('byState', 'state');
      const rejections = db.createObjectStore('rejections', { keyPath: 'mutationId' });
      rejections.createIndex('byRecord', ['collection', 'recordId']);
      db.createObjectStore('meta');
    },
  });
}

function txOps(tx: Tx): StoreTx {
  const s = (name: (typeof STORES)[number]) => tx.objectStore(name);
  const write = (name: (typeof STORES)[number]) => s(name) as unknown as { put: (v: unknown, k?: IDBValidKey) => Promise<unknown>; delete: (k: IDBValidKey) => Promise<void>; clear: () => Promise<void> };
  return {
    getRecord: (c, id) => s('records').get([c, id]),
    putRecord: async (e) => void (await write('records').put(e)),
    allRecords: (c: CollectionName) => s('records').index('byCollection').getAll(c),
    clearRecords: () => write('records').clear(),
    getOutbox: (id) => s('outbox').get(id),
    allOutbox: () => s('outbox').getAll(),
    pendingOutbox: (limit) => s('outbox').index('byState').getAll('pending', limit),
    countPending: () => s('outbox').index('byState').count('pending'),
    outboxForRecord: (c, id) => s('outbox').index('byRecord').getAll([c, id]),
    putOutbox: async (e) => void (await write('outbox').put(e)),
    deleteOutbox: (id) => write('outbox').delete(id),
    getMeta: () => s('meta').get(META_KEY),
    putMeta: async (m) => void (await write('meta').put(m, META_KEY)),
    allRejections: () => s('rejections').getAll(),
    rejectionsForRecord: (c, id) => s('rejections').index('byRecord').getAll([c, id]),
    putRejection: async (r) => void (await write('rejections').put(r)),
    deleteRejection: (id) => write('rejections').delete(id),
  };
}

export async function openIdbStore(options: IdbStoreOptions): Promise<LocalStore> {
  const db = await open(options.name);
  const run = async <T>(mode: TxMode, operation: string, fn: (tx: StoreTx) => Promise<T>): Promise<T> => {
    const tx = db.transaction([...STORES], mode) as unknown as Tx;
    return settleIdbTransaction(tx, async () => {
      const result = await fn(txOps(tx));
      if (mode === 'readwrite') options.beforeCommit?.(operation as Parameters<BeforeCommitHook>[0]);
      return result;
    });
  };
  return createStoreFromTx(run, async () => db.close());
}
