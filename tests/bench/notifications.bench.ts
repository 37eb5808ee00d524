// What the notification hook adds to a sync push, against a private PostgreSQL cluster under /tmp, calling the push
// service directly (no HTTP): pushes of 200 antenna spots moved into review, applied with the hook (once-only keys,
// recipients, one queued e-mail per safety officer; the queue is a no-op here, so this is the hook's own database
// and CPU cost) and without it, alternating, on fresh spots each round. Prints ms per push; asserts nothing.
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { createLogger } from '../../server/src/app-deps';
import { loadConfig } from '../../server/src/config';
import { createDataSource, openAndMigrate } from '../../server/src/db/data-source';
import { startCluster } from '../../server/src/dev/pg-cluster';
import { notificationsAfterApply } from '../../server/src/modules/notifications/notify-after-apply';
import { applyPush } from '../../server/src/modules/sync/push-service';
import { PROTOCOL_VERSION, SCHEMA_VERSION, encodeHlc, type Mutation } from '../../sync/protocol';

const SPOTS = 200;
const ROUNDS = 6;
const SAFETY_OFFICERS = 3;

export async function run(): Promise<void> {
  const root = mkdtempSync(join(tmpdir(), 'loftline-bench-notify-'));
  const cluster = await startCluster({ dataDir: join(root, 'pg') });
  await cluster.ensureDatabase('bench');
  const dataSource = createDataSource({ url: cluster.url('bench'), poolSize: 3 });
  try {
    await openAndMigrate(dataSource);
    const logger = createLogger('silent');
    const config = loadConfig({ LOG_LEVEL: 'silent', DATA_DIR: join(root, 'data') }, () => 'bench-secret-'.padEnd(64, 'x'));
    let queued = 0;
    const hook = notificationsAfterApply({ config, logger, mail: { enqueue: async () => void queued++ } });

    const user = async (role: string, clubId?: string) => {
      const [u] = await dataSource.query("INSERT INTO users (email, display_name, password_hash) VALUES ($1, 'Bench', 'x') RETURNING id", [`${randomUUID()}@kestrel.test`]);
      if (!clubId) [{ id: clubId }] = await dataSource.query("INSERT INTO clubs (name) VALUES ('Bench club') RETURNING id");
      await dataSource.query('INSERT INTO memberships (club_id, user_id, role) VALUES ($1, $2, $3)', [clubId, u.id, role]);
      return { userId: u.id as string, clubId: clubId! };
    };
    const lead = await user('lead');
    for (let i = 0; i < SAFETY_OFFICERS; i++) await user('safety', lead.clubId);
    const crewIds: string[] = [];
    for (let i = 0; i < 5; i++) {
      const u = await user(i % 2 ? 'crew' : 'scout', lead.clubId);
      if (i % 2) crewIds.push(u.userId);
    }

    const deviceId = 'bench-notify';
    let mutationId = 0;
    const push = (changes: { collection: Mutation['collection']; recordId: string; fields: Record<string, unknown> }[], withHook: boolean) =>
      applyPush(
        dataSource,
        {
          type: 'push', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, deviceId,
          mutations: changes.map((c) => ({ ...c, mutationId: ++mutationId, op: 'upsert' as const, baseClocks: {}, clock: encodeHlc({ wallMs: Date.now(), counter: mutationId % 60000, node: deviceId }) })),
        },
        { clubId: lead.clubId, userId: lead.userId, role: 'lead', nowMs: Date.now(), logger, afterApply: withHook ? [hook] : [] },
      );
    const ids = { site: randomUUID(), event: randomUUID(), station: randomUUID() };
    await push([
      { collection: 'sites', recordId: ids.site, fields: { name: 'Bench field', refLat: 44.9, refLon: -92.9, notes: '' } },
      { collection: 'events', recordId: ids.event, fields: { siteId: ids.site, name: 'Bench outing', startsOn: '2026-12-19', endsOn: '2026-12-19', notes: '' } },
      { collection: 'stations', recordId: ids.station, fields: { eventId: ids.event, name: 'Bench station', bands: ['40m'], mode: 'ssb', powerW: 100, purpose: 'regional', notes: '' } },
    ], false);

    const times = { with: [] as number[], without: [] as number[] };
    for (let round = 0; round < ROUNDS * 2; round++) {
      const withHook = round % 2 === 0;
      const spots = Array.from({ length: SPOTS }, () => randomUUID());
      await push(spots.map((id) => ({ collection: 'antennaSpots', recordId: id, fields: { eventId: ids.event, stationId: ids.station, band: '40m', shape: 'flat', supportIds: [randomUUID(), randomUUID()], notes: '' } })), false);
      const t0 = performance.now();
      await push(spots.map((id) => ({ collection: 'antennaSpots', recordId: id, fields: { state: 'waiting-review' } })), withHook);
      (withHook ? times.with : times.without).push(performance.now() - t0);
    }
    const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
    console.log(`push of ${SPOTS} spots into review, ${ROUNDS} rounds each, median:`);
    console.log(`  without the notification hook  ${median(times.without).toFixed(1)} ms`);
    console.log(`  with it (${SAFETY_OFFICERS} safety officers)    ${median(times.with).toFixed(1)} ms  (${queued} e-mails queued in all: one per officer per push)`);
    console.log(`  hook cost                      ${(median(times.with) - median(times.without)).toFixed(1)} ms per push`);

    // Clearing spots readies their sheets: for a station naming its crew (stations.crewMemberIds) the hook looks the
    // crew up once per push; for one naming none it mails every crew member. Same push size, hook on for both.
    const crewed = randomUUID();
    await push([{ collection: 'stations', recordId: crewed, fields: { eventId: ids.event, name: 'Crewed station', bands: ['20m'], mode: 'cw', powerW: 100, purpose: 'long-distance', crewMemberIds: [crewIds[0]], notes: '' } }], false);
    const cleared = { named: [] as number[], none: [] as number[] };
    for (let round = 0; round < ROUNDS * 2; round++) {
      const named = round % 2 === 1;
      const spots = Array.from({ length: SPOTS }, () => randomUUID());
      await push(spots.map((id) => ({ collection: 'antennaSpots', recordId: id, fields: { eventId: ids.event, stationId: named ? crewed : ids.station, band: named ? '20m' : '40m', shape: 'flat', supportIds: [randomUUID(), randomUUID()], state: 'waiting-review', notes: '' } })), false);
      const t0 = performance.now();
      await push(spots.map((id) => ({ collection: 'antennaSpots', recordId: id, fields: { state: 'cleared' } })), true);
      (named ? cleared.named : cleared.none).push(performance.now() - t0);
    }
    console.log(`push of ${SPOTS} spots cleared (lead + sheet-ready mails), with the hook, median:`);
    console.log(`  station naming its crew         ${median(cleared.named).toFixed(1)} ms`);
    console.log(`  station naming no crew (all)    ${median(cleared.none).toFixed(1)} ms`);
  } finally {
    await dataSource.destroy().catch(() => undefined);
    await cluster.stop();
    rmSync(root, { recursive: true, force: true });
  }
}
