import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { conflictEntrySchema, rejectedEntrySchema, type RejectedEntry, type ResolveConflictBody } from '@/sync';
import type { Role } from '@/shared/schemas';
import { apiFetch } from './client';

/*
 * The two lists behind the sync-problems screen (online: they live on the server): the club's open safety
 * conflicts, and the signed-in person's own refused changes. Settling and dismissing refresh the list.
 */

const conflictsKey = (clubId: string) => ['clubs', clubId, 'sync', 'conflicts'] as const;
const rejectedKey = (clubId: string) => ['clubs', clubId, 'sync', 'rejected'] as const;

/** Who reads the club's values recorded twice (leads and admins settle them; safety officers read them). */
export const CONFLICT_READERS: readonly Role[] = ['admin', 'lead', 'safety'];

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

/**
 * Dismisses a refused change on the server; `forgetHere` then runs (the card passes the sync client's own
 * dismissal when the change came from this device, so the indicator's warning goes too).
 */
export function useDismissRefusedChange(clubId: string, forgetHere?: (entry: RejectedEntry) => Promise<void>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (entry: RejectedEntry) => {
      await apiFetch<void>(`/api/clubs/${clubId}/sync/rejected/${entry.id}/dismiss`, { method: 'POST' });
      await forgetHere?.(entry);
    },
    onSettled: () => qc.invalidateQueries({ queryKey: rejectedKey(clubId) }),
  });
}
