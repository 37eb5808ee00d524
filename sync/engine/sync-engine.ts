import type { CollectionName } from '../../shared/schemas';
import {
  MAX_PULL_LIMIT,
  MAX_PUSH_MUTATIONS,
  PROTOCOL_VERSION,
  SCHEMA_VERSION,
  TransportError,
  type HybridClock,
  type PullResponse,
  type PushResponse,
  type SyncTransport,
} from '../protocol';
import { StorageFullError, type LocalStore, type OutboxEntry } from '../store/types';

/*
 * One sync cycle: push the whole outbox (oldest first, in batches), then pull every change after the cursor
 * (page by page, each page stored with its cursor in one transaction). Pushing first means a resync never
 * throws away a change the server has not seen.
 */

export type SyncErrorCode = 'offline' | 'unauthorized' | 'forbidden' | 'server' | 'client-too-old' | 'server-too-old' | 'storage-full' | 'unexpected';

export class SyncError extends Error {
  constructor(
    readonly code: SyncErrorCode,
    message: string,
  ) {
    super(message);
    this.name = 'SyncError';
  }
}

export interface EngineDeps {
  store: LocalStore;
  transport: SyncTransport;
  hlc: HybridClock;
  deviceId: string;
  /** Device time, epoch ms (uncorrected). */
  deviceNowMs: () => number;
  /** Called with the collections a pull page changed. */
  onChanged: (collections: Set<CollectionName>) => void;
  /** Server time minus device time, updated from every answer. */
  setClockOffset: (offsetMs: number) => void;
  pushBatch?: number;
  pullLimit?: number;
}

export function describeFailure(err: unknown): SyncError {
  if (err instanceof SyncError) return err;
  if (err instanceof StorageFullError) return new SyncError('storage-full', err.message);
  if (err instanceof TransportError) {
    switch (err.kind) {
      case 'offline':
        return new SyncError('offline', 'No connection to the club server. Changes stay on this device and sync when the network is back.');
      case 'unauthorized':
        return new SyncError('unauthorized', 'Sign in again to sync. Your changes stay on this device.');
      case 'forbidden':
        return new SyncError('forbidden', 'You are no longer a member of this club, so this device cannot sync it. Your changes stay on this device.');
      case 'server':
        return new SyncError('server', `The club server had a problem${err.status ? ` (HTTP ${err.status})` : ''}. Loftline will try again.`);
      default:
        return new SyncError('unexpected', `Sync failed: ${err.message}. Loftline will try again.`);
    }
  }
  return new SyncError('unexpected', `Sync failed: ${err instanceof Error ? err.message : String(err)}. Loftline will try again.`);
}

function tooOld(res: { type: 'client-too-old' | 'server-too-old'; message: string }): SyncError {
  return new SyncError(res.type, res.message);
}

const wireMutation = (e: OutboxEntry) => ({
  mutationId: e.mutationId,
  collection: e.collection,
  recordId: e.recordId,
  op: e.op,
  fields: e.fields,
  baseClocks: e.baseClocks,
  clock: e.clock,
});

export async function runSyncCycle(deps: EngineDeps): Promise<void> {
  const { store, transport, hlc } = deps;
  const pushBatch = Math.min(deps.pushBatch ?? 200, MAX_PUSH_MUTATIONS);
  const pullLimit = Math.min(deps.pullLimit ?? 500, MAX_PULL_LIMIT);
  const learnTime = (serverTimeMs: number) => {
    const offset = serverTimeMs - deps.deviceNowMs();
    deps.setClockOffset(offset);
    return offset;
  };

  let batchSize = pushBatch;
  for (;;) {
    const batch = await store.pendingOutbox(batchSize);
    if (batch.length === 0) break;
    let res: PushResponse;
    try {
      res = await transport.push({
        type: 'push',
        protocolVersion: PROTOCOL_VERSION,
        schemaVersion: SCHEMA_VERSION,
        deviceId: deps.deviceId,
        mutations: batch.map(wireMutation),
      });
    } catch (err) {
      // Too large for the server's body limit (many long power-line outlines): send smaller batches.
      if (err instanceof TransportError && err.status === 413 && batchSize > 1) {
        batchSize = Math.max(1, Math.floor(batchSize / 2));
        continue;
      }
      throw err;
    }
    if (res.type !== 'pushed') throw tooOld(res);
    const clockOffsetMs = learnTime(res.serverTimeMs);
    await store.markPushed(res.lastAppliedMutationId, res.rejected, { clockOffsetMs, hlcLast: hlc.last() });
    if (res.lastAppliedMutationId < batch[batch.length - 1].mutationId) {
      throw new SyncError('unexpected', `the server applied up to change ${res.lastAppliedMutationId} of ${batch[batch.length - 1].mutationId}`);
    }
  }

  let cursor = (await store.getMeta()).cursor;
  let resynced = false;
  for (;;) {
    const res: PullResponse = await transport.pull({ type: 'pull', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, cursor, limit: pullLimit });
    if (res.type === 'resync-required') {
      if (resynced) throw new SyncError('unexpected', 'the server asked for a resync twice in one sync');
      await store.resetForResync();
      deps.onChanged(new Set());
      cursor = '0';
      resynced = true;
      continue;
    }
    if (res.type !== 'changes') throw tooOld(res);
    const clockOffsetMs = learnTime(res.serverTimeMs);
    const collections = new Set<CollectionName>();
    for (const r of res.changes) {
      collections.add(r.collection);
      for (const c of Object.values(r.fieldClocks)) hlc.observe(c);
      hlc.observe(r.deletedClock);
    }
    await store.applyPullPage({ records: res.changes, cursor: res.cursor, final: !res.hasMore, meta: { clockOffsetMs, hlcLast: hlc.last() } });
    if (collections.size > 0 || !res.hasMore) deps.onChanged(collections);
    cursor = res.cursor;
    if (!res.hasMore) break;
  }
  await store.setMeta({ lastSyncedAtMs: deps.deviceNowMs() });
}
