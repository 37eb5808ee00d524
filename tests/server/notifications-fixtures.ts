// Raw sync pushes for the notification suites: a device per person, its own mutation counter and clocks, and the
// records of one event (site, event, station, spots) written the way the app writes them.
import { randomUUID } from 'node:crypto';
import { PROTOCOL_VERSION, SCHEMA_VERSION, encodeHlc } from '../../sync/protocol';
import type { TestApp, TestUser } from './helpers/test-app';

export type Device = { user: TestUser; deviceId: string; next: number; sent: unknown[][] };

export type Change = { collection: string; recordId: string; op?: 'upsert' | 'delete' | 'undelete'; fields?: Record<string, unknown> };

export function device(user: TestUser): Device {
  return { user, deviceId: `n-${randomUUID().slice(0, 8)}`, next: 1, sent: [] };
}

/** Pushes the changes as one batch from `d`; returns the server's answer body. */
export async function push(app: TestApp, clubId: string, d: Device, changes: Change[], nowMs: number) {
  const mutations = changes.map((c) => {
    const mutationId = d.next++;
    return {
      mutationId,
      collection: c.collection,
      recordId: c.recordId,
      op: c.op ?? 'upsert',
      fields: c.fields ?? {},
      baseClocks: {},
      clock: encodeHlc({ wallMs: nowMs, counter: mutationId, node: d.deviceId }),
    };
  });
  d.sent.push(mutations);
  return repush(app, clubId, d, mutations);
}

/** Sends exactly these mutations again (a retried or duplicated delivery). */
export async function repush(app: TestApp, clubId: string, d: Device, mutations: unknown[]) {
  const res = await app.api('POST', `/api/clubs/${clubId}/sync/push`, {
    auth: d.user,
    body: { type: 'push', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, deviceId: d.deviceId, mutations },
  });
  if (res.status !== 200) throw new Error(`push answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body as { type: string; rejected: { code: string; recordId: string }[] };
}

export type EventIds = { siteId: string; eventId: string; stationId: string; supportIds: [string, string] };

export function eventRecords(name: string): { ids: EventIds; changes: Change[] } {
  const ids: EventIds = { siteId: randomUUID(), eventId: randomUUID(), stationId: randomUUID(), supportIds: [randomUUID(), randomUUID()] };
  return {
    ids,
    changes: [
      { collection: 'sites', recordId: ids.siteId, fields: { name: 'Alder Bend Meadows', refLat: 44.9312, refLon: -92.8671, notes: '' } },
      { collection: 'events', recordId: ids.eventId, fields: { siteId: ids.siteId, name, startsOn: '2026-12-19', endsOn: '2026-12-20', notes: '' } },
      {
        collection: 'stations',
        recordId: ids.stationId,
        fields: { eventId: ids.eventId, name: 'Phone station', bands: ['40m', '20m'], mode: 'ssb', powerW: 100, purpose: 'regional', notes: '' },
      },
    ],
  };
}

export function spotCreate(ids: EventIds, band: '40m' | '20m', state = 'planned'): Change {
  return {
    collection: 'antennaSpots',
    recordId: randomUUID(),
    fields: { eventId: ids.eventId, stationId: ids.stationId, band, shape: 'flat', supportIds: ids.supportIds, state, stateReason: '', inputsFingerprint: 'fp-1', notes: '' },
  };
}

export const setState = (spotId: string, state: string): Change => ({ collection: 'antennaSpots', recordId: spotId, fields: { state, stateReason: `now ${state}` } });

export function decision(spotId: string, by: TestUser, kind: 'accept' | 'send-back', nowMs: number): Change {
  return {
    collection: 'reviewDecisions',
    recordId: randomUUID(),
    fields: {
      spotId,
      resultKey: 'power-line:x',
      decision: kind,
      reason: kind === 'accept' ? 'Fall zone roped off, checked on site' : 'Too close to the distribution line; move it east',
      inputsFingerprint: 'fp-1',
      decidedAt: new Date(nowMs).toISOString(),
      decidedBy: by.id,
    },
  };
}
