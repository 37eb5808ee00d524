// Server configuration from the environment, validated with zod (a bad value stops the start with a clear message).
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { z } from 'zod';

const LOG_LEVELS = ['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'] as const;
const port = (what: string) => z.coerce.number({ message: `${what} must be a number` }).int().min(0).max(65535, `${what} must be at most 65535`);
const blankToUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);

export const envSchema = z
  .object({
    PORT: port('PORT').default(8080),
    HOST: z.string().min(1).default('127.0.0.1'),
    DATA_DIR: z.string().min(1).default('.loftline'),
    DATABASE_URL: z.preprocess(blankToUndefined, z.url({ message: 'DATABASE_URL must be a postgres:// URL' }).optional()),
    APP_URL: z.preprocess(blankToUndefined, z.url({ message: 'APP_URL must be a URL such as http://127.0.0.1:8080' }).optional()),
    JWT_SECRET: z.preprocess(blankToUndefined, z.string().min(32, 'JWT_SECRET must be at least 32 characters').optional()),
    // Unset: SMTP when SMTP_HOST is given, else the fake mailbox.
    MAIL_TRANSPORT: z.preprocess(blankToUndefined, z.enum(['fake', 'smtp'], { message: 'MAIL_TRANSPORT must be fake or smtp' }).optional()),
    SMTP_HOST: z.preprocess(blankToUndefined, z.string().optional()),
    SMTP_PORT: z.preprocess(blankToUndefined, port('SMTP_PORT').default(587)),
    SMTP_USER: z.preprocess(blankToUndefined, z.string().optional()),
    SMTP_PASS: z.preprocess(blankToUndefined, z.string().optional()),
    SMTP_FROM: z.preprocess(blankToUndefined, z.string().default('Loftline <loftline@localhost>')),
    /** TLS from the first byte (port 465); unset: true on port 465, else STARTTLS when the server offers it. */
    SMTP_SECURE: z.preprocess(blankToUndefined, z.enum(['true', 'false'], { message: 'SMTP_SECURE must be true or false' }).optional()),
    LOG_LEVEL: z.enum(LOG_LEVELS, { message: `LOG_LEVEL must be one of ${LOG_LEVELS.join(', ')}` }).default('info'),
    AUTH_RATE_LIMIT: z.coerce.number().int().min(1).default(10),
    AUTH_RATE_LIMIT_PER_IP: z.coerce.number().int().min(1).default(50),
    /** Days a deleted record's tombstone is kept so every phone hears of the delete (see modules/sync/tombstones.ts). */
    TOMBSTONE_KEEP_DAYS: z.coerce
      .number({ message: 'TOMBSTONE_KEEP_DAYS must be a number of days' })
      .int('TOMBSTONE_KEEP_DAYS must be a whole number of days')
      .min(7, 'TOMBSTONE_KEEP_DAYS must be at least 7: a phone away for a week must still hear of deletes')
      .max(3650)
      .default(90),
  })
  .refine((e) => e.MAIL_TRANSPORT !== 'smtp' || !!e.SMTP_HOST, { message: 'MAIL_TRANSPORT=smtp needs SMTP_HOST', path: ['SMTP_HOST'] });

export interface Config {
  port: number;
  host: string;
  /** Absolute path of the folder for the database cluster, the JWT secret and the fake mailbox. */
  dataDir: string;
  /** An external database; when absent the start script runs a private cluster in `${dataDir}/pg`. */
  databaseUrl?: string;
  /** Public address of the app, used in e-mailed links. */
  appUrl: string;
  jwtSecret: string;
  accessTokenTtlS: number;
  refreshTokenTtlS: number;
  passwordResetTtlS: number;
  invitationTtlS: number;
  mail: {
    transport: 'fake' | 'smtp';
    from: string;
    smtp?: { host: string; port: number; user?: string; pass?: string; secure?: boolean };
  };
  logLevel: (typeof LOG_LEVELS)[number];
  /**
   * Failed sign-ins and reset requests allowed per window: `max` per e-mail address, `ipMax` per client address
   * (higher, as a whole club may share one address at the field).
   */
  authRateLimit: { max: number; ipMax: number; windowMs: number };
  /** Largest JSON body accepted (body-parser syntax). */
  jsonLimit: string;
  /** Tombstones older than this are purged (every few hours while the server runs); older devices resync. */
  tombstoneKeepDays: number;
}

/** Reads the JWT secret kept in the data folder, creating it (random, mode 0600) on first use. */
export function persistentSecret(dataDir: string): string {
  const file = join(dataDir, 'jwt-secret');
  if (existsSync(file)) {
    const kept = readFileSync(file, 'utf8').trim();
    if (kept.length >= 32) return kept;
  }
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}

export class ConfigError extends Error {}

/** Validates the environment; `secret` is only consulted when JWT_SECRET is not set. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env, secret: (dataDir: string) => string = persistentSecret): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.') || 'environment'}: ${i.message}`);
    throw new ConfigError(`invalid configuration:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  const dataDir = resolve(e.DATA_DIR);
  const shownHost = e.HOST === '0.0.0.0' ? '127.0.0.1' : e.HOST;
  return {
    port: e.PORT,
    host: e.HOST,
    dataDir,
    databaseUrl: e.DATABASE_URL,
    appUrl: (e.APP_URL ?? `http://${shownHost}:${e.PORT}`).replace(/\/+$/, ''),
    jwtSecret: e.JWT_SECRET ?? secret(dataDir),
    accessTokenTtlS: 15 * 60,
    refreshTokenTtlS: 30 * 24 * 3600,
    passwordResetTtlS: 3600,
    invitationTtlS: 7 * 24 * 3600,
    mail: {
      transport: e.MAIL_TRANSPORT ?? (e.SMTP_HOST ? 'smtp' : 'fake'),
      from: e.SMTP_FROM,
      smtp: e.SMTP_HOST
        ? { host: e.SMTP_HOST, port: e.SMTP_PORT, user: e.SMTP_USER, pass: e.SMTP_PASS, secure: e.SMTP_SECURE === undefined ? undefined : e.SMTP_SECURE === 'true' }
        : undefined,
    },
    logLevel: e.LOG_LEVEL,
    authRateLimit: { max: e.AUTH_RATE_LIMIT, ipMax: e.AUTH_RATE_LIMIT_PER_IP, windowMs: 15 * 60 * 1000 },
    jsonLimit: '2mb',
    tombstoneKeepDays: e.TOMBSTONE_KEEP_DAYS,
  };
}

/** loadConfig for the entry points: a bad setting is printed as one line and gives null (they exit with 2). */
export function loadConfigOrReport(): Config | null {
  try {
    return loadConfig();
  } catch (err) {
    if (!(err instanceof ConfigError)) throw err;
    console.error(`loftline: ${err.message}`);
    return null;
  }
}
