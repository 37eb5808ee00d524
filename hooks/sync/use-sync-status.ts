import { useEffect, useState, useSyncExternalStore } from 'react';
import { usePendingPhotos } from '@/components/photos/use-photo-queue';
import type { CollectionName } from '@/shared/schemas';
import type { RecordSyncState, SyncStatus } from '@/sync';
import { useSyncContext } from './sync-provider';

export interface SyncStatusView {
  /** Changes made on this device that the server has not confirmed. */
  pendingChanges: number;
  /** Photos taken on this device that the server has not confirmed. */
  pendingPhotos: number;
  /** ISO time of the last sync that finished, null before the first. */
  lastSyncedAt: string | null;
  online: boolean;
  syncing: boolean;
  /** What went wrong, in plain words; null when all is well (being offline is not an error). */
  error: string | null;
  errorCode: string | null;
  /** false: the browser may clear the data under storage pressure. */
  storagePersisted: boolean | null;
  /** false: records are kept in memory only on this platform. */
  durable: boolean;
  rejectedCount: number;
}

const noop = () => () => undefined;

export function useSyncStatus(): SyncStatusView {
  const { client, openError, durable } = useSyncContext();
  const status: SyncStatus | null = useSyncExternalStore(
    client ? (l) => client.subscribeStatus(l) : noop,
    () => client?.status() ?? null,
    () => null,
  );
  const pendingPhotos = usePendingPhotos();
  const online = status?.online ?? (globalThis as { navigator?: { onLine?: boolean } }).navigator?.onLine ?? true;
  return {
    pendingChanges: status?.pendingChanges ?? 0,
    pendingPhotos,
    lastSyncedAt: status?.lastSyncedAt ?? null,
    online,
    syncing: status?.syncing ?? false,
    error: openError ?? status?.error?.message ?? null,
    errorCode: openError ? 'storage-unavailable' : (status?.error?.code ?? null),
    storagePersisted: status?.storagePersisted ?? null,
    durable,
    rejectedCount: status?.rejectedCount ?? 0,
  };
}

/** 'pending' until the state is known, so nothing unsynced is ever shown as synced. */
export function useRecordSyncState(collection: CollectionName, id: string): RecordSyncState {
  const { client } = useSyncContext();
  const [state, setState] = useState<RecordSyncState>('pending');
  useEffect(() => {
    if (!client) return;
    let live = true;
    const load = () => {
      client.recordSyncState(collection, id).then(
        (s) => live && setState(s),
        () => undefined,
      );
    };
    load();
    const a = client.subscribe(load);
    const b = client.subscribeStatus(load);
    return () => {
      live = false;
      a();
      b();
    };
  }, [client, collection, id]);
  return state;
}
