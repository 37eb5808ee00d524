// Loads the demo scenario (demo-scenario.ts) through the same services and repositories the API uses.
// Idempotent: every person, the club, each membership and each record is created only when missing (records
// have fixed ids), so a run interrupted half-way completes on the next one.
import { createHash } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import { signUpSchema, type CollectionFields, type CollectionName } from '../../../shared/schemas';
import { checkNewRecordFields } from '../../../sync/protocol';
import type { AppDeps } from '../app-deps';
import { SYNCED_ENTITIES } from '../db/entities';
import { AuthService } from '../modules/auth/service';
import { findUserByEmail } from '../modules/auth/repository';
import { ClubRepository } from '../modules/clubs/club-repository';
import { MemberRepository } from '../modules/members/member-repository';
import { RecordRepository } from '../modules/sites/record-repository';
import { RecordService } from '../modules/sites/record-service';
import { restWriteClock } from '../modules/sites/rest-write-clock';
import {
  DEMO_CLUB, DEMO_COAX, DEMO_EVENT_NAME, DEMO_HAZARDS, DEMO_PASSWORD, DEMO_POSITIONS, DEMO_REF, DEMO_SITE, DEMO_STATIONS,
  DEMO_SUPPORTS, DEMO_USERS, demoEventDays, offsetToLatLon,
} from './demo-scenario';

/** A fixed UUID (version-4 layout) for a demo record, so reseeding finds what is already there. */
export function demoId(key: string): string {
  const h = createHash('sha256').update(`loftline-demo/${key}`).digest('hex');
  const variant = ((parseInt(h[16], 16) & 0x3) | 0x8).toString(16);
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-4${h.slice(13, 16)}-${variant}${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

export interface SeedResult {
  /** False when everything was already there. */
  created: boolean;
  clubId: string;
  siteId: string;
  eventId: string;
}

/** Inserts a synced record written "by the server" unless its id exists: fields checked by the sync rules. */
async function ensureRecord<C extends CollectionName>(deps: AppDeps, em: EntityManager, collection: C, clubId: string, id: string, fields: CollectionFields<C>): Promise<boolean> {
  const repo = em.getRepository(SYNCED_ENTITIES[collection]);
  if ((await repo.countBy({ id } as never)) > 0) return false;
  const check = checkNewRecordFields(collection, fields);
  if (!check.ok) throw new Error(`demo ${collection} ${id} is not valid: ${check.message}`);
  const now = deps.clock.now();
  const stamp = restWriteClock(now.getTime(), []);
  const fieldClocks = Object.fromEntries(Object.keys(check.fields).map((k) => [k, stamp]));
  await repo.insert({ ...check.fields, id, clubId, createdAt: now, updatedAt: now, deletedAt: null, fieldClocks } as never);
  return true;
}

/**
 * A demo seeded before stations had crews (migration 1796190000000) has its stations with no crew and no clock for
 * the field: nobody ever chose "no crew" there, so the demo's crew is written once, as a server change (new clock,
 * change_seq by the trigger) that every device pulls. A crew anyone has set, even to none, is left alone.
 */
async function backfillDemoCrew(deps: AppDeps, em: EntityManager, stationId: string, crewMemberIds: string[]): Promise<boolean> {
  if (crewMemberIds.length === 0) return false;
  const [row]: { clocks: Record<string, string> }[] = await em.query("SELECT field_clocks AS clocks FROM stations WHERE id = $1 AND crew_member_ids = '[]'::jsonb", [stationId]);
  if (!row || row.clocks.crewMemberIds) return false;
  const now = deps.clock.now();
  const stamp = restWriteClock(now.getTime(), Object.values(row.clocks));
  await em.query(
    `UPDATE stations SET crew_member_ids = $2::jsonb, field_clocks = field_clocks || jsonb_build_object('crewMemberIds', $3::text), updated_at = $4 WHERE id = $1`,
    [stationId, JSON.stringify(crewMemberIds), stamp, now.toISOString()],
  );
  return true;
}

export async function seedDemo(deps: AppDeps): Promise<SeedResult> {
  const { dataSource: ds } = deps;
  let created = false;
  const auth = new AuthService(deps);
  const userIds = new Map<string, string>();
  for (const u of DEMO_USERS) {
    const existing = await findUserByEmail(ds, u.email);
    if (existing) userIds.set(u.email, existing.id);
    else {
      const made = await auth.createUser(signUpSchema.parse({ email: u.email, password: DEMO_PASSWORD, displayName: u.displayName }));
      userIds.set(u.email, made.id);
      created = true;
    }
  }

  const adminId = userIds.get(DEMO_USERS[0].email) as string;
  const clubs = new ClubRepository(ds);
  let clubId = (await clubs.listForUser(adminId)).find((c) => c.name === DEMO_CLUB.name)?.id;
  if (!clubId) {
    clubId = (await clubs.createWithAdmin({ name: DEMO_CLUB.name, callSign: DEMO_CLUB.callSign, userId: adminId })).id;
    created = true;
  }
  const members = new MemberRepository(ds);
  for (const u of DEMO_USERS) {
    const userId = userIds.get(u.email) as string;
    if (!(await members.find(ds.manager, clubId, userId))) {
      await members.add(ds.manager, clubId, userId, u.role);
      created = true;
    }
  }

  const siteId = demoId('site');
  const sites = new RecordRepository(ds, 'sites', {});
  if (!(await sites.idTaken(ds.manager, siteId))) {
    await new RecordService(ds, sites, deps.clock).create(clubId, { id: siteId, fields: { ...DEMO_SITE, refLat: DEMO_REF.lat, refLon: DEMO_REF.lon } });
    created = true;
  }
  const eventId = demoId('event');
  const events = new RecordRepository(ds, 'events', {});
  if (!(await events.idTaken(ds.manager, eventId))) {
    const days = demoEventDays(deps.clock.now());
    await new RecordService(ds, events, deps.clock).create(clubId, {
      id: eventId,
      fields: { siteId, name: DEMO_EVENT_NAME, ...days, notes: 'Two HF stations, set up Saturday morning, down by Sunday evening. Safety briefing at 08:30 at Canopy A.' },
    });
    created = true;
  }

  const club = clubId;
  await ds.transaction(async (em) => {
    for (const s of DEMO_SUPPORTS) {
      created = (await ensureRecord(deps, em, 'supports', club, demoId(`support/${s.key}`), { ...s.fields, siteId, ...offsetToLatLon(s.at) })) || created;
    }
    for (const h of DEMO_HAZARDS) {
      const points = h.points.map((p) => offsetToLatLon(p));
      created = (await ensureRecord(deps, em, 'hazards', club, demoId(`hazard/${h.key}`), { ...h.fields, siteId, points })) || created;
    }
    for (const p of DEMO_POSITIONS) {
      created = (await ensureRecord(deps, em, 'operatingPositions', club, demoId(`position/${p.key}`), { ...p.fields, siteId, ...offsetToLatLon(p.at) })) || created;
    }
    for (const s of DEMO_STATIONS) {
      const crewMemberIds = s.crewEmails.map((email) => {
        const id = userIds.get(email);
        if (!id) throw new Error(`demo station ${s.key} names ${email} as crew, who is not a demo user`);
        return id;
      });
      const stationId = demoId(`station/${s.key}`);
      created = (await ensureRecord(deps, em, 'stations', club, stationId, { ...s.fields, crewMemberIds, eventId })) || created;
      created = (await backfillDemoCrew(deps, em, stationId, crewMemberIds)) || created;
    }
    for (const c of DEMO_COAX) {
      created = (await ensureRecord(deps, em, 'coax', club, demoId(`coax/${c.key}`), c.fields)) || created;
    }
  });
  return { created, clubId, siteId, eventId };
}
