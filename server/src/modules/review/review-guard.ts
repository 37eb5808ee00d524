// The server's own check of every review decision that arrives by sync, before it is stored: the spot is rebuilt
// from the club's records as they stand in the database and evaluated with the same engine the app uses, so an
// "accept" of a blocked result (or one made against inputs that have since changed) is refused, whatever the
// device sent. A refusal becomes a rejected mutation the person sees beside the record.
import type { EntityManager } from 'typeorm';
import { evaluateEventSpots, decisionProblem, type SpotEvaluation } from '../../../../shared/review';
import type { CollectionName, ReviewDecision, StoredRecord } from '../../../../shared/schemas';
import { snakeCase, tableOf } from '../../db/synced-columns';
import { rowFromJson } from '../sync/row-codec';

async function load<C extends CollectionName>(em: EntityManager, collection: C, clubId: string, where: Record<string, string> = {}): Promise<StoredRecord<C>[]> {
  const keys = Object.keys(where);
  const cond = keys.map((k, i) => `t.${snakeCase(k)} = $${i + 2}`).join(' AND ');
  const rows: { j: Record<string, unknown> }[] = await em.query(
    `SELECT to_jsonb(t) AS j FROM ${tableOf(collection)} t WHERE t.club_id = $1${cond ? ` AND ${cond}` : ''}`,
    [clubId, ...keys.map((k) => where[k])],
  );
  return rows.map((r) => {
    const row = rowFromJson(collection, r.j);
    return { ...row.fields, id: row.id, clubId: row.clubId, createdAt: row.createdAt, updatedAt: row.updatedAt, deletedAt: row.deletedAt } as StoredRecord<C>;
  });
}

export async function evaluateSpotOnServer(em: EntityManager, clubId: string, spotId: string): Promise<SpotEvaluation | string> {
  const [spot] = await load(em, 'antennaSpots', clubId, { id: spotId });
  if (!spot || spot.deletedAt !== null) return 'no such antenna spot in this club: it may have been removed';
  const [event] = await load(em, 'events', clubId, { id: spot.eventId });
  if (!event) return 'the spot’s event is not in this club';
  const [site] = await load(em, 'sites', clubId, { id: event.siteId });
  if (!site) return 'the spot’s site is not in this club';
  const records = {
    site,
    supports: await load(em, 'supports', clubId, { siteId: site.id }),
    hazards: await load(em, 'hazards', clubId, { siteId: site.id }),
    operatingPositions: await load(em, 'operatingPositions', clubId, { siteId: site.id }),
    stations: await load(em, 'stations', clubId, { eventId: event.id }),
    coax: await load(em, 'coax', clubId),
  };
  const decisions = await load(em, 'reviewDecisions', clubId, { spotId });
  return evaluateEventSpots(records, [spot], decisions).spots[0];
}

/** One per push: evaluates each spot once however many decisions about it the push carries. */
export function createReviewGuard(em: EntityManager, clubId: string, userId: string) {
  const cache = new Map<string, Promise<SpotEvaluation | string>>();
  return {
    /** Why this decision may not be stored, in plain words; null when it may. */
    async check(fields: Pick<ReviewDecision, 'spotId' | 'resultKey' | 'decision' | 'reason' | 'inputsFingerprint' | 'decidedBy'>): Promise<string | null> {
      if (fields.decidedBy !== userId) return 'a review decision is recorded in the name of the person who sends it';
      // Sending a result back is always allowed (the cautious choice, even against an old view of the spot);
      // an acceptance must match the spot as the server sees it now and can never be of a blocked result.
      if (fields.decision !== 'accept') return null;
      let evaluation = cache.get(fields.spotId);
      if (!evaluation) {
        evaluation = evaluateSpotOnServer(em, clubId, fields.spotId);
        cache.set(fields.spotId, evaluation);
      }
      const e = await evaluation;
      if (typeof e === 'string') return e;
      return decisionProblem(fields, e.results, e.fingerprint);
    },
  };
}
