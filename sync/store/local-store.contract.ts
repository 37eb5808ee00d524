import { describe, expect, it } from 'vitest';
import { encodeHlc, type WireRecord } from '../protocol';
import type { BeforeCommitHook, LocalStore, OutboxDraft } from './types';

/*
 * The LocalStore contract, run against every implementation (memory-store and idb-store over fake-indexeddb).
 * `open(name, hook)` opens (or reopens, after a simulated crash) the database called `name`.
 */

export type OpenStore = (name: string, beforeCommit?: BeforeCommitHook) => Promise<LocalStore>;

const CLUB = '11111111-1111-4111-8111-111111111111';
const SITE = '22222222-2222-4222-8222-222222222222';
const REC = '33333333-3333-4333-8333-333333333333';
const NODE = 'device-a';
const clock = (ms: number, c = 0, node = NODE) => encodeHlc({ wallMs: ms, counter: c, node });

function draft(fields: Record<string, unknown>, ms: number, op: OutboxDraft['op'] = 'upsert', id = REC): OutboxDraft {
  return { collection: 'supports', recordId: id, op, fields, baseClocks: {}, clock: clock(ms), madeAt: new Date(ms).toISOString() };
}

function wire(fields: Record<string, unknown>, seq: number, id = REC): WireRecord {
  return {
    collection: 'supports',
    id,
    clubId: CLUB,
    fields,
    fieldClocks: Object.fromEntries(Object.keys(fields).map((k) => [k, clock(1000, 0, 'server')])),
    deletedAt: null,
    deletedClock: null,
    createdAt: '2026-12-01T10:00:00.000Z',
    updatedAt: '2026-12-01T10:00:00.000Z',
    changeSeq: String(seq),
  };
}

let dbCount = 0;
const freshName = () => `contract-${Date.now()}-${dbCount++}`;

export function localStoreContract(label: string, open: OpenStore): void {
  describe(`LocalStore contract: ${label}`, () => {
    it('hands out per-device mutation ids 1, 2, 3 and shows the pending change in the view', async () => {
      const store = await open(freshName());
      const a = await store.writeLocal(draft({ siteId: SITE, label: 'Oak 1', heightM: 18 }, 1000), CLUB);
      const b = await store.writeLocal(draft({ heightM: 19 }, 2000), CLUB);
      expect([a.mutationId, b.mutationId]).toEqual([1, 2]);
      expect(b.view?.fields).toMatchObject({ label: 'Oak 1', heightM: 19 });
      expect(await store.pendingCount()).toBe(2);
      expect((await store.pendingOutbox(10)).map((e) => e.mutationId)).toEqual([1, 2]);
      expect(await store.recordSyncState('supports', REC)).toBe('pending');
      expect((await store.getMeta()).nextMutationId).toBe(3);
    });

    it('writes a record change and its outbox entry in one transaction: a failure before commit leaves neither', async () => {
      let fail = false;
      const store = await open(freshName(), (op) => {
        if (fail && op === 'write-local') throw new Error('simulated crash before commit');
      });
      await store.writeLocal(draft({ siteId: SITE, label: 'Oak 1' }, 1000), CLUB);
      fail = true;
      await expect(store.writeLocal(draft({ label: 'Oak 2' }, 2000), CLUB)).rejects.toThrow('simulated crash');
      fail = false;
      expect((await store.getRecord('supports', REC))?.view?.fields.label).toBe('Oak 1');
      expect(await store.pendingCount()).toBe(1);
      expect((await store.getMeta()).nextMutationId).toBe(2);
    });

    it('keeps everything across a restart from the same database', async () => {
      const name = freshName();
      const first = await open(name);
      await first.writeLocal(draft({ siteId: SITE, label: 'Oak 1' }, 1000), CLUB);
      await first.applyPullPage({ records: [], cursor: '42', final: false, meta: { clockOffsetMs: -5 } });
      await first.close();
      const again = await open(name);
      expect(await again.pendingCount()).toBe(1);
      expect(await again.getMeta()).toMatchObject({ cursor: '42', nextMutationId: 2, clockOffsetMs: -5 });
      expect((await again.getRecord('supports', REC))?.view?.fields.label).toBe('Oak 1');
    });

    it('marks confirmed changes, moves refused ones to the rejected list with their fields, and rebuilds the view', async () => {
      const store = await open(freshName());
      await store.applyPullPage({ records: [wire({ siteId: SITE, label: 'Oak 1', heightM: 18 }, 5)], cursor: '5', final: true });
      await store.writeLocal(draft({ label: 'Oak One' }, 2000), CLUB);
      await store.writeLocal(draft({ heightM: -3 }, 3000), CLUB);
      await store.markPushed(2, [{ mutationId: 2, collection: 'supports', recordId: REC, op: 'upsert', code: 'invalid', message: 'heightM: height must be above 0' }]);
      expect(await store.pendingCount()).toBe(0);
      const view = (await store.getRecord('supports', REC))?.view;
      expect(view?.fields).toMatchObject({ label: 'Oak One', heightM: 18 });
      const refused = await store.rejections();
      expect(refused).toHaveLength(1);
      expect(refused[0]).toMatchObject({ mutationId: 2, code: 'invalid', fields: { heightM: -3 } });
      expect(await store.recordSyncState('supports', REC)).toBe('rejected');
      // A new change to the record supersedes the refusal.
      await store.writeLocal(draft({ heightM: 3 }, 4000), CLUB);
      expect(await store.rejections()).toHaveLength(0);
    });

    it('forgets a refusal the person dismissed, and the record is no longer shown as refused', async () => {
      const store = await open(freshName());
      await store.applyPullPage({ records: [wire({ siteId: SITE, label: 'Oak 1', heightM: 18 }, 5)], cursor: '5', final: true });
      await store.writeLocal(draft({ heightM: -3 }, 2000), CLUB);
      await store.markPushed(1, [{ mutationId: 1, collection: 'supports', recordId: REC, op: 'upsert', code: 'invalid', message: 'heightM: height must be above 0' }]);
      expect(await store.recordSyncState('supports', REC)).toBe('rejected');
      await store.dismissRejection(99); // unknown: nothing happens
      expect(await store.rejections()).toHaveLength(1);
      await store.dismissRejection(1);
      expect(await store.rejections()).toEqual([]);
      expect(await store.recordSyncState('supports', REC)).toBe('synced');
    });

    it('applies a pull page with its cursor, keeps unsynced changes on top, and drops confirmed ones on the last page', async () => {
      const store = await open(freshName());
      await store.writeLocal(draft({ siteId: SITE, label: 'Mine' }, 1000), CLUB);
      await store.writeLocal(draft({ notes: 'pending' }, 1500), CLUB);
      await store.markPushed(1, []);
      await store.applyPullPage({ records: [wire({ siteId: SITE, label: 'Server', notes: '' }, 7)], cursor: '7', final: false });
      let view = (await store.getRecord('supports', REC))?.view;
      expect(view?.fields).toMatchObject({ label: 'Mine', notes: 'pending' });
      await store.applyPullPage({ records: [], cursor: '7', final: true });
      view = (await store.getRecord('supports', REC))?.view;
      expect(view?.fields).toMatchObject({ label: 'Server', notes: 'pending' });
      expect((await store.getMeta()).cursor).toBe('7');
      expect(await store.recordSyncState('supports', REC)).toBe('pending');
    });

    it('rolls back a pull page and its cursor together when the transaction fails', async () => {
      let fail = false;
      const store = await open(freshName(), (op) => {
        if (fail && op === 'apply-pull-page') throw new Error('simulated crash between page and cursor');
      });
      await store.applyPullPage({ records: [wire({ siteId: SITE, label: 'v1' }, 3)], cursor: '3', final: true });
      fail = true;
      await expect(store.applyPullPage({ records: [wire({ siteId: SITE, label: 'v2' }, 9)], cursor: '9', final: true })).rejects.toThrow('simulated crash');
      fail = false;
      expect((await store.getMeta()).cursor).toBe('3');
      expect((await store.getRecord('supports', REC))?.base?.fields.label).toBe('v1');
    });

    it('forgets server copies and the cursor for a resync but keeps unsynced changes', async () => {
      const other = '44444444-4444-4444-8444-444444444444';
      const store = await open(freshName());
      await store.applyPullPage({ records: [wire({ siteId: SITE, label: 'server only' }, 3, other)], cursor: '3', final: true });
      await store.writeLocal(draft({ siteId: SITE, label: 'unsynced' }, 1000), CLUB);
      await store.resetForResync();
      expect((await store.getMeta()).cursor).toBe('0');
      expect(await store.getRecord('supports', other)).toBeNull();
      expect((await store.getRecord('supports', REC))?.view?.fields.label).toBe('unsynced');
      expect(await store.pendingCount()).toBe(1);
    });

    it('lists the records of one collection, deleted ones included with their deletion time', async () => {
      const store = await open(freshName());
      await store.writeLocal(draft({ siteId: SITE, label: 'a' }, 1000), CLUB);
      await store.writeLocal(draft({}, 2000, 'delete'), CLUB);
      const rows = await store.listRecords('supports');
      expect(rows).toHaveLength(1);
      expect(rows[0].view?.deletedAt).toBe(new Date(2000).toISOString());
      expect(await store.listRecords('hazards')).toEqual([]);
      const views = await store.listViews('supports');
      expect(views).toEqual([rows[0].view]);
      expect(await store.getView('supports', REC)).toEqual(rows[0].view);
      expect(await store.getView('hazards', REC)).toBeNull();
    });
  });
}
