import { useMutation, useQueryClient } from '@tanstack/react-query';
import { clubSchema, type Club } from '@/shared/schemas';
import { apiFetch } from './client';
import { meKey } from './use-me';

export function useCreateClub() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: async (body: { name: string; callSign: string }) => clubSchema.parse(await apiFetch<Club>('/api/clubs', { method: 'POST', json: body })),
    onSuccess: () => qc.invalidateQueries({ queryKey: meKey }),
  });
}
