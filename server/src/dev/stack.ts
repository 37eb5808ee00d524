// startStack(): the whole product in one process — the private PostgreSQL cluster (or DATABASE_URL), migrations,
// the demo scenario on first start, the mail queue and its worker, and the app serving the API and the web build.
// Used by `npm start` (start.ts) and by the end-to-end tests' global setup.
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import { join } from 'node:path';
import { createLogger, systemClock, type AppDeps } from '../app-deps';
import { createApp } from '../app';
import { loadConfig, type Config } from '../config';
import { createDataSource, openAndMigrate } from '../db/data-source';
import { openMailService, startMailWorker, type MailService } from '../modules/mail/mail-service';
import { mailboxDir, mailSettingsFromConfig } from '../modules/mail/mail-settings';
import { scheduleTombstonePurge } from '../modules/sync/tombstone-purge';
import { startCluster, type PgCluster } from './pg-cluster';
import { seedDemo, type SeedResult } from './seed-demo';

export const STACK_DATABASE = 'loftline';

export interface StackOptions {
  /** Folder for the cluster (`pg/`), the JWT secret, the fake mailbox and photos. Reused on the next start. */
  dataDir: string;
  /** 0 picks a free port. */
  port: number;
  host: string;
  /** The exported web app to serve at /; omitted: API only. */
  webDir?: string;
  /** Load the demo scenario when the database has no users yet (the first start). */
  seedDemo: boolean;
  mail: 'fake' | 'smtp';
  /** Environment to read the rest of the configuration from (default process.env). */
  env?: NodeJS.ProcessEnv;
}

export interface Stack {
  url: string;
  port: number;
  config: Config;
  deps: AppDeps;
  /** Folder of the fake mailbox, or null with SMTP. */
  mailboxDir: string | null;
  /** What the demo seeding did on this start (null when it did not run). */
  demo: SeedResult | null;
  /** Names of the migrations this start applied. */
  migrated: string[];
  stop(): Promise<void>;
}

export async function startStack(opts: StackOptions): Promise<Stack> {
  const env = opts.env ?? process.env;
  const config = loadConfig({ ...env, DATA_DIR: opts.dataDir, PORT: String(opts.port), HOST: opts.host, MAIL_TRANSPORT: opts.mail });
  const logger = createLogger(config.logLevel);
  const cleanups: (() => Promise<unknown>)[] = [];
  const stopAll = async () => {
    for (const c of cleanups.splice(0).reverse()) await c().catch((err: unknown) => logger.warn({ err }, 'while stopping'));
  };

  try {
    let url = config.databaseUrl;
    if (!url) {
      const cluster: PgCluster = await startCluster({ dataDir: join(config.dataDir, 'pg') });
      cleanups.push(() => cluster.stop());
      await cluster.ensureDatabase(STACK_DATABASE);
      url = cluster.url(STACK_DATABASE);
    }
    const dataSource = createDataSource({ url });
    const migrated = await openAndMigrate(dataSource);
    cleanups.push(() => dataSource.destroy());

    const mail: MailService = await openMailService({ connection: { url }, settings: mailSettingsFromConfig(config), logger });
    cleanups.push(() => mail.stop());
    const deps: AppDeps = { dataSource, config, logger, mail, clock: systemClock };

    let demo: SeedResult | null = null;
    if (opts.seedDemo) {
      const [{ n }] = await dataSource.query('SELECT count(*)::int AS n FROM users');
      if (n === 0) demo = await seedDemo(deps);
    }
    await startMailWorker(deps);
    const purge = scheduleTombstonePurge(dataSource, { keepDays: config.tombstoneKeepDays, clock: systemClock, logger });
    cleanups.push(() => purge.stop());

    const app = createApp(deps, { webDir: opts.webDir });
    const server: Server = await new Promise((ok, fail) => {
      const s = app.listen(config.port, config.host);
      s.once('listening', () => ok(s));
      s.once('error', (err: NodeJS.ErrnoException) =>
        fail(err.code === 'EADDRINUSE' ? new Error(`port ${config.port} on ${config.host} is taken: set PORT to another one`) : err),
      );
    });
    cleanups.push(
      () =>
        new Promise<void>((ok) => {
          server.close(() => ok());
          server.closeAllConnections();
        }),
    );
    const port = (server.address() as AddressInfo).port;
    const shownHost = config.host === '0.0.0.0' ? '127.0.0.1' : config.host;
    const appUrl = `http://${shownHost}:${port}`;
    if (!env.APP_URL) config.appUrl = appUrl;
    return {
      url: appUrl,
      port,
      config,
      deps,
      mailboxDir: mail.mailbox ? mailboxDir(config.dataDir) : null,
      demo,
      migrated,
      stop: stopAll,
    };
  } catch (err) {
    await stopAll();
    throw err;
  }
}

/** Resolves once SIGINT or SIGTERM arrived and `stop` finished (errors while stopping are reported, not thrown). */
export function stopOnSignal(stop: () => Promise<void>, say: (line: string) => void = console.log): Promise<void> {
  return new Promise<void>((done) => {
    let stopping = false;
    const onSignal = (signal: string) => {
      if (stopping) return;
      stopping = true;
      say(`loftline: ${signal}: stopping…`);
      stop().then(done, (err: unknown) => {
        say(`loftline: error while stopping: ${err instanceof Error ? err.message : String(err)}`);
        done();
      });
    };
    process.once('SIGINT', () => onSignal('SIGINT'));
    process.once('SIGTERM', () => onSignal('SIGTERM'));
  });
}
