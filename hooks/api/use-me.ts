import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { clubSchema, userSchema } from '@/shared/schemas';
import { tokenStore } from './token-store';
import { apiFetch } from './client';
import { readSetting, writeSetting } from '../local-setting';

export const meSchema = z.object({ user: userSchema, clubs: z.array(clubSchema) });
export type Me = z.infer<typeof meSchema>;

export const meKey = ['me'] as const;

// The last answer is kept on the device so that the signed-in shell opens with no network (a scout in a field,
// the app served by the service worker). It is used only for the person it belongs to.
const KEPT_KEY = 'loftline.me';

function keptMe(): Me | undefined {
  const raw = readSetting(KEPT_KEY);
  const tokens = tokenStore.get();
  if (!raw || !tokens) return undefined;
  try {
    const parsed = meSchema.safeParse(JSON.parse(raw));
    return parsed.success && parsed.data.user.id === tokens.user.id ? parsed.data : undefined;
  } catch {
    return undefined;
  }
}

/** The signed-in person and their clubs with the role they hold in each. */
export function useMe() {
  return useQuery({
    queryKey: meKey,
    queryFn: async () => {
      const me = meSchema.parse(await apiFetch('/api/me'));
      writeSetting(KEPT_KEY, JSON.stringify(me));
      return me;
    },
    enabled: tokenStore.get() !== null,
    staleTime: 30_000,
    // Shown at once, then refreshed from the server whenever there is a connection.
    initialData: keptMe,
    initialDataUpdatedAt: 0,
  });
}
