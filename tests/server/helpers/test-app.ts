// startTestApp(): the real app on a fresh database (a clone of the migrated template that global-setup made),
// listening on 127.0.0.1 port 0. Each call is isolated: its own database, rate-limit counters, mailbox.
import { randomBytes } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import type { Server } from 'node:http';
import type { Express } from 'express';
import { inject } from 'vitest';
import type { Role, Tokens } from '../../../shared/schemas';
import type { AppDeps, Clock, MailMessage, MailQueue } from '../../../server/src/app-deps';
import { createLogger, systemClock } from '../../../server/src/app-deps';
import { createApp } from '../../../server/src/app';
import { loadConfig, type Config } from '../../../server/src/config';
import { createDataSource } from '../../../server/src/db/data-source';
import { ClubEntity, MembershipEntity } from '../../../server/src/db/entities';
import { dropDatabase, ensureDatabase } from '../../../server/src/dev/pg-cluster';

/** Keeps every message a test app "sends", newest last. */
export class TestMailbox implements MailQueue {
  readonly messages: MailMessage[] = [];
  async enqueue(message: MailMessage): Promise<void> {
    this.messages.push(message);
  }
  /** The newest message to `to`, or undefined. */
  lastTo(to: string): MailMessage | undefined {
    return [...this.messages].reverse().find((m) => m.to === to);
  }
  /** The first link in the newest message to `to` that starts with `prefix`. */
  linkTo(to: string, prefix: string): string | undefined {
    const m = this.lastTo(to);
    return m?.text.split(/\s+/).find((w) => w.startsWith(prefix));
  }
}

export interface TestUser {
  id: string;
  email: string;
  password: string;
  tokens: Tokens;
  /** { Authorization: 'Bearer …' } */
  auth: { Authorization: string };
  /** The club the helper put the user in (when a role was asked for). */
  clubId?: string;
}

export interface TestApp {
  baseUrl: string;
  app: Express;
  deps: AppDeps;
  mailbox: TestMailbox;
  /** Name of this app's private database. */
  database: string;
  /**
   * Signs a new user up through the API. With a role, also puts them in a club with that role: the given club,
   * or a new club (named after the user) when none is given.
   */
  signUpUser(opts?: { role?: Role; clubId?: string; email?: string; password?: string; displayName?: string }): Promise<TestUser>;
  /** fetch against the app with JSON in and out; `auth` adds the bearer header. */
  api(method: string, path: string, opts?: { body?: unknown; auth?: TestUser | string; headers?: Record<string, string> }): Promise<{ status: number; body: any; headers: Headers }>;
  close(): Promise<void>;
}

export interface TestAppOptions {
  /** Overrides of the configuration (e.g. a low authRateLimit). */
  config?: Partial<Config>;
  clock?: Clock;
  mail?: MailQueue;
  webDir?: string;
}

let counter = 0;

export async function startTestApp(opts: TestAppOptions = {}): Promise<TestApp> {
  const pg = inject('pg');
  const database = `t_${process.pid}_${++counter}_${randomBytes(3).toString('hex')}`;
  await ensureDatabase(`${pg.baseUrl}postgres`, database, pg.templateDb);
  const dataSource = createDataSource({ url: `${pg.baseUrl}${database}`, poolSize: 5 });
  await dataSource.initialize();

  const base = loadConfig({ LOG_LEVEL: 'silent', DATA_DIR: '/tmp/loftline-test-unused' }, () => randomBytes(32).toString('hex'));
  const config: Config = { ...base, authRateLimit: { max: 1000, ipMax: 1000, windowMs: 15 * 60_000 }, ...opts.config };
  const mailbox = opts.mail instanceof TestMailbox ? opts.mail : new TestMailbox();
  const deps: AppDeps = {
    dataSource,
    config,
    logger: createLogger(config.logLevel),
    mail: opts.mail ?? mailbox,
    clock: opts.clock ?? systemClock,
  };
  const app = createApp(deps, { webDir: opts.webDir });
  const server: Server = await new Promise((ok) => {
    const s = app.listen(0, '127.0.0.1', () => ok(s));
  });
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  config.appUrl = baseUrl;

  const api: TestApp['api'] = async (method, path, o = {}) => {
    const headers: Record<string, string> = { ...o.headers };
    if (o.body !== undefined) headers['content-type'] ??= 'application/json';
    if (o.auth) headers.authorization = typeof o.auth === 'string' ? `Bearer ${o.auth}` : o.auth.auth.Authorization;
    const res = await fetch(`${baseUrl}${path}`, {
      method,
      headers,
      body: o.body === undefined ? undefined : typeof o.body === 'string' ? o.body : JSON.stringify(o.body),
    });
    const text = await res.text();
    let body: unknown = text;
    try {
      body = text ? JSON.parse(text) : undefined;
    } catch {
      /* not JSON: keep the text */
    }
    return { status: res.status, body, headers: res.headers };
  };

  let users = 0;
  const signUpUser: TestApp['signUpUser'] = async (o = {}) => {
    const n = ++users;
    const email = o.email ?? `user${n}-${randomBytes(3).toString('hex')}@example.test`;
    const password = o.password ?? 'correct horse battery';
    const res = await api('POST', '/api/auth/sign-up', { body: { email, password, displayName: o.displayName ?? `Test User ${n}` } });
    if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${JSON.stringify(res.body)}`);
    const tokens = res.body as Tokens;
    const user: TestUser = { id: tokens.user.id, email, password, tokens, auth: { Authorization: `Bearer ${tokens.accessToken}` } };
    if (o.role) {
      let clubId = o.clubId;
      if (!clubId) {
        const club = await dataSource.getRepository(ClubEntity).save({ name: `Club of ${email}`, callSign: '', createdBy: user.id });
        clubId = club.id;
      }
      await dataSource.getRepository(MembershipEntity).insert({ clubId, userId: user.id, role: o.role });
      user.clubId = clubId;
    }
    return user;
  };

  let closed = false;
  return {
    baseUrl,
    app,
    deps,
    mailbox,
    database,
    signUpUser,
    api,
    async close() {
      if (closed) return;
      closed = true;
      server.closeAllConnections();
      await new Promise<void>((ok) => server.close(() => ok()));
      if (dataSource.isInitialized) await dataSource.destroy();
      await dropDatabase(`${pg.baseUrl}postgres`, database);
    },
  };
}
