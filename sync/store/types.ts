import { z } from 'zod';
import { collectionNameSchema, idSchema, isoInstantSchema, type CollectionName } from '../../shared/schemas';
import { cursorSchema, hlcNodeSchema, hlcStringSchema, mutationSchema, rejectionSchema, wireRecordSchema, type Rejection, type WireRecord } from '../protocol';

/** What the app sees of a record: the server's copy with this device's unsynced changes laid over it. */
export const localViewSchema = z.strictObject({
  collection: collectionNameSchema,
  id: idSchema,
  clubId: idSchema,
  fields: z.record(z.string(), z.unknown()),
  createdAt: isoInstantSchema,
  updatedAt: isoInstantSchema,
  deletedAt: isoInstantSchema.nullable(),
});
export type LocalView = z.infer<typeof localViewSchema>;

/** One record on the device: the last copy the server sent (null before the first pull) and the view. */
export const recordEntrySchema = z.strictObject({
  collection: collectionNameSchema,
  id: idSchema,
  base: wireRecordSchema.nullable(),
  view: localViewSchema.nullable(),
});
export type RecordEntry = z.infer<typeof recordEntrySchema>;

/**
 * A change waiting in the outbox. "pending": not yet confirmed; "acked": the server confirmed it, and it stays
 * laid over the record until the pull that follows has brought the server's copy (so nothing flickers back).
 */
export const outboxEntrySchema = mutationSchema.extend({
  state: z.enum(['pending', 'acked']),
  /** When the person made the change, by the device clock (shown as updatedAt until the server answers). */
  madeAt: isoInstantSchema,
});
export type OutboxEntry = z.infer<typeof outboxEntrySchema>;
export type OutboxDraft = Omit<OutboxEntry, 'mutationId' | 'state'>;

/** A change the server refused, kept with its fields so that nothing typed is lost. */
export const localRejectionSchema = rejectionSchema.extend({
  fields: z.record(z.string(), z.unknown()),
  rejectedAtMs: z.number(),
});
export type LocalRejection = z.infer<typeof localRejectionSchema>;

export const syncMetaSchema = z.strictObject({
  /** This database's device id (the clock node and the server's key for the mutation counter): kept with the counter, so they are lost or kept together. */
  deviceId: hlcNodeSchema.nullable().default(null),
  /** Next mutation id to hand out (the per-device counter). */
  nextMutationId: z.number().int().positive(),
  cursor: cursorSchema,
  /** Latest clock made or seen, so that a restarted device never goes backwards. */
  hlcLast: hlcStringSchema.nullable(),
  /** Server time minus device time, learned from the server's answers. */
  clockOffsetMs: z.number(),
  lastSyncedAtMs: z.number().nullable(),
});
export type SyncMeta = z.infer<typeof syncMetaSchema>;
export const INITIAL_META: SyncMeta = { deviceId: null, nextMutationId: 1, cursor: '0', hlcLast: null, clockOffsetMs: 0, lastSyncedAtMs: null };

export type RecordSyncState = 'synced' | 'pending' | 'rejected';

export interface PullPage {
  records: WireRecord[];
  cursor: string;
  /** The last page of this pull: confirmed outbox entries are dropped and views rebuilt from the server's copy. */
  final: boolean;
  meta?: Partial<SyncMeta>;
}

/** A write failed because the device ran out of storage; nothing was written (the transaction was rolled back). */
export class StorageFullError extends Error {
  readonly code = 'storage-full';
  constructor(cause?: unknown) {
    super('This device is out of storage for Loftline: free some space. Nothing already saved was lost.');
    this.name = 'StorageFullError';
    if (cause !== undefined) (this as { cause?: unknown }).cause = cause;
  }
}

/** Test hook: called inside a transaction after its writes and before it commits; throwing rolls it back. */
export type BeforeCommitHook = (operation: 'write-local' | 'mark-pushed' | 'apply-pull-page' | 'reset-for-resync' | 'set-meta' | 'dismiss-rejection') => void;

/**
 * The device's database. Every method is one transaction: a local change and its outbox entry are written
 * together; a pull page and its cursor are written together; a crash leaves either all of it or none.
 */
export interface LocalStore {
  getRecord(collection: CollectionName, id: string): Promise<RecordEntry | null>;
  listRecords(collection: CollectionName): Promise<RecordEntry[]>;
  /** Only what the app shows (cheaper than listRecords: the server copy is not parsed). */
  listViews(collection: CollectionName): Promise<LocalView[]>;
  getView(collection: CollectionName, id: string): Promise<LocalView | null>;
  /** Hand out the next mutation id, store the outbox entry and the record's new view. Returns the new view. */
  writeLocal(draft: OutboxDraft, clubId: string, meta?: Partial<SyncMeta>): Promise<{ mutationId: number; view: LocalView | null }>;
  /** Oldest first. */
  pendingOutbox(limit: number): Promise<OutboxEntry[]>;
  pendingCount(): Promise<number>;
  /** The server applied or rejected everything up to lastAppliedMutationId. */
  markPushed(lastAppliedMutationId: number, rejected: Rejection[], meta?: Partial<SyncMeta>): Promise<void>;
  applyPullPage(page: PullPage): Promise<void>;
  /** Forget every server copy and the cursor (unsynced changes stay) before pulling everything again. */
  resetForResync(): Promise<void>;
  getMeta(): Promise<SyncMeta>;
  setMeta(patch: Partial<SyncMeta>): Promise<void>;
  rejections(): Promise<LocalRejection[]>;
  /** The person has read a refusal: forget it here (its record's state goes back to synced or pending). */
  dismissRejection(mutationId: number): Promise<void>;
  recordSyncState(collection: CollectionName, id: string): Promise<RecordSyncState>;
  close(): Promise<void>;
}

export function isQuotaError(err: unknown): boolean {
  const name = (err as { name?: string } | null)?.name;
  return name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED';
}
