// What every router, service and job receives: built once by the start script or the test harness.
import { pino, type Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { Config } from './config';
import type { EnqueueOptions } from './modules/mail/mail-queue';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/**
 * Queues an e-mail for the mail worker; resolves once the message is safely queued (not when it is sent).
 * The real one is the pg-boss outbox (modules/mail/mail-service.ts); with `options.manager` it inserts the job in
 * that transaction, so a row and its e-mail commit together. A test double may ignore the options.
 */
export interface MailQueue {
  enqueue(message: MailMessage, options?: EnqueueOptions): Promise<void>;
}

export interface Clock {
  now(): Date;
}

export const systemClock: Clock = { now: () => new Date() };

export interface AppDeps {
  dataSource: DataSource;
  config: Config;
  logger: Logger;
  mail: MailQueue;
  clock: Clock;
}

/** The server's logger (JSON lines on stdout); request lines come from pino-http in app.ts. */
export function createLogger(level: Config['logLevel']): Logger {
  return pino({ level, redact: ['req.headers.authorization', 'req.headers.cookie', '*.password', '*.refreshToken'] });
}
