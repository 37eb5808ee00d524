// The server's check of the crew a station names (stations.crewMemberIds), before a pushed station is stored: every
// named person must be a member of the station's club. The ids decide who gets the station's sheet e-mails, so a
// typo'd, foreign or departed person's id would send safety-relevant mail to nobody (or to another club's member).
// A refusal becomes a rejected mutation the lead sees beside the station, like the review guard's.
import type { EntityManager } from 'typeorm';

/** One per push: each id is looked up once however many stations name it. */
export function createStationCrewGuard(em: EntityManager, clubId: string) {
  const known = new Map<string, boolean>();
  return {
    /** Why these crew ids may not be stored, in plain words; null when they may (or when the change names none). */
    async check(crewMemberIds: readonly string[] | undefined): Promise<string | null> {
      if (!crewMemberIds || crewMemberIds.length === 0) return null;
      const unknown = [...new Set(crewMemberIds.filter((id) => !known.has(id)))];
      if (unknown.length > 0) {
        const rows: { user_id: string }[] = await em.query('SELECT user_id FROM memberships WHERE club_id = $1 AND user_id = ANY($2::uuid[])', [clubId, unknown]);
        const members = new Set(rows.map((r) => r.user_id));
        for (const id of unknown) known.set(id, members.has(id));
      }
      const strangers = [...new Set(crewMemberIds.filter((id) => !known.get(id)))];
      if (strangers.length === 0) return null;
      const who = strangers.length === 1 ? 'a person who is not a member' : `${strangers.length} people who are not members`;
      return `the station's crew names ${who} of this club (they may have left it): pick the crew again from the club's members`;
    },
  };
}
