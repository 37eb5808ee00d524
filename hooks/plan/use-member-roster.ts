import { useEffect, useMemo } from 'react';
import { z } from 'zod';
import { useMembers } from '@/hooks/api/use-members';
import { readSetting, writeSetting } from '@/hooks/local-setting';
import { useSyncStatus } from '@/hooks/sync';
import { crewFirst } from './crew-words';
import { memberSchema, type Member } from '@/shared/schemas';

/*
 * The club's members for picking a station's crew, offline too: the last list the server gave is kept on the device
 * (localStorage on the web) and used until a fresh one arrives. Members are not a synced collection, so without
 * this a lead in a field with no signal could not see who is who. The cache is parsed with zod when read (a
 * trust boundary: another version of the app may have written it).
 */

const cacheSchema = z.object({ savedAt: z.string(), members: z.array(memberSchema) });
const cacheKey = (clubId: string) => `loftline.members.${clubId}`;

export type MemberRoster = {
  /** Crew members first (they raise antennas), then everyone else, each by name; undefined when nothing is known yet. */
  members: Member[] | undefined;
  /** When the list comes from the device's copy rather than the server: when it was saved. */
  cachedAt: string | null;
  loading: boolean;
};

function readCache(clubId: string | undefined): { savedAt: string; members: Member[] } | null {
  if (!clubId) return null;
  const raw = readSetting(cacheKey(clubId));
  if (!raw) return null;
  try {
    const parsed = cacheSchema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : null;
  } catch {
    return null;
  }
}

export function useMemberRoster(clubId: string | undefined): MemberRoster {
  const query = useMembers(clubId);
  useEffect(() => {
    if (clubId && query.data) writeSetting(cacheKey(clubId), JSON.stringify({ savedAt: new Date().toISOString(), members: query.data }));
  }, [clubId, query.data]);
  // Read once per club (and again when the query gives up), not on every render.
  const cached = useMemo(() => readCache(clubId), [clubId, query.isError]);
  // Offline the request only retries until it fails: that is not "loading", the list needs a connection.
  const { online } = useSyncStatus();
  const fetching = query.fetchStatus === 'fetching' && online;
  return useMemo(() => {
    if (query.data) return { members: crewFirst(query.data), cachedAt: null, loading: false };
    if (cached) return { members: crewFirst(cached.members), cachedAt: cached.savedAt, loading: fetching };
    return { members: undefined, cachedAt: null, loading: fetching };
  }, [query.data, fetching, cached]);
}
