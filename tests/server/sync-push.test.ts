// Push and merge against the real server and PostgreSQL: exactly-once under duplicated delivery and lost answers,
// refused mutations that do not block the queue, clock clamping, delete vs concurrent edit in both orders, and
// safety conflicts kept with both values and who made them.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_CLOCK_AHEAD_MS, PROTOCOL_VERSION, SCHEMA_VERSION, decodeHlc, encodeHlc } from '../../sync/protocol';
import { faultyTransport, NO_FAULTS, seededRandom, type FaultyTransport } from '../sync/harness/faulty-transport';
import { SimDevice } from '../sync/harness/sync-device';
import { measurementFields, newId, supportFields } from '../sync/harness/fixtures';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';

let app: TestApp;
let lead: TestUser;
let scout: TestUser;
let crew: TestUser;
let clubId: string;
// Virtual server time, moved by hand; it starts at real time because access tokens are issued by this clock.
let nowMs = Date.now();
const clock = { now: () => new Date(nowMs) };
let deviceCount = 0;

beforeAll(async () => {
  app = await startTestApp({ clock });
  lead = await app.signUpUser({ role: 'lead' });
  clubId = lead.clubId!;
  scout = await app.signUpUser({ role: 'scout', clubId });
  crew = await app.signUpUser({ role: 'crew', clubId });
});
afterAll(() => app?.close());

async function device(user: TestUser, opts: { faults?: Partial<typeof NO_FAULTS>; skewMs?: number } = {}) {
  let transport: FaultyTransport | undefined;
  const d = new SimDevice({
    baseUrl: app.baseUrl,
    clubId,
    token: user.tokens.accessToken,
    deviceId: `dev-${++deviceCount}-${Date.now()}`,
    nowMs: () => nowMs + (opts.skewMs ?? 0),
    wrapTransport: (t) => (transport = faultyTransport(t, seededRandom(deviceCount), { ...NO_FAULTS, ...opts.faults })),
  });
  await d.boot();
  return { d, transport: () => transport! };
}

const push = (user: TestUser, deviceId: string, mutations: unknown[], versions = { protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION }) =>
  app.api('POST', `/api/clubs/${clubId}/sync/push`, { auth: user, body: { type: 'push', ...versions, deviceId, mutations } });

async function row(table: string, id: string) {
  const [r] = await app.deps.dataSource.query(`SELECT to_jsonb(t) AS j FROM ${table} t WHERE id = $1`, [id]);
  return r?.j as Record<string, any> | undefined;
}

describe('sync push', () => {
  it('a support created on one device reaches another with the same fields and field clocks', async () => {
    const { d: a } = await device(scout);
    const { d: b } = await device(lead);
    const id = await a.client.create('supports', supportFields('Oak by the gate'));
    await a.sync();
    await b.sync();
    const seen = await b.client.get('supports', id);
    expect(seen).toMatchObject({ label: 'Oak by the gate', heightM: 18, clubId });
    expect(await a.store.pendingCount()).toBe(0);
    const stored = await row('supports', id);
    expect(decodeHlc(stored!.field_clocks.label).node).toBe(a.spec.deviceId);
  });

  it('applies every change exactly once when every request is delivered twice', async () => {
    const { d, transport } = await device(scout, { faults: { duplicate: 1 } });
    const supportId = await d.client.create('supports', supportFields('Twin pine'));
    const readings: string[] = [];
    for (let i = 0; i < 10; i++) readings.push(await d.client.create('measurements', measurementFields(supportId, 10 + i)));
    for (let i = 0; i < 5; i++) await d.client.update('supports', supportId, { notes: `visit ${i}` });
    await d.sync();
    expect(transport().log.duplicates).toBeGreaterThan(0);
    const [{ n }] = await app.deps.dataSource.query('SELECT count(*)::int AS n FROM measurements WHERE subject_id = $1', [supportId]);
    expect(n).toBe(10);
    const [dev] = await app.deps.dataSource.query('SELECT last_mutation_id FROM sync_devices WHERE device_id = $1', [d.spec.deviceId]);
    expect(Number(dev.last_mutation_id)).toBe(16);
    expect((await row('supports', supportId))!.notes).toBe('visit 4');
    expect(await d.client.rejections()).toEqual([]);
    const rejected = await app.api('GET', `/api/clubs/${clubId}/sync/rejected`, { auth: scout });
    expect(rejected.body.filter((r: { deviceId: string }) => r.deviceId === d.spec.deviceId)).toEqual([]);
  });

  it('loses nothing and duplicates nothing when the answer is lost after every commit', async () => {
    const { d, transport } = await device(scout, { faults: { dropResponse: 1 } });
    const id = await d.client.create('supports', supportFields('Lone ash'));
    const m1 = await d.client.create('measurements', measurementFields(id, 21.5));
    for (let attempt = 0; attempt < 3; attempt++) await d.sync();
    expect(transport().log.droppedResponses).toBeGreaterThanOrEqual(3);
    await d.client.update('supports', id, { label: 'Lone ash (north)' });
    transport().rates.dropResponse = 0;
    await d.sync();
    expect(await d.store.pendingCount()).toBe(0);
    expect((await row('supports', id))!.label).toBe('Lone ash (north)');
    const [{ n }] = await app.deps.dataSource.query('SELECT count(*)::int AS n FROM measurements WHERE id = $1', [m1]);
    expect(n).toBe(1);
    expect(await d.client.rejections()).toEqual([]);
  });

  it('records a mutation that always fails validation where its writer sees it, and applies the rest of the batch', async () => {
    const deviceId = `raw-${Date.now()}`;
    const id = newId();
    const clockAt = (c: number) => encodeHlc({ wallMs: nowMs, counter: c, node: deviceId });
    const mutations = [
      { mutationId: 1, collection: 'supports', recordId: id, op: 'upsert', fields: supportFields('Birch'), clock: clockAt(1) },
      { mutationId: 2, collection: 'supports', recordId: id, op: 'upsert', fields: { heightM: -4 }, clock: clockAt(2) },
      { mutationId: 3, collection: 'supports', recordId: id, op: 'upsert', fields: { notes: 'after the bad one' }, clock: clockAt(3) },
    ];
    const first = await push(scout, deviceId, mutations);
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ type: 'pushed', lastAppliedMutationId: 3, rejected: [{ mutationId: 2, code: 'invalid' }] });
    expect(first.body.rejected[0].message).toMatch(/heightM/);
    const again = await push(scout, deviceId, mutations);
    expect(again.body).toMatchObject({ lastAppliedMutationId: 3, rejected: [{ mutationId: 2, code: 'invalid' }] });
    const stored = await row('supports', id);
    expect(stored).toMatchObject({ height_m: 18, notes: 'after the bad one' });
    const mine = await app.api('GET', `/api/clubs/${clubId}/sync/rejected?recordId=${id}`, { auth: scout });
    expect(mine.body).toHaveLength(1);
    expect(mine.body[0]).toMatchObject({ mutationId: 2, fields: { heightM: -4 }, code: 'invalid' });
    const theirs = await app.api('GET', `/api/clubs/${clubId}/sync/rejected?recordId=${id}`, { auth: lead });
    expect(theirs.body).toEqual([]);
  });

  it('an edit of a record the server does not have is refused as not-found, a whole new record breaking a cross-field rule as invalid', async () => {
    const deviceId = `gone-${Date.now()}`;
    const clockAt = (c: number) => encodeHlc({ wallMs: nowMs, counter: c, node: deviceId });
    const res = await push(scout, deviceId, [
      { mutationId: 1, collection: 'supports', recordId: newId(), op: 'upsert', fields: { notes: 'edit of a purged tree' }, clock: clockAt(1) },
      { mutationId: 2, collection: 'hazards', recordId: newId(), op: 'upsert', fields: { siteId: newId(), kind: 'power-line', label: 'One-point line', points: [{ lat: 44.5, lon: -93.2 }] }, clock: clockAt(2) },
    ]);
    expect(res.body.rejected).toMatchObject([
      { mutationId: 1, code: 'not-found' },
      { mutationId: 2, code: 'invalid', message: 'points: a power line needs at least two points' },
    ]);
  });

  it('refuses by role, keeps measurements append-only, and lets crew change only a spot’s state', async () => {
    const deviceId = `crew-${Date.now()}`;
    const c = (n: number) => encodeHlc({ wallMs: nowMs, counter: n, node: deviceId });
    const res = await push(crew, deviceId, [{ mutationId: 1, collection: 'supports', recordId: newId(), op: 'upsert', fields: supportFields('Crew oak'), clock: c(1) }]);
    expect(res.body.rejected[0]).toMatchObject({ code: 'forbidden' });

    const { d } = await device(lead);
    const spot = await d.client.create('antennaSpots', { eventId: newId(), stationId: newId(), band: '40m', shape: 'flat', supportIds: [newId(), newId()], state: 'cleared' });
    const reading = await d.client.create('measurements', measurementFields(newId(), 12));
    await d.sync();
    const ok = await push(crew, deviceId, [{ mutationId: 2, collection: 'antennaSpots', recordId: spot, op: 'upsert', fields: { state: 'up', measuredSwr: 1.4 }, clock: c(2) }]);
    expect(ok.body).toMatchObject({ lastAppliedMutationId: 2, rejected: [] });
    expect((await row('antenna_spots', spot))!.state).toBe('up');
    const notes = await push(crew, deviceId, [{ mutationId: 3, collection: 'antennaSpots', recordId: spot, op: 'upsert', fields: { notes: 'moved it' }, clock: c(3) }]);
    expect(notes.body.rejected[0]).toMatchObject({ code: 'forbidden' });
    const edit = await push(lead, `lead-${Date.now()}`, [{ mutationId: 1, collection: 'measurements', recordId: reading, op: 'upsert', fields: { valueM: 99 }, clock: encodeHlc({ wallMs: nowMs, counter: 9, node: `lead-x` }) }]);
    expect(edit.body.rejected[0]).toMatchObject({ code: 'bad-clock' });
    const dl = `lead2-${Date.now()}`;
    const edit2 = await push(lead, dl, [{ mutationId: 1, collection: 'measurements', recordId: reading, op: 'upsert', fields: { valueM: 99 }, clock: encodeHlc({ wallMs: nowMs, counter: 9, node: dl }) }]);
    expect(edit2.body.rejected[0]).toMatchObject({ code: 'append-only' });
    expect((await row('measurements', reading))!.value_m).toBe(12);
  });

  it(`clamps a clock more than ${MAX_CLOCK_AHEAD_MS / 1000} s ahead of the server to that bound, keeping counter and node`, async () => {
    const { d } = await device(scout, { skewMs: 24 * 3600_000 });
    const id = await d.client.create('supports', supportFields('Fast-clock maple'));
    await d.sync();
    const stored = await row('supports', id);
    const p = decodeHlc(stored!.field_clocks.label);
    expect(p.wallMs).toBe(nowMs + MAX_CLOCK_AHEAD_MS);
    expect(p.node).toBe(d.spec.deviceId);
    // A device with a correct clock that saw the clamped value still wins with its later edit (HLC observes it).
    const { d: other } = await device(lead);
    await other.sync();
    nowMs += 1000;
    await other.client.update('supports', id, { label: 'Maple (checked)' });
    await other.sync();
    expect((await row('supports', id))!.label).toBe('Maple (checked)');
  });

  it('answers too-old requests with typed answers, not errors', async () => {
    const newer = await push(scout, 'v-test', [], { protocolVersion: PROTOCOL_VERSION + 1, schemaVersion: SCHEMA_VERSION });
    expect(newer.body).toMatchObject({ type: 'server-too-old' });
    const older = await push(scout, 'v-test', [], { protocolVersion: 0, schemaVersion: SCHEMA_VERSION });
    expect(older.body).toMatchObject({ type: 'client-too-old' });
    const bad = await app.api('POST', `/api/clubs/${clubId}/sync/pull`, { auth: scout, body: { type: 'pull', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, cursor: 'abc', limit: 10 } });
    expect(bad.status).toBe(400);
    expect(bad.body.code).toBe('validation_failed');
    const outsider = await app.signUpUser();
    const hidden = await app.api('POST', `/api/clubs/${clubId}/sync/pull`, { auth: outsider, body: { type: 'pull', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, cursor: '0', limit: 10 } });
    expect(hidden.status).toBe(404);
  });
});

describe('sync routes: who may call them', () => {
  it('answers 401 without a sign-in and 404 to a non-member on every sync route; a member’s role is checked per change instead', async () => {
    const outsider = await app.signUpUser();
    const routes: [string, string, unknown?][] = [
      ['POST', 'push', { type: 'push', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, deviceId: 'x', mutations: [] }],
      ['POST', 'pull', { type: 'pull', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, cursor: '0', limit: 10 }],
      ['GET', 'conflicts'],
      ['GET', 'rejected'],
    ];
    for (const [method, path, body] of routes) {
      const anonymous = await app.api(method, `/api/clubs/${clubId}/sync/${path}`, { body });
      expect(anonymous.status, `${method} ${path} without sign-in`).toBe(401);
      const foreign = await app.api(method, `/api/clubs/${clubId}/sync/${path}`, { body, auth: outsider });
      expect(foreign.status, `${method} ${path} by a non-member`).toBe(404);
      expect(foreign.body).toMatchObject({ code: 'not_found' });
      const member = await app.api(method, `/api/clubs/${clubId}/sync/${path}`, { body, auth: crew });
      expect(member.status, `${method} ${path} by a member`).toBe(200);
    }
  });
});

describe('delete against a concurrent edit (deletion state has its own clock; an edit never changes it)', () => {
  for (const order of ['delete first', 'edit first'] as const) {
    it(`ends deleted with the edit kept inside, on the server and both devices (${order})`, async () => {
      const { d: a } = await device(scout);
      const { d: b } = await device(lead);
      const id = await a.client.create('supports', supportFields('Dead elm'));
      await a.sync();
      await b.sync();
      nowMs += 1000;
      await a.client.remove('supports', id);
      nowMs += 1000;
      await b.client.update('supports', id, { notes: 'hollow trunk' });
      const [first, second] = order === 'delete first' ? [a, b] : [b, a];
      await first.sync();
      await second.sync();
      await first.sync();
      for (const dev of [a, b]) {
        expect(await dev.client.get('supports', id)).toBeNull();
        expect(await dev.client.get('supports', id, { includeDeleted: true })).toMatchObject({ notes: 'hollow trunk' });
      }
      const stored = await row('supports', id);
      expect(stored!.deleted_at).not.toBeNull();
      expect(stored!.notes).toBe('hollow trunk');
      nowMs += 1000;
      await a.client.undelete('supports', id);
      await a.sync();
      await b.sync();
      expect(await b.client.get('supports', id)).toMatchObject({ notes: 'hollow trunk', deletedAt: null });
    });
  }
});

describe('safety conflicts', () => {
  it('keeps both values of a concurrently changed support height and who made them; the later clock wins', async () => {
    const { d: a } = await device(scout);
    const { d: b } = await device(lead);
    const id = await a.client.create('supports', supportFields('Tall oak', { heightM: 20 }));
    await a.sync();
    await b.sync();
    nowMs += 1000;
    await a.client.update('supports', id, { heightM: 22, notes: 'scout' });
    nowMs += 1000;
    await b.client.update('supports', id, { heightM: 17, notes: 'lead' });
    await b.sync();
    await a.sync();
    await b.sync();
    expect((await a.client.get('supports', id))!.heightM).toBe(17);
    expect((await b.client.get('supports', id))!.heightM).toBe(17);
    const res = await app.api('GET', `/api/clubs/${clubId}/sync/conflicts?recordId=${id}`, { auth: lead });
    expect(res.status).toBe(200);
    expect(res.body).toHaveLength(1);
    expect(res.body[0]).toMatchObject({ collection: 'supports', field: 'heightM', keptValue: 17, keptBy: lead.id, otherValue: 22, otherBy: scout.id });
    // A change made after seeing the other's value is not a conflict.
    nowMs += 1000;
    await a.client.update('supports', id, { heightM: 18 });
    await a.sync();
    const after = await app.api('GET', `/api/clubs/${clubId}/sync/conflicts?recordId=${id}`, { auth: scout });
    expect(after.body).toHaveLength(1);
  });
});
