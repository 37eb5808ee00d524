// Sync problems against the real server and PostgreSQL: a safety conflict made by two scouts' pushes is listed
// with both values, settled by a lead (safety and scouts may read but not settle; another club sees nothing), and a
// person dismisses their own refused change but not someone else's. Routes: server/src/modules/sync/router.ts;
// abilities from shared/schemas/roles.ts (plan.write settles).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PROTOCOL_VERSION, SCHEMA_VERSION, encodeHlc } from '../../sync/protocol';
import { newId, supportFields } from '../sync/harness/fixtures';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';

let app: TestApp;
let lead: TestUser;
let admin: TestUser;
let safety: TestUser;
let scoutA: TestUser;
let scoutB: TestUser;
let outsider: TestUser;
let clubId: string;
let runs = 0;

beforeAll(async () => {
  app = await startTestApp();
  lead = await app.signUpUser({ role: 'lead', displayName: 'Lee Lead' });
  clubId = lead.clubId!;
  admin = await app.signUpUser({ role: 'admin', clubId });
  safety = await app.signUpUser({ role: 'safety', clubId });
  scoutA = await app.signUpUser({ role: 'scout', clubId, displayName: 'Ana Scout' });
  scoutB = await app.signUpUser({ role: 'scout', clubId, displayName: 'Ben Scout' });
  outsider = await app.signUpUser({ role: 'admin' });
});
afterAll(() => app?.close());

const push = (user: TestUser, deviceId: string, mutations: unknown[]) =>
  app.api('POST', `/api/clubs/${clubId}/sync/push`, { auth: user, body: { type: 'push', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, deviceId, mutations } });

/**
 * Scout A creates a tree at 12 m, then (later clock) measures 14 m; scout B, who only saw the 12 m, records 11 m
 * with an earlier clock. The merge keeps 14 m (later clock) and keeps 11 m beside it as a conflict.
 */
async function makeHeightConflict(): Promise<{ supportId: string; conflictId: string }> {
  const n = ++runs;
  const devA = `problems-a-${n}-${Date.now()}`;
  const devB = `problems-b-${n}-${Date.now()}`;
  const supportId = newId();
  const t0 = Date.now() - 60_000;
  const created = encodeHlc({ wallMs: t0, counter: 0, node: devA });
  const a = await push(scoutA, devA, [
    { mutationId: 1, collection: 'supports', recordId: supportId, op: 'upsert', fields: supportFields(`Tree ${n}`, { heightM: 12 }), clock: created },
    { mutationId: 2, collection: 'supports', recordId: supportId, op: 'upsert', fields: { heightM: 14 }, baseClocks: { heightM: created }, clock: encodeHlc({ wallMs: t0 + 20_000, counter: 0, node: devA }) },
  ]);
  expect(a.body).toMatchObject({ type: 'pushed', rejected: [] });
  const b = await push(scoutB, devB, [
    { mutationId: 1, collection: 'supports', recordId: supportId, op: 'upsert', fields: { heightM: 11 }, baseClocks: { heightM: created }, clock: encodeHlc({ wallMs: t0 + 10_000, counter: 0, node: devB }) },
  ]);
  expect(b.body).toMatchObject({ type: 'pushed', rejected: [] });
  const list = await app.api('GET', `/api/clubs/${clubId}/sync/conflicts?recordId=${supportId}`, { auth: safety });
  expect(list.status).toBe(200);
  expect(list.body).toHaveLength(1);
  return { supportId, conflictId: list.body[0].id };
}

const resolve = (who: TestUser | string, conflictId: string, body: unknown, club = clubId) =>
  app.api('POST', `/api/clubs/${club}/sync/conflicts/${conflictId}/resolve`, { auth: who, body });

describe('safety conflicts: listing and settling', () => {
  it('two scouts’ concurrent heights are listed open with both values, who made them, and no resolution (merge rule: later clock kept)', async () => {
    const { supportId } = await makeHeightConflict();
    const res = await app.api('GET', `/api/clubs/${clubId}/sync/conflicts?recordId=${supportId}`, { auth: scoutA });
    expect(res.body[0]).toMatchObject({
      collection: 'supports', recordId: supportId, field: 'heightM',
      keptValue: 14, keptBy: scoutA.id, otherValue: 11, otherBy: scoutB.id,
      resolvedAt: null, resolvedBy: null, choice: null, note: null,
    });
  });

  it('a lead settles one with "use the other value" and a note; it leaves the open list and shows in ?open=false with who and when', async () => {
    const { supportId, conflictId } = await makeHeightConflict();
    const res = await resolve(lead, conflictId, { choice: 'other', note: '  Ben re-measured from 30 m.  ' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ id: conflictId, choice: 'other', resolvedBy: lead.id, note: 'Ben re-measured from 30 m.' });
    expect(Date.parse(res.body.resolvedAt)).toBeGreaterThan(Date.now() - 60_000);
    const open = await app.api('GET', `/api/clubs/${clubId}/sync/conflicts?recordId=${supportId}`, { auth: lead });
    expect(open.body).toEqual([]);
    const all = await app.api('GET', `/api/clubs/${clubId}/sync/conflicts?recordId=${supportId}&open=false`, { auth: lead });
    expect(all.body).toHaveLength(1);
    expect(all.body[0]).toMatchObject({ id: conflictId, choice: 'other', resolvedBy: lead.id });
    // Settling writes no record: the kept value stays on the server until the lead's own change syncs.
    const [row] = await app.deps.dataSource.query('SELECT height_m FROM supports WHERE id = $1', [supportId]);
    expect(row.height_m).toBe(14);
  });

  it('an admin may settle with "keep this value" and no note; a second settlement answers 409 and changes nothing', async () => {
    const { conflictId } = await makeHeightConflict();
    const first = await resolve(admin, conflictId, { choice: 'kept' });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ choice: 'kept', resolvedBy: admin.id, note: null });
    const again = await resolve(lead, conflictId, { choice: 'other' });
    expect(again.status).toBe(409);
    expect(again.body.code).toBe('already_resolved');
    const [row] = await app.deps.dataSource.query('SELECT choice, resolved_by FROM sync_conflicts WHERE id = $1', [conflictId]);
    expect(row).toEqual({ choice: 'kept', resolved_by: admin.id });
  });

  it('the safety officer and a scout may read but not settle (403, role grants in shared/schemas/roles.ts); the conflict stays open', async () => {
    const { conflictId } = await makeHeightConflict();
    for (const who of [safety, scoutA]) {
      const res = await resolve(who, conflictId, { choice: 'kept' });
      expect(res.status).toBe(403);
      expect(res.body.code).toBe('forbidden');
    }
    const [row] = await app.deps.dataSource.query('SELECT resolved_at FROM sync_conflicts WHERE id = $1', [conflictId]);
    expect(row.resolved_at).toBeNull();
  });

  it('another club’s admin gets 404 for the club, and a conflict id of another club is "not found" to its own lead', async () => {
    const { conflictId } = await makeHeightConflict();
    const foreign = await resolve(outsider, conflictId, { choice: 'kept' });
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual({ code: 'not_found', message: 'club not found' });
    const theirList = await app.api('GET', `/api/clubs/${outsider.clubId}/sync/conflicts?open=false`, { auth: outsider });
    expect(theirList.body.map((c: { id: string }) => c.id)).not.toContain(conflictId);
    const viaOwnClub = await resolve(outsider, conflictId, { choice: 'kept' }, outsider.clubId!);
    expect(viaOwnClub.status).toBe(404);
    expect(viaOwnClub.body.message).toBe('conflict not found');
  });

  it('bad bodies and ids are refused with the field named', async () => {
    const { conflictId } = await makeHeightConflict();
    const bad = await resolve(lead, conflictId, { choice: 'newest' });
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body)).toContain('choice');
    expect((await resolve(lead, conflictId, { choice: 'kept', note: 'x'.repeat(501) })).status).toBe(400);
    expect((await resolve(lead, '0', { choice: 'kept' })).status).toBe(400);
    expect((await app.api('GET', `/api/clubs/${clubId}/sync/conflicts?open=maybe`, { auth: lead })).status).toBe(400);
  });
});

describe('refused changes: dismissing one’s own', () => {
  async function refusedStationPush(user: TestUser): Promise<string> {
    const deviceId = `problems-refused-${++runs}-${Date.now()}`;
    const recordId = newId();
    const res = await push(user, deviceId, [
      { mutationId: 1, collection: 'stations', recordId, op: 'upsert', fields: { eventId: newId(), name: 'Station 1', bands: ['40m'], mode: 'ssb', powerW: 100, purpose: 'regional' }, clock: encodeHlc({ wallMs: Date.now(), counter: 0, node: deviceId }) },
    ]);
    expect(res.body.rejected).toEqual([expect.objectContaining({ code: 'forbidden' })]);
    const mine = await app.api('GET', `/api/clubs/${clubId}/sync/rejected?recordId=${recordId}`, { auth: user });
    expect(mine.body).toHaveLength(1);
    return mine.body[0].id;
  }

  it('a scout dismisses their own refused station push (scouts lack plan.write); it leaves their list and stays on record', async () => {
    const id = await refusedStationPush(scoutA);
    const res = await app.api('POST', `/api/clubs/${clubId}/sync/rejected/${id}/dismiss`, { auth: scoutA });
    expect(res.status).toBe(204);
    const list = await app.api('GET', `/api/clubs/${clubId}/sync/rejected`, { auth: scoutA });
    expect(list.body.map((r: { id: string }) => r.id)).not.toContain(id);
    const [row] = await app.deps.dataSource.query('SELECT dismissed_at FROM sync_rejected WHERE id = $1', [id]);
    expect(row.dismissed_at).not.toBeNull();
    expect((await app.api('POST', `/api/clubs/${clubId}/sync/rejected/${id}/dismiss`, { auth: scoutA })).status).toBe(204);
  });

  it('someone else’s refused change is "not found" to another scout and to the lead, and stays in its owner’s list', async () => {
    const id = await refusedStationPush(scoutB);
    for (const who of [scoutA, lead]) {
      const res = await app.api('POST', `/api/clubs/${clubId}/sync/rejected/${id}/dismiss`, { auth: who });
      expect(res.status).toBe(404);
      expect(res.body.message).toBe('refused change not found');
    }
    const theirs = await app.api('GET', `/api/clubs/${clubId}/sync/rejected`, { auth: scoutB });
    expect(theirs.body.map((r: { id: string }) => r.id)).toContain(id);
  });
});
