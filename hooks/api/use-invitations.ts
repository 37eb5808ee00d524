import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { invitationSchema, roleSchema, tokensSchema, type Role } from '@/shared/schemas';
import { useSession } from '@/hooks/auth/use-session';
import { apiFetch } from './client';
import { meKey } from './use-me';

const invitationsKey = (clubId: string) => ['clubs', clubId, 'invitations'] as const;

export function useInvitations(clubId: string | undefined, enabled = true) {
  return useQuery({
    queryKey: invitationsKey(clubId ?? ''),
    queryFn: async () => z.array(invitationSchema).parse(await apiFetch(`/api/clubs/${clubId}/invitations`)),
    enabled: !!clubId && enabled,
  });
}

export function useCreateInvitation(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: { email: string; role: Role }) =>
      invitationSchema.parse(await apiFetch(`/api/clubs/${clubId}/invitations`, { method: 'POST', json: body })),
    onSuccess: () => qc.invalidateQueries({ queryKey: invitationsKey(clubId) }),
  });
}

export function useRevokeInvitation(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (invitationId: string) => apiFetch<void>(`/api/clubs/${clubId}/invitations/${invitationId}`, { method: 'DELETE' }),
    onSettled: () => qc.invalidateQueries({ queryKey: invitationsKey(clubId) }),
  });
}

export const invitationPreviewSchema = z.object({
  clubName: z.string(),
  email: z.string(),
  role: roleSchema,
  expiresAt: z.string(),
  needsSignUp: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** What an invitation link offers, readable before signing in. */
export function useInvitationPreview(token: string) {
  return useQuery({
    queryKey: ['invitation', token],
    queryFn: async () => invitationPreviewSchema.parse(await apiFetch(`/api/invitations/${encodeURIComponent(token)}`, { auth: false })),
    retry: false,
  });
}

type AcceptBody = { token: string; signUp?: { password: string; displayName: string; callSign: string } };

export function useAcceptInvitation() {
  const qc = useQueryClient();
  const { signIn, tokens } = useSession();
  return useMutation({
    // A signed-in person joins with their own bearer token; a new person signs up in the same call.
    mutationFn: async (body: AcceptBody) =>
      tokensSchema.parse(await apiFetch('/api/invitations/accept', { method: 'POST', json: body, auth: !body.signUp && !!tokens })),
    onSuccess: (t) => {
      signIn(t);
      return qc.invalidateQueries({ queryKey: meKey });
    },
  });
}
