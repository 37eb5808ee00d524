import { useEffect, useRef, useState } from 'react';
import type { CollectionName, StoredRecord } from '@/shared/schemas';
import type { RecordFilter, SyncClient } from '@/sync';
import { useSyncContext } from './sync-provider';

/*
 * Live reads from the local store: they update after every local change, every pull page and every change made
 * in another tab. undefined while the store is opening (show a loading state, not "nothing here").
 */

/**
 * Runs `read` now and again whenever `collection` changes; only the latest answer is kept, so a slow early read
 * never overwrites a newer one. `key` names the read's inputs (it re-runs when they change); with no client or no
 * read the value is `idle`.
 */
function useLiveRead<T>(collection: CollectionName, key: string, read: ((client: SyncClient) => Promise<T>) | null, idle: T | undefined): T | undefined {
  const { client } = useSyncContext();
  const [value, setValue] = useState<T | undefined>(undefined);
  const readRef = useRef(read);
  readRef.current = read;
  const hasRead = read !== null;
  useEffect(() => {
    const run = readRef.current;
    if (!client || !run) {
      setValue(idle);
      return;
    }
    let live = true;
    let seq = 0;
    const load = () => {
      const n = ++seq;
      run(client).then(
        (v) => live && n === seq && setValue(v),
        () => undefined,
      );
    };
    load();
    const unsubscribe = client.subscribe((changed) => {
      if (changed.size === 0 || changed.has(collection)) load();
    });
    return () => {
      live = false;
      unsubscribe();
    };
    // `idle` follows from `key` and `hasRead`; `read` is taken fresh from the ref.
  }, [client, collection, key, hasRead]);
  return value;
}

export function useRecords<C extends CollectionName>(collection: C, filter?: RecordFilter, opts: { includeDeleted?: boolean } = {}): StoredRecord<C>[] | undefined {
  const filterKey = JSON.stringify(filter ?? {});
  const includeDeleted = opts.includeDeleted ?? false;
  return useLiveRead(
    collection,
    `${filterKey}|${includeDeleted}`,
    (client) => client.list(collection, JSON.parse(filterKey) as RecordFilter, { includeDeleted }),
    undefined,
  );
}

/** One record; null when it does not exist (or is deleted), undefined while loading. */
export function useRecord<C extends CollectionName>(collection: C, id: string | null | undefined, opts: { includeDeleted?: boolean } = {}): StoredRecord<C> | null | undefined {
  const includeDeleted = opts.includeDeleted ?? false;
  return useLiveRead(
    collection,
    `${id ?? ''}|${includeDeleted}`,
    id ? (client) => client.get(collection, id, { includeDeleted }) : null,
    id ? undefined : null,
  );
}
