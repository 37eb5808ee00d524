// The running server purges old tombstones on its own (server/src/modules/sync/tombstone-purge.ts): a record
// deleted longer ago than the keep time is removed for good and the club's horizon moves past it, so an old
// phone is told to resync; a recent delete stays for phones that have not heard of it yet.
import 'fake-indexeddb/auto';
import pino from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadConfig } from '../../server/src/config';
import { scheduleTombstonePurge } from '../../server/src/modules/sync/tombstone-purge';
import { supportFields } from '../sync/harness/fixtures';
import { SimDevice } from '../sync/harness/sync-device';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';

let app: TestApp;
let lead: TestUser;
let clubId: string;

beforeAll(async () => {
  app = await startTestApp();
  lead = await app.signUpUser({ role: 'lead' });
  clubId = lead.clubId!;
});
afterAll(() => app?.close());

const device = (name: string) =>
  new SimDevice({ baseUrl: app.baseUrl, clubId, token: lead.tokens.accessToken, deviceId: `purge-${name}-${Date.now()}`, nowMs: () => Date.now() }).boot();

describe('tombstone purge while the server runs', () => {
  it('removes tombstones older than the keep time, keeps recent ones, and moves the club horizon', async () => {
    const a = await device('a');
    const old = await a.client.create('supports', supportFields('Felled ash'));
    const recent = await a.client.create('supports', supportFields('Storm-broken willow'));
    await a.sync();
    await a.client.remove('supports', old);
    await a.client.remove('supports', recent);
    await a.sync();
    const ds = app.deps.dataSource;
    // The old delete happened 100 days ago, the recent one 3 days ago (deleted_at is the server's time of the delete).
    await ds.query(`UPDATE supports SET deleted_at = now() - interval '100 days' WHERE id = $1`, [old]);
    await ds.query(`UPDATE supports SET deleted_at = now() - interval '3 days' WHERE id = $1`, [recent]);
    const purge = scheduleTombstonePurge(ds, { keepDays: 90, clock: { now: () => new Date() }, logger: pino({ level: 'silent' }), firstAfterMs: 3_600_000 });
    try {
      const counts = await purge.runNow();
      expect(counts.get(clubId)).toBe(1);
      const left: { id: string }[] = await ds.query('SELECT id FROM supports WHERE id = ANY($1)', [[old, recent]]);
      expect(left.map((r) => r.id)).toEqual([recent]);
      const [h] = await ds.query('SELECT horizon_seq FROM sync_horizons WHERE club_id = $1', [clubId]);
      expect(Number(h.horizon_seq)).toBeGreaterThan(0);
      // A second run right away finds nothing more to remove.
      expect((await purge.runNow()).get(clubId)).toBeUndefined();
    } finally {
      await purge.stop();
    }
  });

  it('runs on its own after start, and a run that fails is logged and retried on the next tick', async () => {
    const warnings: string[] = [];
    const logger = pino({ level: 'warn' }, { write: (line: string) => void warnings.push(JSON.parse(line).msg) });
    let calls = 0;
    const failingOnce = { now: () => { calls++; if (calls === 1) throw new Error('clock not ready'); return new Date(); } };
    const purge = scheduleTombstonePurge(app.deps.dataSource, { keepDays: 90, clock: failingOnce, logger, firstAfterMs: 10, everyMs: 50 });
    try {
      await expect.poll(() => calls, { timeout: 5_000 }).toBeGreaterThanOrEqual(3);
      expect(warnings).toContain('tombstone purge failed; the next run tries again');
    } finally {
      await purge.stop();
    }
    const after = calls;
    await new Promise((r) => setTimeout(r, 150));
    expect(calls).toBe(after);
  });

  it('the keep time is a setting with a floor of a week (TOMBSTONE_KEEP_DAYS)', () => {
    expect(loadConfig({ JWT_SECRET: 'x'.repeat(32) }).tombstoneKeepDays).toBe(90);
    expect(loadConfig({ JWT_SECRET: 'x'.repeat(32), TOMBSTONE_KEEP_DAYS: '30' }).tombstoneKeepDays).toBe(30);
    expect(() => loadConfig({ JWT_SECRET: 'x'.repeat(32), TOMBSTONE_KEEP_DAYS: '2' })).toThrow(/at least 7/);
  });
});
