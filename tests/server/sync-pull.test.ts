// Pull against the real server and PostgreSQL: completeness while four writers push at once (change_seq becomes
// visible in commit order), a crash between a pull page and its cursor, and the tombstone horizon.
import 'fake-indexeddb/auto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { purgeTombstones } from '../../server/src/modules/sync/tombstones';
import { PROTOCOL_VERSION, SCHEMA_VERSION } from '../../sync/protocol';
import { SimDevice } from '../sync/harness/sync-device';
import { supportFields } from '../sync/harness/fixtures';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';

let app: TestApp;
let lead: TestUser;
let clubId: string;
let n = 0;

beforeAll(async () => {
  app = await startTestApp();
  lead = await app.signUpUser({ role: 'lead' });
  clubId = lead.clubId!;
});
afterAll(() => app?.close());

function device(opts: Partial<ConstructorParameters<typeof SimDevice>[0]> = {}) {
  return new SimDevice({ baseUrl: app.baseUrl, clubId, token: lead.tokens.accessToken, deviceId: `pull-${++n}-${Date.now()}`, nowMs: () => Date.now(), ...opts }).boot();
}

describe('sync pull', () => {
  it('misses no record while four writers push concurrently and a reader pulls small pages the whole time', async () => {
    const writers = await Promise.all([0, 1, 2, 3].map(() => device({ pushBatch: 5 })));
    const reader = await device({ pullLimit: 7 });
    const ids: string[] = [];
    for (const [w, d] of writers.entries()) for (let i = 0; i < 40; i++) ids.push(await d.client.create('supports', supportFields(`W${w} tree ${i}`)));
    let writing = true;
    const readerLoop = (async () => {
      while (writing) await reader.sync();
    })();
    await Promise.all(writers.map((d) => d.sync()));
    writing = false;
    await readerLoop;
    await reader.sync();
    const seen = await reader.client.list('supports');
    expect(new Set(seen.map((r) => r.id))).toEqual(new Set(ids));
    expect(seen).toHaveLength(ids.length);
  });

  it('resumes correctly after a crash between applying a pull page and storing its cursor (one transaction: neither is kept)', async () => {
    const writer = await device();
    for (let i = 0; i < 25; i++) await writer.client.create('supports', supportFields(`Crash test ${i}`));
    await writer.sync();
    let pages = 0;
    const reader = await device({
      storage: 'idb',
      pullLimit: 10,
      beforeCommit: (op) => {
        if (op === 'apply-pull-page' && ++pages === 2) throw new Error('simulated power loss');
      },
    });
    await reader.sync();
    expect(reader.client.status().error?.message).toMatch(/simulated power loss/);
    await reader.restart();
    const cursorAfterCrash = (await reader.store.getMeta()).cursor;
    expect((await reader.store.listRecords('supports')).length).toBe(10);
    expect(Number(cursorAfterCrash)).toBeGreaterThan(0);
    await reader.sync();
    const all = await writer.client.list('supports');
    const got = await reader.client.list('supports');
    expect(got.map((r) => r.id).sort()).toEqual(all.map((r) => r.id).sort());
  });

  it('tells a device older than the tombstone horizon to resync, after it has pushed its outbox', async () => {
    const a = await device();
    const b = await device();
    const gone = await a.client.create('supports', supportFields('Felled birch'));
    const kept = await a.client.create('supports', supportFields('Standing oak'));
    await a.sync();
    await b.sync();
    await a.client.remove('supports', gone);
    await a.sync();
    await b.client.update('supports', kept, { notes: 'written while away' });
    await purgeTombstones(app.deps.dataSource, new Date(Date.now() + 60_000));
    const res = await app.api('POST', `/api/clubs/${clubId}/sync/pull`, { auth: lead, body: { type: 'pull', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, cursor: '1', limit: 10 } });
    expect(res.body.type).toBe('resync-required');
    await b.sync();
    expect(b.client.status().error).toBeNull();
    expect(await b.client.get('supports', gone, { includeDeleted: true })).toBeNull();
    expect(await b.client.get('supports', kept)).toMatchObject({ notes: 'written while away' });
    await a.sync();
    expect(await a.client.get('supports', kept)).toMatchObject({ notes: 'written while away' });
  });
});
