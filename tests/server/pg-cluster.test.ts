// The private PostgreSQL cluster (server/src/dev/pg-cluster.ts): loopback only, reusable, and placed where the
// postgres OS user can reach it (PLATFORM.md: initdb fails with "Permission denied" under a mode-700 parent).
import { chmodSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Client } from 'pg';
import { afterAll, describe, expect, it } from 'vitest';
import { resolveClusterDir, startCluster, type PgCluster } from '../../server/src/dev/pg-cluster';

const isRoot = process.getuid?.() === 0;
const root = mkdtempSync(join(tmpdir(), 'loftline-cluster-test-'));
chmodSync(root, 0o755); // mkdtemp makes it 0700: the postgres OS user could not enter it
const started: PgCluster[] = [];

afterAll(async () => {
  for (const c of started) {
    await c.stop();
    rmSync(c.dataDir, { recursive: true, force: true });
  }
  rmSync(root, { recursive: true, force: true });
});

describe('pg-cluster', () => {
  it.skipIf(!isRoot)('a data folder under a parent the postgres user cannot enter moves to a stable folder under /tmp', async () => {
    const privateDir = join(root, 'private');
    mkdirSync(privateDir, { mode: 0o700 });
    chmodSync(privateDir, 0o700);
    const wanted = join(privateDir, 'data', 'pg');
    const a = await resolveClusterDir(wanted);
    expect(a.startsWith(join(tmpdir(), 'loftline-pg-'))).toBe(true);
    expect(await resolveClusterDir(wanted)).toBe(a);
    expect(await resolveClusterDir(join(root, 'open', 'pg'))).toBe(join(root, 'open', 'pg'));
  });

  it('starts on 127.0.0.1, creates databases once, and a second start on the running folder reuses it', async () => {
    const first = await startCluster({ dataDir: join(root, 'c1') });
    started.push(first);
    expect(first.host).toBe('127.0.0.1');
    expect(await first.ensureDatabase('loftline_x')).toBe(true);
    expect(await first.ensureDatabase('loftline_x')).toBe(false);
    const client = new Client({ connectionString: first.url('loftline_x') });
    await client.connect();
    const { rows } = await client.query("SELECT current_setting('listen_addresses') AS listen, current_setting('server_version_num')::int AS v");
    await client.end();
    expect(rows[0].listen).toBe('127.0.0.1');
    expect(rows[0].v).toBeGreaterThanOrEqual(150000);

    const again = await startCluster({ dataDir: join(root, 'c1') });
    expect(again.port).toBe(first.port);
  });

  it('keeps its databases across a stop and a start', async () => {
    const c = await startCluster({ dataDir: join(root, 'c2') });
    await c.ensureDatabase('kept');
    await c.stop();
    const c2 = await startCluster({ dataDir: join(root, 'c2') });
    started.push(c2);
    expect(await c2.ensureDatabase('kept')).toBe(false);
  });
});

describe('pg-cluster watcher', () => {
  it('stops the cluster and removes its folders once the watched process is gone', async () => {
    const { spawn } = await import('node:child_process');
    const { existsSync } = await import('node:fs');
    const sleeper = spawn('sleep', ['600'], { stdio: 'ignore' });
    const dir = join(root, 'watched');
    const c = await startCluster({ dataDir: dir });
    c.stopWhenGone(sleeper.pid as number, [c.dataDir]);
    const client = new Client({ connectionString: c.url('postgres') });
    await client.connect();
    await client.end();
    sleeper.kill();
    let gone = false;
    for (let i = 0; i < 60 && !gone; i++) {
      await new Promise((ok) => setTimeout(ok, 500));
      gone = !existsSync(c.dataDir);
    }
    expect(gone).toBe(true);
    const late = new Client({ connectionString: c.url('postgres'), connectionTimeoutMillis: 2000 });
    await expect(late.connect()).rejects.toThrow();
  });
});
