import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { conflictEntrySchema, rejectedEntrySchema, type ResolveConflictBody } from '@/sync';
import { apiFetch } from './client';

/*
 * The two lists behind the sync-problems screen (online: they live on the server): the club's open safety
 * conflicts, and the signed-in person's own refused changes. Settling and dismissing refresh the list.
 */

const conflictsKey = (clubId: string) => ['clubs', clubId, 'sync', 'conflicts'] as const;
const rejectedKey = (clubId: string) => ['clubs', clubId, 'sync', 'rejected'] as const;

export function useOpenConflicts(clubId: string | undefined, enabled = true) {
  return useQuery({
    queryKey: conflictsKey(clubId ?? ''),
    queryFn: async () => z.array(conflictEntrySchema).parse(await apiFetch(`/api/clubs/${clubId}/sync/conflicts?open=true`)),
    enabled: !!clubId && enabled,
    // New conflicts arrive with other people's pushes; look again now and then while the screen is open.
    refetchInterval: 30_000,
  });
}

export function useMyRefusedChanges(clubId: string | undefined) {
  return useQuery({
    queryKey: rejectedKey(clubId ?? ''),
    queryFn: async () => z.array(rejectedEntrySchema).parse(await apiFetch(`/api/clubs/${clubId}/sync/rejected`)),
    enabled: !!clubId,
    refetchInterval: 30_000,
  });
}

export function useResolveConflict(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async ({ conflictId, body }: { conflictId: string; body: ResolveConflictBody }) =>
      conflictEntrySchema.parse(await apiFetch(`/api/clubs/${clubId}/sync/conflicts/${conflictId}/resolve`, { method: 'POST', json: body })),
    onSettled: () => qc.invalidateQueries({ queryKey: conflictsKey(clubId) }),
  });
}

export function useDismissRefusedChange(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (rejectedId: string) => apiFetch<void>(`/api/clubs/${clubId}/sync/rejected/${rejectedId}/dismiss`, { method: 'POST' }),
    onSettled: () => qc.invalidateQueries({ queryKey: rejectedKey(clubId) }),
  });
}
