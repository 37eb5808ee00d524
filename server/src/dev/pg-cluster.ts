// A private PostgreSQL cluster on loopback, for `npm start` and for the server tests.
// PostgreSQL's initdb refuses to run as root, so when we are root the cluster is created and run as the
// `postgres` OS user (runuser), in a data folder that user owns. That user must be able to enter every parent
// folder of the data folder; a checkout under a private folder (e.g. /root) cannot host it, so we fall back to
// a folder under /tmp whose name is derived from the requested path (the same path finds the same data again).
import { execFile, spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { promisify } from 'node:util';
import { Client } from 'pg';

const exec = promisify(execFile);
const PG_USER = 'postgres';
const HOST = '127.0.0.1';

export interface PgCluster {
  host: string;
  port: number;
  user: string;
  /** The folder that really holds the cluster (may differ from the one asked for, see above). */
  dataDir: string;
  url(database: string): string;
  /** CREATE DATABASE when it does not exist yet; returns true when it was created. */
  ensureDatabase(name: string, template?: string): Promise<boolean>;
  dropDatabase(name: string): Promise<void>;
  stop(): Promise<void>;
  /**
   * Starts a small detached watcher that stops the cluster (and removes `removeDirs`) once process `pid` is gone,
   * so a test run killed before its teardown leaves no server behind. Harmless after a normal stop.
   */
  stopWhenGone(pid: number, removeDirs?: string[]): void;
}

const WATCHER = `pid=$1; data=$2; pgctl=$3; asroot=$4; shift 4
while kill -0 "$pid" 2>/dev/null; do sleep 2; done
if [ "$asroot" = 1 ]; then runuser -u postgres -- "$pgctl" -D "$data" -m fast -w stop; else "$pgctl" -D "$data" -m fast -w stop; fi >/dev/null 2>&1
for d in "$@"; do rm -rf -- "$d"; done`;

const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;

/** Runs a PostgreSQL tool as the postgres OS user when we are root, as ourselves otherwise. */
async function runPg(bin: string, args: string[]): Promise<{ stdout: string; stderr: string }> {
  if (isRoot()) return exec('runuser', ['-u', PG_USER, '--', bin, ...args], { cwd: '/' });
  return exec(bin, args);
}

function newestBinDir(): string | null {
  const root = '/usr/lib/postgresql';
  if (!existsSync(root)) return null;
  const versions = readdirSync(root)
    .filter((v) => existsSync(join(root, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? join(root, versions[0], 'bin') : null;
}

/** Finds the PostgreSQL server binaries; installs Debian's `postgresql` when they are missing and we are root. */
export async function findPgBinDir(): Promise<string> {
  const found = newestBinDir();
  if (found) return found;
  if (!isRoot()) throw new Error('PostgreSQL server binaries not found under /usr/lib/postgresql: install the Debian package "postgresql"');
  console.error('PostgreSQL not found: installing the Debian package "postgresql" (one time)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  await exec('apt-get', ['update', '-qq'], { env, maxBuffer: 64 * 1024 * 1024 });
  await exec('apt-get', ['install', '-y', '-qq', 'postgresql'], { env, maxBuffer: 64 * 1024 * 1024 });
  const installed = newestBinDir();
  if (!installed) throw new Error('installed "postgresql" but found no initdb under /usr/lib/postgresql');
  return installed;
}

async function postgresCanUse(dir: string): Promise<boolean> {
  if (!isRoot()) return true;
  try {
    await exec('runuser', ['-u', PG_USER, '--', 'test', '-x', dir], { cwd: '/' });
    return true;
  } catch {
    return false;
  }
}

/** Where the cluster for `wanted` lives: the folder itself, or a stable stand-in under /tmp. */
export async function resolveClusterDir(wanted: string): Promise<string> {
  const abs = resolve(wanted);
  mkdirSync(dirname(abs), { recursive: true });
  if (await postgresCanUse(dirname(abs))) return abs;
  const key = createHash('sha256').update(abs).digest('hex').slice(0, 16);
  return join(tmpdir(), `loftline-pg-${key}`);
}

async function chownToPostgres(dir: string): Promise<void> {
  if (isRoot()) await exec('chown', ['-R', `${PG_USER}:${PG_USER}`, dir]);
}

export async function freePort(): Promise<number> {
  return new Promise((ok, fail) => {
    const srv = createServer();
    srv.unref();
    srv.on('error', fail);
    srv.listen(0, HOST, () => {
      const addr = srv.address();
      const port = typeof addr === 'object' && addr ? addr.port : 0;
      srv.close(() => ok(port));
    });
  });
}

/** The port of a cluster already running on this data folder (postmaster.pid line 4), or null. */
async function runningPort(binDir: string, dataDir: string): Promise<number | null> {
  if (!existsSync(join(dataDir, 'postmaster.pid'))) return null;
  try {
    await runPg(join(binDir, 'pg_ctl'), ['-D', dataDir, 'status']);
  } catch {
    return null; // a stale pid file: pg_ctl start will clear it
  }
  const lines = readFileSync(join(dataDir, 'postmaster.pid'), 'utf8').split('\n');
  const port = Number(lines[3]);
  return Number.isInteger(port) && port > 0 ? port : null;
}

function quoteIdent(name: string): string {
  if (!/^[a-z_][a-z0-9_]{0,62}$/.test(name)) throw new Error(`not a plain database name: ${name}`);
  return `"${name}"`;
}

async function withClient<T>(adminUrl: string, fn: (c: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: adminUrl });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** CREATE DATABASE `name` (optionally as a copy of `template`) unless it exists; true when created. */
export function ensureDatabase(adminUrl: string, name: string, template?: string): Promise<boolean> {
  return withClient(adminUrl, async (c) => {
    const exists = await c.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (exists.rowCount) return false;
    const sql = `CREATE DATABASE ${quoteIdent(name)}${template ? ` TEMPLATE ${quoteIdent(template)}` : ''}`;
    // Two clones of one template at the same moment can meet "source database is being accessed" (55006).
    for (let attempt = 0; ; attempt++) {
      try {
        await c.query(sql);
        return true;
      } catch (err) {
        if ((err as { code?: string }).code !== '55006' || attempt >= 20) throw err;
        await new Promise((r) => setTimeout(r, 100 + attempt * 50));
      }
    }
  });
}

export function dropDatabase(adminUrl: string, name: string): Promise<void> {
  return withClient(adminUrl, async (c) => {
    await c.query(`DROP DATABASE IF EXISTS ${quoteIdent(name)} WITH (FORCE)`);
  });
}

export interface StartClusterOptions {
  /** Folder for the cluster's data; created (initdb) when empty, reused when it holds a cluster. */
  dataDir: string;
  /** Port to listen on; a free one is picked when omitted. */
  port?: number;
}

/** Starts (or reuses) a cluster listening only on 127.0.0.1, with a socket folder of its own. */
export async function startCluster(opts: StartClusterOptions): Promise<PgCluster> {
  const binDir = await findPgBinDir();
  const dataDir = await resolveClusterDir(opts.dataDir);
  mkdirSync(dataDir, { recursive: true, mode: 0o700 });
  await chownToPostgres(dataDir);

  if (!existsSync(join(dataDir, 'PG_VERSION'))) {
    await runPg(join(binDir, 'initdb'), ['-D', dataDir, '-U', PG_USER, '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8']);
  }

  let port = await runningPort(binDir, dataDir);
  let socketDir: string | null = null;
  if (port === null) {
    let lastError: unknown;
    for (let attempt = 0; attempt < 4 && port === null; attempt++) {
      const tryPort = opts.port ?? (await freePort());
      socketDir = mkdtempSync(join(tmpdir(), 'loftline-pgsock-'));
      await chownToPostgres(socketDir);
      const options = `-c listen_addresses=${HOST} -p ${tryPort} -k ${socketDir} -c fsync=on`;
      try {
        await runPg(join(binDir, 'pg_ctl'), ['-D', dataDir, '-l', join(dataDir, 'loftline-server.log'), '-w', '-t', '60', '-o', options, 'start']);
        port = tryPort;
      } catch (err) {
        lastError = err;
        rmSync(socketDir, { recursive: true, force: true });
        socketDir = null;
        if (opts.port !== undefined) break; // a fixed port taken will not free itself
      }
    }
    if (port === null) {
      const log = join(dataDir, 'loftline-server.log');
      const tail = existsSync(log) ? readFileSync(log, 'utf8').split('\n').slice(-15).join('\n') : '';
      throw new Error(`PostgreSQL did not start in ${dataDir}: ${String(lastError)}\n${tail}`);
    }
  }

  const finalPort = port;
  const url = (database: string) => `postgres://${PG_USER}@${HOST}:${finalPort}/${database}`;
  let stopped = false;
  return {
    host: HOST,
    port: finalPort,
    user: PG_USER,
    dataDir,
    url,
    ensureDatabase: (name, template) => ensureDatabase(url('postgres'), name, template),
    dropDatabase: (name) => dropDatabase(url('postgres'), name),
    stopWhenGone(pid, removeDirs = []) {
      const args = ['-c', WATCHER, 'loftline-pg-watch', String(pid), dataDir, join(binDir, 'pg_ctl'), isRoot() ? '1' : '0', ...removeDirs];
      spawn('sh', args, { detached: true, stdio: 'ignore', cwd: '/' }).unref();
    },
    async stop() {
      if (stopped) return;
      stopped = true;
      await runPg(join(binDir, 'pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', 'stop']).catch(() => undefined);
      if (socketDir) rmSync(socketDir, { recursive: true, force: true });
    },
  };
}
