import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { clubSchema, userSchema } from '@/shared/schemas';
import { tokenStore } from './token-store';
import { apiFetch } from './client';

export const meSchema = z.object({ user: userSchema, clubs: z.array(clubSchema) });
export type Me = z.infer<typeof meSchema>;

export const meKey = ['me'] as const;

/** The signed-in person and their clubs with the role they hold in each. */
export function useMe() {
  return useQuery({
    queryKey: meKey,
    queryFn: async () => meSchema.parse(await apiFetch('/api/me')),
    enabled: tokenStore.get() !== null,
    staleTime: 30_000,
  });
}
