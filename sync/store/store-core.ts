import type { CollectionName } from '../../shared/schemas';
import type { Rejection } from '../protocol';
import { materialize } from './materialize';
import {
  INITIAL_META,
  localRejectionSchema,
  localViewSchema,
  outboxEntrySchema,
  recordEntrySchema,
  syncMetaSchema,
  type BeforeCommitHook,
  type LocalRejection,
  type LocalStore,
  type LocalView,
  type OutboxDraft,
  type OutboxEntry,
  type PullPage,
  type RecordEntry,
  type RecordSyncState,
  type SyncMeta,
} from './types';

/*
 * The store's rules written once over a minimal transaction interface; idb-store.ts and memory-store.ts
 * supply the transactions. Everything read back is parsed with zod (the database may hold anything: an older
 * version's data, a damaged entry, another tab's writes).
 */

export interface StoreTx {
  getRecord(collection: CollectionName, id: string): Promise<unknown>;
  putRecord(entry: RecordEntry): Promise<void>;
  allRecords(collection: CollectionName): Promise<unknown[]>;
  clearRecords(): Promise<void>;
  getOutbox(mutationId: number): Promise<unknown>;
  allOutbox(): Promise<unknown[]>;
  /** The oldest `limit` entries still waiting to be sent, in mutation order. */
  pendingOutbox(limit: number): Promise<unknown[]>;
  countPending(): Promise<number>;
  outboxForRecord(collection: CollectionName, id: string): Promise<unknown[]>;
  putOutbox(entry: OutboxEntry): Promise<void>;
  deleteOutbox(mutationId: number): Promise<void>;
  getMeta(): Promise<unknown>;
  putMeta(meta: SyncMeta): Promise<void>;
  allRejections(): Promise<unknown[]>;
  rejectionsForRecord(collection: CollectionName, id: string): Promise<unknown[]>;
  putRejection(r: LocalRejection): Promise<void>;
  deleteRejection(mutationId: number): Promise<void>;
}

export type TxMode = 'readonly' | 'readwrite';
export type RunTx = <T>(mode: TxMode, operation: Parameters<BeforeCommitHook>[0] | 'read', fn: (tx: StoreTx) => Promise<T>) => Promise<T>;

const parseOutbox = (rows: unknown[]) => rows.map((r) => outboxEntrySchema.parse(r));
const parseMeta = (row: unknown): SyncMeta => (row === undefined ? { ...INITIAL_META } : syncMetaSchema.parse(row));

async function rebuild(tx: StoreTx, collection: CollectionName, id: string, clubId: string | null): Promise<void> {
  const raw = await tx.getRecord(collection, id);
  const entry = raw === undefined ? null : recordEntrySchema.parse(raw);
  const pending = parseOutbox(await tx.outboxForRecord(collection, id));
  const club = clubId ?? entry?.base?.clubId ?? entry?.view?.clubId;
  if (!club) return;
  const view = materialize(entry?.base ?? null, pending, club);
  await tx.putRecord({ collection, id, base: entry?.base ?? null, view });
}

export function createStoreFromTx(run: RunTx, close: () => Promise<void>): LocalStore {
  return {
    async getRecord(collection, id) {
      const raw = await run('readonly', 'read', (tx) => tx.getRecord(collection, id));
      return raw === undefined ? null : recordEntrySchema.parse(raw);
    },
    async listRecords(collection) {
      const rows = await run('readonly', 'read', (tx) => tx.allRecords(collection));
      return rows.map((r) => recordEntrySchema.parse(r));
    },
    async listViews(collection) {
      const rows = await run('readonly', 'read', (tx) => tx.allRecords(collection));
      const views: LocalView[] = [];
      for (const r of rows) {
        const view = (r as { view?: unknown } | null)?.view;
        if (view != null) views.push(localViewSchema.parse(view));
      }
      return views;
    },
    async getView(collection, id) {
      const raw = await run('readonly', 'read', (tx) => tx.getRecord(collection, id));
      const view = (raw as { view?: unknown } | undefined)?.view;
      return view == null ? null : localViewSchema.parse(view);
    },
    writeLocal(draft: OutboxDraft, clubId: string, metaPatch?: Partial<SyncMeta>) {
      return run('readwrite', 'write-local', async (tx) => {
        const meta = parseMeta(await tx.getMeta());
        const mutationId = meta.nextMutationId;
        const entry: OutboxEntry = outboxEntrySchema.parse({ ...draft, mutationId, state: 'pending' });
        await tx.putOutbox(entry);
        await tx.putMeta(syncMetaSchema.parse({ ...meta, ...metaPatch, nextMutationId: mutationId + 1 }));
        // A new change supersedes the refusals of earlier changes to the same record.
        for (const r of await tx.rejectionsForRecord(draft.collection, draft.recordId)) {
          await tx.deleteRejection(localRejectionSchema.parse(r).mutationId);
        }
        const raw = await tx.getRecord(draft.collection, draft.recordId);
        const current = raw === undefined ? null : recordEntrySchema.parse(raw);
        const pending = parseOutbox(await tx.outboxForRecord(draft.collection, draft.recordId));
        const view: LocalView | null = materialize(current?.base ?? null, pending, clubId);
        await tx.putRecord({ collection: draft.collection, id: draft.recordId, base: current?.base ?? null, view });
        return { mutationId, view };
      });
    },
    async pendingOutbox(limit) {
      const rows = parseOutbox(await run('readonly', 'read', (tx) => tx.pendingOutbox(limit)));
      return rows.filter((e) => e.state === 'pending').sort((a, b) => a.mutationId - b.mutationId);
    },
    pendingCount() {
      return run('readonly', 'read', (tx) => tx.countPending());
    },
    markPushed(lastAppliedMutationId: number, rejected: Rejection[], metaPatch?: Partial<SyncMeta>) {
      return run('readwrite', 'mark-pushed', async (tx) => {
        const refused = new Map(rejected.map((r) => [r.mutationId, r]));
        const touched = new Map<string, { collection: CollectionName; id: string; clubId: string | null }>();
        for (const e of parseOutbox(await tx.allOutbox())) {
          if (e.mutationId > lastAppliedMutationId || e.state === 'acked') continue;
          const r = refused.get(e.mutationId);
          if (r) {
            await tx.deleteOutbox(e.mutationId);
            await tx.putRejection({ ...r, fields: e.fields, rejectedAtMs: Date.now() });
            touched.set(`${e.collection}/${e.recordId}`, { collection: e.collection, id: e.recordId, clubId: null });
          } else {
            await tx.putOutbox({ ...e, state: 'acked' });
          }
        }
        for (const t of touched.values()) await rebuild(tx, t.collection, t.id, t.clubId);
        if (metaPatch) await tx.putMeta(syncMetaSchema.parse({ ...parseMeta(await tx.getMeta()), ...metaPatch }));
      });
    },
    applyPullPage(page: PullPage) {
      return run('readwrite', 'apply-pull-page', async (tx) => {
        const outbox = parseOutbox(await tx.allOutbox());
        const dropAcked = page.final ? outbox.filter((e) => e.state === 'acked') : [];
        for (const e of dropAcked) await tx.deleteOutbox(e.mutationId);
        const remaining = page.final ? outbox.filter((e) => e.state !== 'acked') : outbox;
        const byRecord = new Map<string, OutboxEntry[]>();
        for (const e of remaining) {
          const key = `${e.collection}/${e.recordId}`;
          byRecord.set(key, [...(byRecord.get(key) ?? []), e]);
        }
        const seen = new Set<string>();
        // Queue every put before waiting: one round through the database instead of one per record.
        const puts: Promise<void>[] = [];
        for (const rec of page.records) {
          const key = `${rec.collection}/${rec.id}`;
          seen.add(key);
          puts.push(tx.putRecord({ collection: rec.collection, id: rec.id, base: rec, view: materialize(rec, byRecord.get(key) ?? [], rec.clubId) }));
        }
        await Promise.all(puts);
        for (const e of dropAcked) {
          const key = `${e.collection}/${e.recordId}`;
          if (seen.has(key)) continue;
          seen.add(key);
          await rebuild(tx, e.collection, e.recordId, null);
        }
        await tx.putMeta(syncMetaSchema.parse({ ...parseMeta(await tx.getMeta()), ...page.meta, cursor: page.cursor }));
      });
    },
    resetForResync() {
      return run('readwrite', 'reset-for-resync', async (tx) => {
        const outbox = parseOutbox(await tx.allOutbox());
        const keep: RecordEntry[] = [];
        for (const e of outbox) {
          const raw = await tx.getRecord(e.collection, e.recordId);
          const entry = raw === undefined ? null : recordEntrySchema.parse(raw);
          const clubId = entry?.view?.clubId ?? entry?.base?.clubId;
          if (!clubId || keep.some((k) => k.collection === e.collection && k.id === e.recordId)) continue;
          const mine = outbox.filter((o) => o.collection === e.collection && o.recordId === e.recordId);
          keep.push({ collection: e.collection, id: e.recordId, base: null, view: materialize(null, mine, clubId) });
        }
        await tx.clearRecords();
        for (const k of keep) await tx.putRecord(k);
        await tx.putMeta(syncMetaSchema.parse({ ...parseMeta(await tx.getMeta()), cursor: '0' }));
      });
    },
    async getMeta() {
      return parseMeta(await run('readonly', 'read', (tx) => tx.getMeta()));
    },
    setMeta(patch) {
      return run('readwrite', 'set-meta', async (tx) => {
        await tx.putMeta(syncMetaSchema.parse({ ...parseMeta(await tx.getMeta()), ...patch }));
      });
    },
    async rejections() {
      const rows = await run('readonly', 'read', (tx) => tx.allRejections());
      return rows.map((r) => localRejectionSchema.parse(r)).sort((a, b) => b.mutationId - a.mutationId);
    },
    dismissRejection(mutationId) {
      return run('readwrite', 'dismiss-rejection', (tx) => tx.deleteRejection(mutationId));
    },
    async recordSyncState(collection, id): Promise<RecordSyncState> {
      return run('readonly', 'read', async (tx) => {
        const pending = parseOutbox(await tx.outboxForRecord(collection, id));
        if (pending.some((e) => e.state === 'pending')) return 'pending';
        const refused = await tx.rejectionsForRecord(collection, id);
        return refused.length > 0 ? 'rejected' : 'synced';
      });
    },
    close,
  };
}
