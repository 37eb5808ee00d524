import type { Member, Station } from '@/shared/schemas';

/*
 * Pure helpers for a station's crew (stations.crewMemberIds), shared by the station form and the stations card.
 * No React here, so they are unit-tested in Node.
 */

/** Crew members first (they raise the antennas), then everyone else; each group by name, then e-mail. */
export function crewFirst(members: readonly Member[]): Member[] {
  return [...members].sort((a, b) => Number(b.role === 'crew') - Number(a.role === 'crew') || a.displayName.localeCompare(b.displayName) || a.email.localeCompare(b.email));
}

/** Who crews a station, in words: the named people (from the member list this device has), or that none is named. */
export function crewWords(station: Pick<Station, 'crewMemberIds'>, members: readonly Member[] | undefined): string {
  const ids = station.crewMemberIds;
  if (ids.length === 0) return 'Crew: none named (every crew member gets its sheets)';
  const names = ids.map((id) => members?.find((m) => m.userId === id)?.displayName).filter((n): n is string => !!n);
  const unknown = ids.length - names.length;
  if (unknown === ids.length) return `Crew: ${unknown} named (member list not on this device)`;
  return `Crew: ${[...names, ...(unknown > 0 ? [`${unknown} more`] : [])].join(', ')}`;
}
