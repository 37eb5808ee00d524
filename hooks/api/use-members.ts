import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { memberSchema, type Role } from '@/shared/schemas';
import { apiFetch } from './client';
import { meKey } from './use-me';

const membersKey = (clubId: string) => ['clubs', clubId, 'members'] as const;

export function useMembers(clubId: string | undefined) {
  return useQuery({
    queryKey: membersKey(clubId ?? ''),
    queryFn: async () => z.array(memberSchema).parse(await apiFetch(`/api/clubs/${clubId}/members`)),
    enabled: !!clubId,
  });
}

export function useChangeMemberRole(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: Role }) =>
      apiFetch(`/api/clubs/${clubId}/members/${userId}`, { method: 'PATCH', json: { role } }),
    onSettled: () => Promise.all([qc.invalidateQueries({ queryKey: membersKey(clubId) }), qc.invalidateQueries({ queryKey: meKey })]),
  });
}

export function useRemoveMember(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (userId: string) => apiFetch<void>(`/api/clubs/${clubId}/members/${userId}`, { method: 'DELETE' }),
    onSettled: () => Promise.all([qc.invalidateQueries({ queryKey: membersKey(clubId) }), qc.invalidateQueries({ queryKey: meKey })]),
  });
}
