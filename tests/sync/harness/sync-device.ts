// A simulated device for sync tests: a SyncClient over a LocalStore (memory or fake-indexeddb) talking to a real
// test server, with injectable clock, randomness and transport wrapper. Restart = drop the client and build a new
// one on the same database (what a crash or a closed tab does).
import { createFetchTransport } from '../../../sync/transport/fetch-transport';
import { createSyncClient, type SyncClient } from '../../../sync/engine/sync-client';
import { MemoryDatabase, createMemoryStore } from '../../../sync/store/memory-store';
import { openIdbStore } from '../../../sync/store/idb-store';
import type { SyncTransport } from '../../../sync/protocol';
import type { BeforeCommitHook, LocalStore } from '../../../sync/store/types';
import type { Timers } from '../../../sync/engine/scheduler';

/** Timers that never fire: tests drive syncs by hand with syncNow(). */
export const manualTimers: Timers = { setTimeout: () => 0, clearTimeout: () => undefined };

export interface DeviceSpec {
  baseUrl: string;
  clubId: string;
  token: string;
  deviceId: string;
  nowMs: () => number;
  random?: () => number;
  newId?: () => string;
  /** 'memory' (default) or 'idb' (fake-indexeddb must be loaded by the test). */
  storage?: 'memory' | 'idb';
  wrapTransport?: (t: SyncTransport) => SyncTransport;
  beforeCommit?: BeforeCommitHook;
  pushBatch?: number;
  pullLimit?: number;
  /** Wraps the store (e.g. to watch every local write for an oracle). */
  wrapStore?: (s: LocalStore) => LocalStore;
}

export class SimDevice {
  client!: SyncClient;
  store!: LocalStore;
  private readonly memory = new MemoryDatabase();
  restarts = 0;

  constructor(readonly spec: DeviceSpec) {}

  async boot(): Promise<this> {
    const s = this.spec;
    this.store =
      s.storage === 'idb' ? await openIdbStore({ name: `sim-${s.deviceId}`, beforeCommit: s.beforeCommit }) : createMemoryStore(this.memory, { beforeCommit: s.beforeCommit });
    if (s.wrapStore) this.store = s.wrapStore(this.store);
    const fetchTransport = createFetchTransport({ baseUrl: s.baseUrl, clubId: s.clubId, getAccessToken: async () => s.token });
    this.client = await createSyncClient({
      store: this.store,
      transport: s.wrapTransport ? s.wrapTransport(fetchTransport) : fetchTransport,
      clock: { nowMs: s.nowMs },
      random: s.random ?? Math.random,
      deviceId: s.deviceId,
      clubId: s.clubId,
      newId: s.newId,
      timers: manualTimers,
      pushBatch: s.pushBatch,
      pullLimit: s.pullLimit,
    });
    return this;
  }

  /** Crash: forget the client (and its in-memory state) and start again from the stored database. */
  async restart(): Promise<void> {
    await this.client.stop();
    await this.store.close();
    this.restarts += 1;
    await this.boot();
  }

  /** One sync; throws the sync error (if any) so tests see it. */
  async sync(): Promise<void> {
    await this.client.syncNow();
  }
}
