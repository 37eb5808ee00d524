import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { COLLECTIONS, CollectionFields, StoredRecord } from '@/shared/schemas';

/** What a create body may leave out: the fields the schema defaults. */
type CreateFields<C extends RestCollection> = z.input<(typeof COLLECTIONS)[C]['fields']>;
import { apiFetch } from './client';

/*
 * Sites and events over REST, for online use (they also sync down to phones through sync/).
 * One generic set of hooks; use-events.ts and use-sites.ts name them.
 */

type RestCollection = 'sites' | 'events';
const listKey = (c: RestCollection, clubId: string) => ['clubs', clubId, c] as const;
const itemKey = (c: RestCollection, clubId: string, id: string) => ['clubs', clubId, c, id] as const;

export function useClubList<C extends RestCollection>(collection: C, clubId: string | undefined) {
  return useQuery({
    queryKey: listKey(collection, clubId ?? ''),
    queryFn: () => apiFetch<StoredRecord<C>[]>(`/api/clubs/${clubId}/${collection}`),
    enabled: !!clubId,
  });
}

export function useClubItem<C extends RestCollection>(collection: C, clubId: string | undefined, id: string | undefined) {
  return useQuery({
    queryKey: itemKey(collection, clubId ?? '', id ?? ''),
    queryFn: () => apiFetch<StoredRecord<C>>(`/api/clubs/${clubId}/${collection}/${id}`),
    enabled: !!clubId && !!id,
  });
}

export function useClubCreate<C extends RestCollection>(collection: C, clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (fields: CreateFields<C> & { id?: string }) =>
      apiFetch<StoredRecord<C>>(`/api/clubs/${clubId}/${collection}`, { method: 'POST', json: fields }),
    onSuccess: () => qc.invalidateQueries({ queryKey: listKey(collection, clubId) }),
  });
}

export function useClubUpdate<C extends RestCollection>(collection: C, clubId: string, id: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (fields: Partial<CollectionFields<C>>) =>
      apiFetch<StoredRecord<C>>(`/api/clubs/${clubId}/${collection}/${id}`, { method: 'PATCH', json: fields }),
    onSuccess: (saved) => {
      qc.setQueryData(itemKey(collection, clubId, id), saved);
      return qc.invalidateQueries({ queryKey: listKey(collection, clubId) });
    },
  });
}

export function useClubDelete(collection: RestCollection, clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch<void>(`/api/clubs/${clubId}/${collection}/${id}`, { method: 'DELETE' }),
    onSettled: () => qc.invalidateQueries({ queryKey: listKey(collection, clubId) }),
  });
}
