import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from 'react';
import type { Club, Role } from '@/shared/schemas';
import { useMe } from '@/hooks/api/use-me';
import { readSetting, writeSetting } from './local-setting';

const KEY = 'loftline.clubId';

export type CurrentClub = {
  club: Club | null;
  role: Role | null;
  clubs: Club[];
  setClubId: (clubId: string) => void;
  isLoading: boolean;
};

const CurrentClubContext = createContext<CurrentClub | null>(null);

/** The club the person is working in now; remembered per device, falling back to their first club. */
export function CurrentClubProvider({ children }: { children: ReactNode }) {
  const me = useMe();
  const [chosen, setChosen] = useState<string | null>(() => readSetting(KEY));
  const setClubId = useCallback((id: string) => {
    writeSetting(KEY, id);
    setChosen(id);
  }, []);
  const value = useMemo<CurrentClub>(() => {
    const clubs = me.data?.clubs ?? [];
    const club = clubs.find((c) => c.id === chosen) ?? clubs[0] ?? null;
    return { club, role: club?.role ?? null, clubs, setClubId, isLoading: me.isLoading };
  }, [me.data, me.isLoading, chosen, setClubId]);
  return <CurrentClubContext.Provider value={value}>{children}</CurrentClubContext.Provider>;
}

export function useCurrentClub(): CurrentClub {
  const ctx = useContext(CurrentClubContext);
  if (!ctx) throw new Error('useCurrentClub must be used inside the signed-in shell (app/(app)/_layout.tsx)');
  return ctx;
}
