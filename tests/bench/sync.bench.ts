// Sync throughput, against a private PostgreSQL cluster under /tmp and the real Express app on port 0:
//  1. push + apply 10,000 new supports from one device (the real fetch transport, batches of 1,000);
//  2. the same number of rows bulk-upserted straight through `pg` (multi-row INSERT … ON CONFLICT DO UPDATE,
//     batches of 1,000, one transaction) as the baseline, in the same run, into the same table;
//  3. the initial pull of those 10,000 records into IndexedDB — fake-indexeddb in Node, not a browser — through
//     the real sync client (pages of 1,000, each page and its cursor in one transaction).
// Prints rows per second and the ratio to the baseline; asserts nothing.
import 'fake-indexeddb/auto';
import { randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { Client } from 'pg';
import { createLogger, systemClock, type AppDeps } from '../../server/src/app-deps';
import { createApp } from '../../server/src/app';
import { loadConfig } from '../../server/src/config';
import { createDataSource, openAndMigrate } from '../../server/src/db/data-source';
import { startCluster } from '../../server/src/dev/pg-cluster';
import { PROTOCOL_VERSION, SCHEMA_VERSION, encodeHlc, type Mutation } from '../../sync/protocol';
import { createFetchTransport } from '../../sync/transport/fetch-transport';
import { openIdbStore } from '../../sync/store/idb-store';
import { createSyncClient } from '../../sync/engine/sync-client';

const N = 10_000;
const BATCH = 1_000;
const SITE = '5a1e0000-0000-4000-8000-000000000001';

const fields = (i: number) => ({
  siteId: SITE, kind: 'tree', label: `Tree ${i}`, lat: 44.5 + (i % 1000) / 1e5, lon: -93.2 - Math.floor(i / 1000) / 1e4, positionAccuracyM: 3, heightM: 10 + (i % 25),
  attachHeightM: 8 + (i % 20), launchMethod: 'throw-bag', maxEnds: 2, species: 'red oak', condition: 'sound', mastModel: '', notes: `bench row ${i}`,
});

const rate = (rows: number, ms: number) => Math.round(rows / (ms / 1000));

export async function run(): Promise<void> {
  const root = mkdtempSync(join(tmpdir(), 'loftline-bench-sync-'));
  const cluster = await startCluster({ dataDir: join(root, 'pg') });
  await cluster.ensureDatabase('bench');
  const dataSource = createDataSource({ url: cluster.url('bench'), poolSize: 5 });
  const server = { close: async () => undefined as void };
  try {
    await openAndMigrate(dataSource);
    const config = { ...loadConfig({ LOG_LEVEL: 'silent', DATA_DIR: join(root, 'data') }, () => 'bench-secret-'.padEnd(64, 'x')), jsonLimit: '20mb' };
    const deps: AppDeps = { dataSource, config, logger: createLogger('silent'), mail: { enqueue: async () => undefined }, clock: systemClock };
    const http = await new Promise<import('node:http').Server>((ok) => {
      const s = createApp(deps).listen(0, '127.0.0.1', () => ok(s));
    });
    server.close = () => new Promise<void>((ok) => http.close(() => ok()));
    const baseUrl = `http://127.0.0.1:${(http.address() as AddressInfo).port}`;
    const post = async (path: string, body: unknown, token?: string) => {
      const res = await fetch(`${baseUrl}${path}`, { method: 'POST', headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) }, body: JSON.stringify(body) });
      if (!res.ok) throw new Error(`${path}: HTTP ${res.status} ${await res.text()}`);
      return res.json() as Promise<any>;
    };
    const tokens = await post('/api/auth/sign-up', { email: 'bench@kestrel.test', password: 'bench-password-1', displayName: 'Bench' });
    const token: string = tokens.accessToken;
    const club = await post('/api/clubs', { name: 'Bench club', callSign: '' }, token);
    const clubId: string = club.id;
    const baselineClub: string = (await post('/api/clubs', { name: 'Baseline club', callSign: '' }, token)).id;

    // 1. push + apply through the server.
    const deviceId = 'bench-device';
    const now = Date.now();
    const mutations: Mutation[] = Array.from({ length: N }, (_, i) => ({
      mutationId: i + 1, collection: 'supports', recordId: randomUUID(), op: 'upsert', fields: fields(i), baseClocks: {}, clock: encodeHlc({ wallMs: now, counter: i, node: deviceId }),
    }));
    const transport = createFetchTransport({ baseUrl, clubId, getAccessToken: async () => token });
    const t0 = performance.now();
    const cpu0 = process.cpuUsage();
    for (let i = 0; i < N; i += BATCH) {
      const res = await transport.push({ type: 'push', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, deviceId, mutations: mutations.slice(i, i + BATCH) });
      if (res.type !== 'pushed' || res.rejected.length > 0) throw new Error(`push refused: ${JSON.stringify(res).slice(0, 300)}`);
    }
    const pushMs = performance.now() - t0;
    const pushCpu = process.cpuUsage(cpu0);

    // 2. the baseline: the same rows (new ids, in a club of their own so that step 3 pulls only the pushed ones)
    //    upserted straight through pg into the same table.
    const pg = new Client({ connectionString: cluster.url('bench') });
    await pg.connect();
    const cols = ['id', 'club_id', 'site_id', 'kind', 'label', 'lat', 'lon', 'position_accuracy_m', 'height_m', 'attach_height_m', 'launch_method', 'max_ends', 'species', 'condition', 'mast_model', 'notes', 'field_clocks'];
    const t1 = performance.now();
    await pg.query('BEGIN');
    for (let i = 0; i < N; i += BATCH) {
      const values: unknown[] = [];
      const tuples: string[] = [];
      for (let j = i; j < Math.min(N, i + BATCH); j++) {
        const f = fields(j);
        const row = [randomUUID(), baselineClub, f.siteId, f.kind, f.label, f.lat, f.lon, f.positionAccuracyM, f.heightM, f.attachHeightM, f.launchMethod, f.maxEnds, f.species, f.condition, f.mastModel, f.notes, '{}'];
        tuples.push(`(${row.map((_, k) => `$${values.length + k + 1}`).join(', ')})`);
        values.push(...row);
      }
      await pg.query(
        `INSERT INTO supports (${cols.join(', ')}) VALUES ${tuples.join(', ')} ON CONFLICT (id) DO UPDATE SET ${cols.slice(2).map((c) => `${c} = EXCLUDED.${c}`).join(', ')}`,
        values,
      );
    }
    await pg.query('COMMIT');
    const rawMs = performance.now() - t1;
    await pg.end();

    // 3. initial pull of the pushed rows into IndexedDB on a fresh device.
    const idb = await openIdbStore({ name: `bench-pull-${Date.now()}` });
    // Split the pull's time between the network answer (server query, HTTP, parsing) and the IndexedDB writes.
    let answerMs = 0;
    let storeMs = 0;
    const timed = <A extends unknown[], R>(fn: (...a: A) => Promise<R>, add: (ms: number) => void) => async (...a: A) => {
      const t = performance.now();
      try {
        return await fn(...a);
      } finally {
        add(performance.now() - t);
      }
    };
    const store = { ...idb, applyPullPage: timed(idb.applyPullPage, (ms) => (storeMs += ms)) };
    const pullTransport = { ...transport, pull: timed(transport.pull, (ms) => (answerMs += ms)) };
    const client = await createSyncClient({
      store, transport: pullTransport, clock: { nowMs: () => Date.now() }, random: Math.random, deviceId: 'bench-reader', clubId,
      timers: { setTimeout: () => 0, clearTimeout: () => undefined }, pullLimit: BATCH,
    });
    const t2 = performance.now();
    const cpu2 = process.cpuUsage();
    await client.syncNow();
    const pullMs = performance.now() - t2;
    const pullCpu = process.cpuUsage(cpu2);
    const pulled = (await client.list('supports')).length;
    if (client.status().error) throw new Error(`pull failed: ${client.status().error?.message}`);
    await client.stop();
    await idb.close();

    const pushRate = rate(N, pushMs);
    const rawRate = rate(N, rawMs);
    // CPU time of this process (app server and client together, PostgreSQL not included) beside wall time:
    // on a shared machine the wall time also measures the neighbours.
    const cpuMs = (u: NodeJS.CpuUsage) => ((u.user + u.system) / 1000).toFixed(0);
    console.log(`push + apply ${N} new supports over HTTP (batches of ${BATCH}): ${pushMs.toFixed(0)} ms (${cpuMs(pushCpu)} ms CPU in Node), ${pushRate} rows/s`);
    console.log(`baseline bulk upsert of ${N} rows straight through pg (batches of ${BATCH}, one transaction): ${rawMs.toFixed(0)} ms, ${rawRate} rows/s`);
    console.log(`ratio push / baseline: ${(pushRate / rawRate).toFixed(2)} (aim: at least 0.33)`);
    console.log(`initial pull of ${pulled} records into IndexedDB (fake-indexeddb in Node), pages of ${BATCH}: ${pullMs.toFixed(0)} ms (${cpuMs(pullCpu)} ms CPU in Node; ${answerMs.toFixed(0)} ms waiting for answers, ${storeMs.toFixed(0)} ms writing pages), ${rate(pulled, pullMs)} rows/s (aim: ${N} in under 3000 ms)`);
  } finally {
    await server.close();
    await dataSource.destroy().catch(() => undefined);
    await cluster.stop();
    rmSync(root, { recursive: true, force: true });
  }
}
