// The notification tables (migration 1796180000000): settings per person and club, and the events already announced.
import type { EntityManager } from 'typeorm';
import {
  DEFAULT_NOTIFICATION_SETTINGS,
  NOTIFICATION_KINDS,
  NOTIFICATION_ROLES,
  type NotificationKind,
  type NotificationSettings,
} from '../../../../shared/schemas';

const COLUMN: Record<NotificationKind, string> = {
  reviewWaiting: 'review_waiting',
  spotSentBack: 'spot_sent_back',
  spotCleared: 'spot_cleared',
  sheetReady: 'sheet_ready',
};

type Db = Pick<EntityManager, 'query'>;

export async function readSettings(db: Db, clubId: string, userId: string): Promise<NotificationSettings> {
  const [row]: Record<string, boolean>[] = await db.query(
    'SELECT review_waiting, spot_sent_back, spot_cleared, sheet_ready FROM notification_settings WHERE club_id = $1 AND user_id = $2',
    [clubId, userId],
  );
  if (!row) return { ...DEFAULT_NOTIFICATION_SETTINGS };
  return Object.fromEntries(NOTIFICATION_KINDS.map((k) => [k, row[COLUMN[k]]])) as NotificationSettings;
}

export async function writeSettings(db: Db, clubId: string, userId: string, s: NotificationSettings, nowIso: string): Promise<void> {
  await db.query(
    `INSERT INTO notification_settings (club_id, user_id, review_waiting, spot_sent_back, spot_cleared, sheet_ready, updated_at)
     VALUES ($1, $2, $3, $4, $5, $6, $7)
     ON CONFLICT (club_id, user_id) DO UPDATE SET review_waiting = $3, spot_sent_back = $4, spot_cleared = $5, sheet_ready = $6, updated_at = $7`,
    [clubId, userId, s.reviewWaiting, s.spotSentBack, s.spotCleared, s.sheetReady, nowIso],
  );
}

export type Recipient = { userId: string; email: string; displayName: string };

/**
 * Members whose role hears of `kind` and who have not turned it off. The person who pushed is not left out: a lead's
 * phone may write a spot's state that the safety review decided, and the lead still wants to hear of it.
 */
export async function recipientsOf(db: Db, clubId: string, kind: NotificationKind): Promise<Recipient[]> {
  const rows: { user_id: string; email: string; display_name: string }[] = await db.query(
    `SELECT u.id AS user_id, u.email, u.display_name FROM memberships m
     JOIN users u ON u.id = m.user_id
     LEFT JOIN notification_settings s ON s.club_id = m.club_id AND s.user_id = m.user_id
     WHERE m.club_id = $1 AND m.role = ANY($2::text[]) AND COALESCE(s.${COLUMN[kind]}, true)
     ORDER BY u.email`,
    [clubId, [...NOTIFICATION_ROLES[kind]]],
  );
  return rows.map((r) => ({ userId: r.user_id, email: r.email, displayName: r.display_name }));
}

/** Records the keys as announced; returns only those not announced before (the caller mails those alone). */
export async function claimEventKeys(db: Db, clubId: string, keys: string[]): Promise<Set<string>> {
  if (keys.length === 0) return new Set();
  const rows: { event_key: string }[] = await db.query(
    `INSERT INTO notifications_sent (club_id, event_key) SELECT $1, k FROM unnest($2::text[]) AS k
     ON CONFLICT DO NOTHING RETURNING event_key`,
    [clubId, keys],
  );
  return new Set(rows.map((r) => r.event_key));
}

export type SpotSummary = {
  spotId: string;
  eventId: string;
  eventName: string;
  band: string;
  shape: string;
  stationName: string;
  /** The people the spot's station names as its crew (stations.crewMemberIds); empty when none is named or the station was removed. */
  crewMemberIds: string[];
};

/** The live spots among `spotIds` in the club, with their event and station names for the e-mail. */
export async function spotSummaries(db: Db, clubId: string, spotIds: string[]): Promise<Map<string, SpotSummary>> {
  if (spotIds.length === 0) return new Map();
  const rows: { id: string; event_id: string; event_name: string | null; band: string; shape: string; station_name: string | null; crew: unknown }[] = await db.query(
    `SELECT s.id, s.event_id, e.name AS event_name, s.band, s.shape, st.name AS station_name, CASE WHEN st.deleted_at IS NULL THEN st.crew_member_ids END AS crew FROM antenna_spots s
     LEFT JOIN events e ON e.id = s.event_id AND e.club_id = s.club_id
     LEFT JOIN stations st ON st.id = s.station_id AND st.club_id = s.club_id
     WHERE s.club_id = $1 AND s.id = ANY($2::uuid[]) AND s.deleted_at IS NULL`,
    [clubId, spotIds],
  );
  return new Map(
    rows.map((r) => [
      r.id,
      {
        spotId: r.id,
        eventId: r.event_id,
        eventName: r.event_name ?? 'your event',
        band: r.band,
        shape: r.shape,
        stationName: r.station_name ?? 'a station',
        crewMemberIds: Array.isArray(r.crew) ? r.crew.filter((x): x is string => typeof x === 'string') : [],
      },
    ]),
  );
}

/**
 * Who gets a spot's "sheet ready": the station's named crew who are still members of the club (any role: a lead
 * often raises antennas too), less those who turned it off. `named: false` when the station names no one who is
 * still a member, and then the caller falls back to every crew member (recipientsOf 'sheetReady').
 */
export async function namedCrewOf(db: Db, clubId: string, crewMemberIds: readonly string[]): Promise<{ named: boolean; recipients: Recipient[] }> {
  if (crewMemberIds.length === 0) return { named: false, recipients: [] };
  const rows: { user_id: string; email: string; display_name: string; wants: boolean }[] = await db.query(
    `SELECT u.id AS user_id, u.email, u.display_name, COALESCE(s.sheet_ready, true) AS wants FROM memberships m
     JOIN users u ON u.id = m.user_id
     LEFT JOIN notification_settings s ON s.club_id = m.club_id AND s.user_id = m.user_id
     WHERE m.club_id = $1 AND m.user_id = ANY($2::uuid[])
     ORDER BY u.email`,
    [clubId, [...new Set(crewMemberIds)]],
  );
  return {
    named: rows.length > 0,
    recipients: rows.filter((r) => r.wants).map((r) => ({ userId: r.user_id, email: r.email, displayName: r.display_name })),
  };
}

/** True when the person is named as crew of any live station of the club (they then hear of "sheet ready"). */
export async function isNamedCrew(db: Db, clubId: string, userId: string): Promise<boolean> {
  const [row]: { named: boolean }[] = await db.query(
    `SELECT EXISTS (SELECT 1 FROM stations WHERE club_id = $1 AND deleted_at IS NULL AND crew_member_ids @> jsonb_build_array($2::text)) AS named`,
    [clubId, userId],
  );
  return !!row?.named;
}
