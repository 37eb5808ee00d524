// The sync client without a server: local validation, append-only refusals, storage-full errors that keep the
// outbox, and the triggers that start a sync (online event, tab visible again, local writes).
import { describe, expect, it } from 'vitest';
import { createSyncClient } from '../../sync/engine/sync-client';
import { MemoryDatabase, createMemoryStore } from '../../sync/store/memory-store';
import { StorageFullError, type LocalStore } from '../../sync/store/types';
import { TransportError, type PullResponse, type PushRequest, type PushResponse, type SyncTransport } from '../../sync/protocol';
import { manualTimers } from './harness/sync-device';
import { measurementFields, supportFields } from './harness/fixtures';

const CLUB = '11111111-1111-4111-8111-111111111111';

function fakeServer() {
  const pushes: PushRequest[] = [];
  let offline = false;
  const transport: SyncTransport & { setOffline(v: boolean): void } = {
    setOffline: (v) => (offline = v),
    async push(req) {
      if (offline) throw new TransportError('offline', 'no network');
      pushes.push(req);
      return { type: 'pushed', lastAppliedMutationId: Math.max(0, ...req.mutations.map((m) => m.mutationId)), rejected: [], serverTimeMs: 1_000 } satisfies PushResponse;
    },
    async pull() {
      if (offline) throw new TransportError('offline', 'no network');
      return { type: 'changes', changes: [], cursor: '0', hasMore: false, serverTimeMs: 1_000 } satisfies PullResponse;
    },
  };
  return { pushes, transport };
}

class FakeTarget {
  listeners = new Map<string, (() => void)[]>();
  visibilityState = 'visible';
  addEventListener(t: string, l: () => void) {
    this.listeners.set(t, [...(this.listeners.get(t) ?? []), l]);
  }
  removeEventListener(t: string, l: () => void) {
    this.listeners.set(t, (this.listeners.get(t) ?? []).filter((x) => x !== l));
  }
  emit(t: string) {
    for (const l of this.listeners.get(t) ?? []) l();
  }
}

async function client(store: LocalStore = createMemoryStore(), transport: SyncTransport = fakeServer().transport, extra = {}) {
  return createSyncClient({ store, transport, clock: { nowMs: () => 1_000 }, random: () => 0.5, deviceId: 'unit-device', clubId: CLUB, timers: manualTimers, ...extra });
}

describe('sync client local writes', () => {
  it('refuses invalid fields with the field named, and stores nothing', async () => {
    const store = createMemoryStore();
    const c = await client(store);
    await expect(c.create('supports', supportFields('Oak', { heightM: -2 }))).rejects.toThrow(/heightM: height must be above 0/);
    const id = await c.create('supports', supportFields('Oak'));
    await expect(c.update('supports', id, { lat: 123 })).rejects.toThrow(/lat: latitude must be between -90 and 90/);
    expect(await store.pendingCount()).toBe(1);
    expect(await c.get('supports', id)).toMatchObject({ label: 'Oak', lat: 44.5012, maxEnds: 2, notes: '' });
  });

  it('a refused change the person dismissed is forgotten on the device: the refused count drops and the record is synced again', async () => {
    const refusing: SyncTransport = {
      async push(req) {
        const m = req.mutations[0]!;
        return { type: 'pushed', lastAppliedMutationId: m.mutationId, rejected: [{ mutationId: m.mutationId, collection: m.collection, recordId: m.recordId, op: m.op, code: 'forbidden', message: 'your role may not do this' }], serverTimeMs: 1_000 } satisfies PushResponse;
      },
      pull: fakeServer().transport.pull,
    };
    const c = await client(createMemoryStore(), refusing);
    const id = await c.create('supports', supportFields('Oak'));
    await c.syncNow();
    const [refused] = await c.rejections();
    expect(refused).toMatchObject({ recordId: id, code: 'forbidden' });
    expect(c.status().rejectedCount).toBe(1);
    expect(c.deviceId).toBe('unit-device');
    await c.dismissRejection(refused!.mutationId);
    expect(await c.rejections()).toEqual([]);
    await expect.poll(() => c.status().rejectedCount).toBe(0);
    expect(await c.recordSyncState('supports', id)).toBe('synced');
  });

  it('keeps measurements as taken (append-only) and review decisions beyond withdrawal', async () => {
    const c = await client();
    const m = await c.create('measurements', measurementFields('33333333-3333-4333-8333-333333333333', 14));
    await expect(c.update('measurements', m, { valueM: 15 })).rejects.toThrow(/kept as recorded/);
    await c.remove('measurements', m);
    expect(await c.get('measurements', m)).toBeNull();
  });

  it('reports a full device as a status error and keeps the outbox as it was', async () => {
    const db = new MemoryDatabase();
    const inner = createMemoryStore(db);
    let full = false;
    const store: LocalStore = { ...inner, writeLocal: (...a) => (full ? Promise.reject(new StorageFullError()) : inner.writeLocal(...a)) };
    const c = await client(store);
    await c.create('supports', supportFields('Kept'));
    full = true;
    await expect(c.create('supports', supportFields('Lost?'))).rejects.toBeInstanceOf(StorageFullError);
    expect(c.status().error?.code).toBe('storage-full');
    expect(await inner.pendingCount()).toBe(1);
  });
});

describe('push batches', () => {
  it('halves the batch when the server answers 413 (body too large) until it fits', async () => {
    const server = fakeServer();
    const sizes: number[] = [];
    const transport: SyncTransport = {
      push: async (req) => {
        sizes.push(req.mutations.length);
        if (req.mutations.length > 3) throw new TransportError('bad-request', 'payload too large', 413);
        return server.transport.push(req);
      },
      pull: (req) => server.transport.pull(req),
    };
    const store = createMemoryStore();
    const c = await client(store, transport, { pushBatch: 10 });
    for (let i = 0; i < 7; i++) await c.create('supports', supportFields(`T${i}`));
    await c.syncNow();
    expect(sizes).toEqual([7, 5, 2, 2, 2, 1]); // batch size 10 → 5 → 2: the pending seven go 2 + 2 + 2 + 1
    expect(await store.pendingCount()).toBe(0);
  });
});

describe('sync triggers', () => {
  it('syncs on start, when the network comes back and when the tab is visible again; offline is a state, not an error', async () => {
    const server = fakeServer();
    const win = new FakeTarget();
    const doc = new FakeTarget();
    const c = await client(createMemoryStore(), server.transport, { triggers: { window: win, document: doc, navigator: { onLine: true } } });
    await c.create('supports', supportFields('First'));
    server.transport.setOffline(true);
    await c.start();
    await c.syncNow();
    expect(c.status()).toMatchObject({ online: false, error: null, pendingChanges: 1 });
    server.transport.setOffline(false);
    win.emit('online');
    await c.syncNow();
    expect(server.pushes).toHaveLength(1);
    expect(c.status()).toMatchObject({ online: true, pendingChanges: 0 });
    await c.create('supports', supportFields('Second'));
    doc.emit('visibilitychange');
    await c.syncNow();
    expect(server.pushes.map((p) => p.mutations.length)).toEqual([1, 1]);
    expect(c.status().lastSyncedAt).toBe(new Date(1_000).toISOString());
    await c.stop();
  });
});
