import { useEffect, useState } from 'react';
import type { CollectionName, StoredRecord } from '@/shared/schemas';
import type { RecordFilter } from '@/sync';
import { useSyncContext } from './sync-provider';

/*
 * Live reads from the local store: they update after every local change, every pull page and every change made
 * in another tab. undefined while the store is opening (show a loading state, not "nothing here").
 */

export function useRecords<C extends CollectionName>(collection: C, filter?: RecordFilter, opts: { includeDeleted?: boolean } = {}): StoredRecord<C>[] | undefined {
  const { client } = useSyncContext();
  const [rows, setRows] = useState<StoredRecord<C>[] | undefined>(undefined);
  const filterKey = JSON.stringify(filter ?? {});
  const includeDeleted = opts.includeDeleted ?? false;
  useEffect(() => {
    if (!client) {
      setRows(undefined);
      return;
    }
    let live = true;
    let seq = 0;
    const load = () => {
      const n = ++seq;
      client.list(collection, JSON.parse(filterKey) as RecordFilter, { includeDeleted }).then(
        (r) => live && n === seq && setRows(r),
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
  }, [client, collection, filterKey, includeDeleted]);
  return rows;
}

/** One record; null when it does not exist (or is deleted), undefined while loading. */
export function useRecord<C extends CollectionName>(collection: C, id: string | null | undefined, opts: { includeDeleted?: boolean } = {}): StoredRecord<C> | null | undefined {
  const { client } = useSyncContext();
  const [row, setRow] = useState<StoredRecord<C> | null | undefined>(undefined);
  const includeDeleted = opts.includeDeleted ?? false;
  useEffect(() => {
    if (!client || !id) {
      setRow(id ? undefined : null);
      return;
    }
    let live = true;
    let seq = 0;
    const load = () => {
      const n = ++seq;
      client.get(collection, id, { includeDeleted }).then(
        (r) => live && n === seq && setRow(r),
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
  }, [client, collection, id, includeDeleted]);
  return row;
}
