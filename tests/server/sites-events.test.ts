// Sites and events over REST against real PostgreSQL: create, list newest first, read, edit, soft delete, with the
// shared zod field rules (shared/schemas/records.ts), event.write for writers, and the rows written into the synced
// tables (change_seq from the trigger, per-field clocks) so that phones pull them like any other change.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PROTOCOL_VERSION, SCHEMA_VERSION, compareHlc, decodeHlc, pullResponseSchema } from '../../sync/protocol';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';

let t: TestApp;
let lead: TestUser;
let clubId: string;
beforeAll(async () => {
  t = await startTestApp();
  lead = await t.signUpUser({ role: 'lead' });
  clubId = lead.clubId!;
});
afterAll(async () => {
  await t?.close();
});

// An invented park at an invented rural spot (demo scenario).
const alderBend = { name: 'Alder Bend Meadows', refLat: 44.9312, refLon: -92.8671, notes: 'Gate code from the ranger.' };
const sites = (path = '') => `/api/clubs/${clubId}/sites${path}`;
const events = (path = '') => `/api/clubs/${clubId}/events${path}`;

async function newSite(fields: Record<string, unknown> = {}) {
  const res = await t.api('POST', sites(), { auth: lead, body: { ...alderBend, ...fields } });
  expect(res.status).toBe(201);
  return res.body;
}

describe('sites', () => {
  it('creates a site with the schema defaults filled in and answers the stored record', async () => {
    const site = await newSite();
    expect(site).toMatchObject({ ...alderBend, clubId, groundClass: null, groundSigmaSPerM: null, rules: '', deletedAt: null });
    expect(site.id).toMatch(/^[0-9a-f-]{36}$/);
    expect((await t.api('GET', sites(`/${site.id}`), { auth: lead })).body).toEqual(site);
  });

  it('keeps a client-generated id (records made offline keep theirs) and refuses the same id twice (409)', async () => {
    const id = '7d0e8f3c-1b2a-4c5d-9e6f-0a1b2c3d4e5f';
    const site = await newSite({ id });
    expect(site.id).toBe(id);
    const again = await t.api('POST', sites(), { auth: lead, body: { ...alderBend, id } });
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('id_taken');
  });

  it('lists newest first and leaves soft-deleted sites out unless asked', async () => {
    const a = await newSite({ name: 'List A' });
    const b = await newSite({ name: 'List B' });
    const list = await t.api('GET', sites(), { auth: lead });
    const names = list.body.map((s: { name: string }) => s.name);
    expect(names.indexOf('List B')).toBeLessThan(names.indexOf('List A'));
    expect((await t.api('DELETE', sites(`/${a.id}`), { auth: lead })).status).toBe(204);
    const after = await t.api('GET', sites(), { auth: lead });
    expect(after.body.map((s: { id: string }) => s.id)).not.toContain(a.id);
    const all = await t.api('GET', sites('?includeDeleted=true'), { auth: lead });
    const deleted = all.body.find((s: { id: string }) => s.id === a.id);
    expect(deleted.deletedAt).not.toBeNull();
    expect(all.body.map((s: { id: string }) => s.id)).toContain(b.id);
  });

  it('a soft-deleted site is 404 to GET, PATCH and DELETE, while its row stays with a deletion clock for sync', async () => {
    const site = await newSite();
    await t.api('DELETE', sites(`/${site.id}`), { auth: lead });
    expect((await t.api('GET', sites(`/${site.id}`), { auth: lead })).status).toBe(404);
    expect((await t.api('PATCH', sites(`/${site.id}`), { auth: lead, body: { notes: 'x' } })).status).toBe(404);
    expect((await t.api('DELETE', sites(`/${site.id}`), { auth: lead })).status).toBe(404);
    const rows: { deleted_at: Date | null; deleted_clock: string | null }[] = await t.deps.dataSource.query('SELECT deleted_at, deleted_clock FROM sites WHERE id = $1', [site.id]);
    expect(rows[0]!.deleted_at).not.toBeNull();
    expect(decodeHlc(rows[0]!.deleted_clock!).node).toBe('server-rest');
  });

  it('PATCH changes only the fields sent, stamps each with a newer clock, and bumps change_seq (so sync pulls it)', async () => {
    const site = await newSite({ groundDescription: 'wet meadow' });
    const before: { change_seq: number; field_clocks: Record<string, string> }[] = await t.deps.dataSource.query('SELECT change_seq, field_clocks FROM sites WHERE id = $1', [site.id]);
    const res = await t.api('PATCH', sites(`/${site.id}`), { auth: lead, body: { notes: 'Bring the long throw line.', groundEpsR: 13 } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ ...alderBend, notes: 'Bring the long throw line.', groundEpsR: 13, groundDescription: 'wet meadow' });
    const after: typeof before = await t.deps.dataSource.query('SELECT change_seq, field_clocks FROM sites WHERE id = $1', [site.id]);
    expect(after[0]!.change_seq).toBeGreaterThan(before[0]!.change_seq);
    expect(after[0]!.field_clocks.notes! > before[0]!.field_clocks.notes!).toBe(true);
    expect(after[0]!.field_clocks.name).toBe(before[0]!.field_clocks.name);
    expect(Object.keys(before[0]!.field_clocks).sort()).toContain('refLat');
  });

  it('bad fields are 400 with the field named and change nothing', async () => {
    const site = await newSite();
    const bad = await t.api('PATCH', sites(`/${site.id}`), { auth: lead, body: { refLat: 91 } });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toMatch(/refLat: latitude must be between -90 and 90/);
    const unknown = await t.api('PATCH', sites(`/${site.id}`), { auth: lead, body: { colour: 'red' } });
    expect(unknown.status).toBe(400);
    expect(unknown.body.message).toMatch(/colour/);
    expect((await t.api('GET', sites(`/${site.id}`), { auth: lead })).body.refLat).toBe(alderBend.refLat);
  });
});

describe('events', () => {
  it('creates an event at a club site, lists latest outing first, filters by site', async () => {
    const site = await newSite();
    const other = await newSite({ name: 'Heron Point' });
    const autumn = await t.api('POST', events(), { auth: lead, body: { siteId: site.id, name: 'Autumn outing', startsOn: '2026-12-19', endsOn: '2026-12-20' } });
    expect(autumn.status).toBe(201);
    expect(autumn.body).toMatchObject({ siteId: site.id, name: 'Autumn outing', startsOn: '2026-12-19', endsOn: '2026-12-20', notes: '', clubId });
    const winter = await t.api('POST', events(), { auth: lead, body: { siteId: other.id, name: 'Winter outing', startsOn: '2027-01-16', endsOn: '2027-01-16' } });
    expect(winter.status).toBe(201);
    const list = await t.api('GET', events(), { auth: lead });
    const names = list.body.map((e: { name: string }) => e.name);
    expect(names.indexOf('Winter outing')).toBeLessThan(names.indexOf('Autumn outing'));
    const atSite = await t.api('GET', events(`?siteId=${site.id}`), { auth: lead });
    expect(atSite.body.map((e: { name: string }) => e.name)).toEqual(['Autumn outing']);
  });

  it('an event must end on or after its first day, also after a PATCH of one date (the merged record is checked)', async () => {
    const site = await newSite();
    const backwards = await t.api('POST', events(), { auth: lead, body: { siteId: site.id, name: 'Backwards', startsOn: '2026-12-20', endsOn: '2026-12-19' } });
    expect(backwards.status).toBe(400);
    expect(backwards.body.message).toMatch(/end on or after/);
    const ok = await t.api('POST', events(), { auth: lead, body: { siteId: site.id, name: 'One day', startsOn: '2026-12-20', endsOn: '2026-12-20' } });
    const patch = await t.api('PATCH', events(`/${ok.body.id}`), { auth: lead, body: { startsOn: '2026-12-21' } });
    expect(patch.status).toBe(400);
    expect((await t.api('GET', events(`/${ok.body.id}`), { auth: lead })).body.startsOn).toBe('2026-12-20');
  });

  it("an event's site must be one of this club's live sites (400 site_not_found)", async () => {
    const otherLead = await t.signUpUser({ role: 'lead' });
    const foreign = await t.api('POST', `/api/clubs/${otherLead.clubId}/sites`, { auth: otherLead, body: alderBend });
    const res = await t.api('POST', events(), { auth: lead, body: { siteId: foreign.body.id, name: 'Trespass', startsOn: '2026-12-19', endsOn: '2026-12-19' } });
    expect(res.status).toBe(400);
    expect(res.body.code).toBe('site_not_found');
    const gone = await newSite();
    await t.api('DELETE', sites(`/${gone.id}`), { auth: lead });
    const atDeleted = await t.api('POST', events(), { auth: lead, body: { siteId: gone.id, name: 'Ghost', startsOn: '2026-12-19', endsOn: '2026-12-19' } });
    expect(atDeleted.status).toBe(400);
  });

  it('writing needs event.write: a scout reads events but cannot create, edit or delete them (403)', async () => {
    const site = await newSite();
    const ev = await t.api('POST', events(), { auth: lead, body: { siteId: site.id, name: 'Scouted', startsOn: '2026-12-19', endsOn: '2026-12-19' } });
    const scout = await t.signUpUser({ role: 'scout', clubId });
    expect((await t.api('GET', events(`/${ev.body.id}`), { auth: scout })).status).toBe(200);
    expect((await t.api('POST', events(), { auth: scout, body: { siteId: site.id, name: 'No', startsOn: '2026-12-19', endsOn: '2026-12-19' } })).status).toBe(403);
    expect((await t.api('PATCH', events(`/${ev.body.id}`), { auth: scout, body: { name: 'Renamed' } })).status).toBe(403);
    expect((await t.api('DELETE', events(`/${ev.body.id}`), { auth: scout })).status).toBe(403);
    expect((await t.api('GET', events(`/${ev.body.id}`), { auth: scout })).body.name).toBe('Scouted');
  });
});

describe('REST writes reach the phones through sync', () => {
  async function pullAll(): Promise<Map<string, { fields: Record<string, unknown>; fieldClocks: Record<string, string>; deletedAt: string | null }>> {
    const res = await t.api('POST', `/api/clubs/${clubId}/sync/pull`, {
      auth: lead,
      body: { type: 'pull', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, cursor: '0', limit: 1000 },
    });
    expect(res.status).toBe(200);
    const answer = pullResponseSchema.parse(res.body);
    if (answer.type !== 'changes') throw new Error(`pull answered ${answer.type}`);
    return new Map(answer.changes.map((c) => [c.id, c]));
  }

  it('a site created, edited and deleted over REST is pulled with its new values, newer clocks and its tombstone', async () => {
    const site = await newSite({ name: 'Pulled Meadow' });
    const first = (await pullAll()).get(site.id)!;
    expect(first.fields).toMatchObject({ name: 'Pulled Meadow', refLat: alderBend.refLat });
    await t.api('PATCH', sites(`/${site.id}`), { auth: lead, body: { name: 'Pulled Meadow (north)' } });
    const edited = (await pullAll()).get(site.id)!;
    expect(edited.fields.name).toBe('Pulled Meadow (north)');
    expect(compareHlc(edited.fieldClocks.name, first.fieldClocks.name)).toBe(1);
    await t.api('DELETE', sites(`/${site.id}`), { auth: lead });
    expect((await pullAll()).get(site.id)!.deletedAt).not.toBeNull();
  });
});
