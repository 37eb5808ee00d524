import { useMemo } from 'react';
import type { CollectionFields, CollectionName } from '@/shared/schemas';
import { useSyncContext } from './sync-provider';

/*
 * Local writes: each is stored on the device first (the record and its outbox entry in one transaction) and
 * synced later. They reject with RecordWriteError (invalid fields, append-only records) or StorageFullError
 * (the device is out of space) and then nothing was stored.
 */

export interface Mutate {
  create<C extends CollectionName>(collection: C, fields: Partial<CollectionFields<C>> | Record<string, unknown>): Promise<string>;
  update<C extends CollectionName>(collection: C, id: string, fields: Partial<CollectionFields<C>> | Record<string, unknown>): Promise<void>;
  remove(collection: CollectionName, id: string): Promise<void>;
  undelete(collection: CollectionName, id: string): Promise<void>;
}

const notReady = () => Promise.reject(new Error('Loftline is still opening its storage on this device: try again in a moment.'));

export function useMutate(): Mutate {
  const { client } = useSyncContext();
  return useMemo<Mutate>(
    () =>
      client
        ? {
            create: (c, f) => client.create(c, f),
            update: (c, id, f) => client.update(c, id, f as Record<string, unknown>),
            remove: (c, id) => client.remove(c, id),
            undelete: (c, id) => client.undelete(c, id),
          }
        : { create: notReady, update: notReady, remove: notReady, undelete: notReady },
    [client],
  );
}
