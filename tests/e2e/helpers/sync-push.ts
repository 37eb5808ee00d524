import { randomUUID } from 'node:crypto';
import { evaluateEventSpots, type SiteRecords } from '../../../shared/review';
import type { AntennaSpot } from '../../../shared/schemas';
import { PROTOCOL_VERSION, SCHEMA_VERSION, encodeHlc } from '../../../sync/protocol';
import { api, pullAll, type PulledRecord } from './api';

/* A second device of a person, pushing by the sync route, and the shared review of an event as the server holds it. */

export type Change = { collection: string; recordId: string; op?: 'upsert' | 'delete'; fields?: Record<string, unknown> };

const devices = new Map<string, { id: string; next: number }>();

/** Pushes changes from this person's second device (one per token); returns what the server rejected. */
export async function pushFrom(token: string, clubId: string, changes: Change[]): Promise<{ code: string; message: string }[]> {
  const d = devices.get(token) ?? { id: `e2e-${randomUUID().slice(0, 8)}`, next: 1 };
  devices.set(token, d);
  const now = Date.now();
  const mutations = changes.map((c) => {
    const mutationId = d.next++;
    return { mutationId, collection: c.collection, recordId: c.recordId, op: c.op ?? 'upsert', fields: c.fields ?? {}, baseClocks: {}, clock: encodeHlc({ wallMs: now, counter: mutationId, node: d.id }) };
  });
  const r = await api<{ rejected: { code: string; message: string }[] }>(`/api/clubs/${clubId}/sync/push`, {
    token,
    json: { type: 'push', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, deviceId: d.id, mutations },
  });
  if (r.status !== 200) throw new Error(`push answered ${r.status}: ${JSON.stringify(r.body)}`);
  return r.body.rejected;
}

export const liveOf = (all: PulledRecord[], collection: string) => all.filter((r) => r.collection === collection && r.deletedAt === null);

/** The shared review of an event from what the server holds (what every device computes): spots and site file. */
async function reviewOnServer(token: string, clubId: string, eventId: string) {
  const all = await pullAll(token, clubId);
  const asRecord = (r: PulledRecord) => ({ ...r.fields, id: r.id, clubId, deletedAt: r.deletedAt, createdAt: '', updatedAt: '' });
  const siteId = liveOf(all, 'events').find((e) => e.id === eventId)!.fields.siteId;
  const bySite = (c: string) => liveOf(all, c).filter((r) => r.fields.siteId === siteId).map(asRecord);
  const records = {
    site: asRecord(liveOf(all, 'sites').find((s) => s.id === siteId)!),
    supports: bySite('supports'),
    hazards: bySite('hazards'),
    operatingPositions: bySite('operatingPositions'),
    stations: liveOf(all, 'stations').filter((s) => s.fields.eventId === eventId).map(asRecord),
    coax: liveOf(all, 'coax').map(asRecord),
  } as unknown as SiteRecords;
  const spots = liveOf(all, 'antennaSpots').filter((s) => s.fields.eventId === eventId).map(asRecord) as unknown as AntennaSpot[];
  return evaluateEventSpots(records, spots, []);
}

/** The review of each live spot of the event, as every device computes it from what the server holds. */
export async function eventReviewOnServer(token: string, clubId: string, eventId: string) {
  return (await reviewOnServer(token, clubId, eventId)).spots;
}

/** The site file the planning engine reads for the event (what the app's planner is given). */
export async function eventSiteFileOnServer(token: string, clubId: string, eventId: string) {
  return (await reviewOnServer(token, clubId, eventId)).file;
}
