import { COLLECTIONS, type CollectionName, type StoredRecord } from '../../shared/schemas';
import {
  MAX_CLOCK_AHEAD_MS,
  appendOnlyRefusal,
  checkEditedFields,
  checkNewRecordFields,
  createHybridClock,
  type MutationOp,
  type SyncTransport,
} from '../protocol';
import { StorageFullError, type LocalRejection, type LocalStore, type LocalView, type RecordSyncState } from '../store/types';
import { createScheduler, realTimers, type Timers } from './scheduler';
import { createTabLeader, type TabLeaderEnv } from './tab-leader';
import { describeFailure, runSyncCycle, SyncError } from './sync-engine';
import { wireTriggers, type TriggerEnv } from './triggers';
import { randomId } from './random-id';

/** A local write the app asked for that cannot be made (the form shows the message; nothing is stored). */
export class RecordWriteError extends Error {
  constructor(
    readonly code: 'invalid' | 'not-found' | 'append-only',
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'RecordWriteError';
  }
}

export interface SyncStatus {
  pendingChanges: number;
  lastSyncedAt: string | null;
  online: boolean;
  syncing: boolean;
  error: { code: string; message: string } | null;
  /** true: the browser keeps the data; false: it may evict it under storage pressure; null: unknown. */
  storagePersisted: boolean | null;
  rejectedCount: number;
}

export interface SyncClientOptions {
  store: LocalStore;
  transport: SyncTransport;
  /** Device wall clock, epoch ms. */
  clock: { nowMs: () => number };
  /** [0, 1): backoff jitter. */
  random: () => number;
  deviceId: string;
  clubId: string;
  newId?: () => string;
  timers?: Timers;
  triggers?: TriggerEnv;
  tabs?: Omit<TabLeaderEnv, 'nowMs'>;
  /** Cross-tab change notices (BroadcastChannel in the browser). */
  createChannel?: (name: string) => { postMessage(m: unknown): void; addEventListener(t: 'message', l: (e: { data: unknown }) => void): void; close(): void };
  debounceMs?: number;
  intervalMs?: number;
  pushBatch?: number;
  pullLimit?: number;
}

export type RecordFilter = Record<string, unknown>;
export type ChangeListener = (collections: Set<CollectionName>) => void;

export interface SyncClient {
  create<C extends CollectionName>(collection: C, fields: unknown, id?: string): Promise<string>;
  update<C extends CollectionName>(collection: C, id: string, fields: Record<string, unknown>): Promise<void>;
  remove(collection: CollectionName, id: string): Promise<void>;
  undelete(collection: CollectionName, id: string): Promise<void>;
  get<C extends CollectionName>(collection: C, id: string, opts?: { includeDeleted?: boolean }): Promise<StoredRecord<C> | null>;
  list<C extends CollectionName>(collection: C, filter?: RecordFilter, opts?: { includeDeleted?: boolean }): Promise<StoredRecord<C>[]>;
  recordSyncState(collection: CollectionName, id: string): Promise<RecordSyncState>;
  rejections(): Promise<LocalRejection[]>;
  /** This device's id (the server names it on each refused change it lists). */
  readonly deviceId: string;
  /** Forget a refusal the person has read (after dismissing it on the server), so the warning goes away. */
  dismissRejection(mutationId: number): Promise<void>;
  subscribe(listener: ChangeListener): () => void;
  status(): SyncStatus;
  subscribeStatus(listener: (s: SyncStatus) => void): () => void;
  setStoragePersisted(value: boolean | null): void;
  syncNow(): Promise<void>;
  /** Load the stored state and wire the triggers (start, online, visible, timer). */
  start(): Promise<void>;
  stop(): Promise<void>;
}

function toRecord<C extends CollectionName>(view: LocalView): StoredRecord<C> {
  return { ...view.fields, id: view.id, clubId: view.clubId, createdAt: view.createdAt, updatedAt: view.updatedAt, deletedAt: view.deletedAt } as StoredRecord<C>;
}

export async function createSyncClient(opts: SyncClientOptions): Promise<SyncClient> {
  const { store, transport, clubId, deviceId } = opts;
  const meta = await store.getMeta();
  let offsetMs = meta.clockOffsetMs;
  const hlc = createHybridClock({ node: deviceId, nowMs: () => opts.clock.nowMs() + offsetMs, last: meta.hlcLast, maxFutureMs: MAX_CLOCK_AHEAD_MS });
  const newId = opts.newId ?? randomId;
  const listeners = new Set<ChangeListener>();
  const statusListeners = new Set<(s: SyncStatus) => void>();
  let status: SyncStatus = {
    pendingChanges: await store.pendingCount(),
    lastSyncedAt: meta.lastSyncedAtMs === null ? null : new Date(meta.lastSyncedAtMs).toISOString(),
    online: opts.triggers?.navigator?.onLine ?? true,
    syncing: false,
    error: null,
    storagePersisted: null,
    rejectedCount: (await store.rejections()).length,
  };
  const setStatus = (patch: Partial<SyncStatus>) => {
    status = { ...status, ...patch };
    for (const l of statusListeners) l(status);
  };
  let stopped = false;
  const refreshCounts = async () => {
    if (stopped) return;
    try {
      const [pendingChanges, rejected, m] = await Promise.all([store.pendingCount(), store.rejections(), store.getMeta()]);
      setStatus({ pendingChanges, rejectedCount: rejected.length, lastSyncedAt: m.lastSyncedAtMs === null ? null : new Date(m.lastSyncedAtMs).toISOString() });
    } catch {
      // The counts are refreshed again after the next write or sync; a closed or busy store is not worth an error.
    }
  };
  const channel = opts.createChannel?.(`loftline-sync-changes-${clubId}`);
  const notify = (collections: Set<CollectionName>, fromOtherTab = false) => {
    for (const l of listeners) l(collections);
    if (!fromOtherTab) channel?.postMessage({ type: 'changed', collections: [...collections] });
    void refreshCounts();
  };

  const leader = createTabLeader(`loftline-sync-${clubId}`, { ...opts.tabs, tabId: opts.tabs?.tabId ?? deviceId, nowMs: opts.clock.nowMs });
  const scheduler = createScheduler({
    random: opts.random,
    timers: opts.timers ?? realTimers,
    debounceMs: opts.debounceMs ?? 1_500,
    intervalMs: opts.intervalMs ?? 60_000,
    run: async () => {
      await leader.runExclusive(async () => {
        setStatus({ syncing: true });
        try {
          await runSyncCycle({
            store,
            transport,
            hlc,
            deviceId,
            deviceNowMs: opts.clock.nowMs,
            onChanged: (c) => notify(c),
            setClockOffset: (o) => {
              offsetMs = o;
            },
            pushBatch: opts.pushBatch,
            pullLimit: opts.pullLimit,
          });
        } finally {
          setStatus({ syncing: false });
        }
      });
    },
    onOutcome: (error) => {
      if (error === null) {
        setStatus({ error: null, online: true });
        void refreshCounts();
        return false;
      }
      const e = describeFailure(error);
      setStatus({ error: e.code === 'offline' ? null : { code: e.code, message: e.message }, online: e.code === 'offline' ? false : status.online });
      void refreshCounts();
      return e.code !== 'client-too-old' && e.code !== 'server-too-old';
    },
  });

  channel?.addEventListener('message', (event) => {
    const d = event.data as { type?: string; collections?: CollectionName[] } | null;
    if (d?.type === 'changed') {
      notify(new Set(d.collections ?? []), true);
      scheduler.soon();
    }
  });

  const write = async (collection: CollectionName, recordId: string, op: MutationOp, fields: Record<string, unknown>, baseClocks: Record<string, string | null>) => {
    const madeAt = new Date(opts.clock.nowMs()).toISOString();
    try {
      await store.writeLocal({ collection, recordId, op, fields, baseClocks, clock: hlc.tick(), madeAt }, clubId, { hlcLast: hlc.last() });
    } catch (err) {
      if (err instanceof StorageFullError) setStatus({ error: { code: err.code, message: err.message } });
      throw err;
    }
    notify(new Set([collection]));
    scheduler.soon();
  };

  const current = async (collection: CollectionName, id: string) => {
    const entry = await store.getRecord(collection, id);
    if (!entry?.view) throw new RecordWriteError('not-found', `no such record in ${collection} on this device`);
    return entry;
  };

  let stopTriggers: (() => void) | null = null;

  return {
    async create(collection, fields, id = newId()) {
      const checked = checkNewRecordFields(collection, fields);
      if (!checked.ok) throw new RecordWriteError('invalid', checked.message, checked.details);
      const existing = await store.getRecord(collection, id);
      if (existing?.view) throw new RecordWriteError('invalid', `a record with id ${id} already exists`);
      const baseClocks = Object.fromEntries(Object.keys(checked.fields).map((k) => [k, null]));
      await write(collection, id, 'upsert', checked.fields, baseClocks);
      return id;
    },
    async update(collection, id, fields) {
      const entry = await current(collection, id);
      const refusal = appendOnlyRefusal(collection, 'upsert', true);
      if (refusal) throw new RecordWriteError('append-only', refusal);
      const checked = checkEditedFields(collection, fields);
      if (!checked.ok) throw new RecordWriteError('invalid', checked.message, checked.details);
      const whole = COLLECTIONS[collection].fields.safeParse({ ...entry.view!.fields, ...checked.fields });
      if (!whole.success) {
        const issue = whole.error.issues[0];
        throw new RecordWriteError('invalid', `${issue?.path.join('.') || 'record'}: ${issue?.message ?? 'invalid'}`, whole.error.issues);
      }
      if (Object.keys(checked.fields).length === 0) return;
      const baseClocks = Object.fromEntries(Object.keys(checked.fields).map((k) => [k, entry.base?.fieldClocks[k] ?? null]));
      await write(collection, id, 'upsert', checked.fields, baseClocks);
    },
    async remove(collection, id) {
      const entry = await current(collection, id);
      const refusal = appendOnlyRefusal(collection, 'delete', true);
      if (refusal) throw new RecordWriteError('append-only', refusal);
      if (entry.view!.deletedAt) return;
      await write(collection, id, 'delete', {}, {});
    },
    async undelete(collection, id) {
      const entry = await current(collection, id);
      const refusal = appendOnlyRefusal(collection, 'undelete', true);
      if (refusal) throw new RecordWriteError('append-only', refusal);
      if (!entry.view!.deletedAt) return;
      await write(collection, id, 'undelete', {}, {});
    },
    async get<C extends CollectionName>(collection: C, id: string, o: { includeDeleted?: boolean } = {}): Promise<StoredRecord<C> | null> {
      const view = await store.getView(collection, id);
      if (!view || (view.deletedAt && !o.includeDeleted)) return null;
      return toRecord<C>(view);
    },
    async list<C extends CollectionName>(collection: C, filter: RecordFilter = {}, o: { includeDeleted?: boolean } = {}): Promise<StoredRecord<C>[]> {
      const views = await store.listViews(collection);
      const keys = Object.entries(filter);
      return views
        .filter((v) => o.includeDeleted || v.deletedAt === null)
        .filter((v) => keys.every(([k, want]) => v.fields[k] === want))
        .sort((a, b) => (a.createdAt < b.createdAt ? -1 : a.createdAt > b.createdAt ? 1 : a.id < b.id ? -1 : 1))
        .map((v) => toRecord<C>(v));
    },
    recordSyncState: (collection, id) => store.recordSyncState(collection, id),
    rejections: () => store.rejections(),
    deviceId,
    async dismissRejection(mutationId) {
      const refused = (await store.rejections()).find((r) => r.mutationId === mutationId);
      if (!refused) return;
      await store.dismissRejection(mutationId);
      notify(new Set([refused.collection]));
    },
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    status: () => status,
    subscribeStatus(listener) {
      statusListeners.add(listener);
      return () => statusListeners.delete(listener);
    },
    setStoragePersisted(value) {
      setStatus({ storagePersisted: value });
    },
    syncNow: () => scheduler.now(),
    async start() {
      stopTriggers = wireTriggers(opts.triggers ?? {}, {
        onOnline: () => {
          setStatus({ online: true });
          void scheduler.now();
        },
        onOffline: () => setStatus({ online: false }),
        onVisible: () => void scheduler.now(),
      });
      scheduler.start();
    },
    async stop() {
      stopped = true;
      stopTriggers?.();
      scheduler.stop();
      leader.close();
      channel?.close();
    },
  };
}

export { SyncError };
