import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useSyncExternalStore } from 'react';
import type { Tokens, User } from '@/shared/schemas';
import { apiFetch } from '@/hooks/api/client';
import { tokenStore } from '@/hooks/api/token-store';

export type Session = {
  user: User | null;
  tokens: Tokens | null;
  /** Keep the tokens the server just issued (sign-in, sign-up, accepting an invitation, refresh). */
  signIn: (tokens: Tokens) => void;
  /** Revoke the refresh token on the server (best effort) and forget everything cached for this person. */
  signOut: () => Promise<void>;
};

export function useSession(): Session {
  const tokens = useSyncExternalStore(tokenStore.subscribe, tokenStore.get, tokenStore.get);
  const queryClient = useQueryClient();
  const signIn = useCallback(
    (t: Tokens) => {
      queryClient.clear();
      tokenStore.set(t);
    },
    [queryClient],
  );
  const signOut = useCallback(async () => {
    const t = tokenStore.get();
    if (t) {
      try {
        await apiFetch('/api/auth/sign-out', { method: 'POST', json: { refreshToken: t.refreshToken }, auth: false });
      } catch {
        // Signing out on this device must work offline too; the refresh token then simply expires.
      }
    }
    tokenStore.set(null);
    queryClient.clear();
  }, [queryClient]);
  return { user: tokens?.user ?? null, tokens, signIn, signOut };
}
