import PgBoss from 'pg-boss';
import type { EntityManager } from 'typeorm';
import type { Logger } from 'pino';
import { mailMessageSchema, type MailMessage } from './mail-message';
import type { Mailer } from './mail-transport';

/*
 * Outgoing mail is queued in PostgreSQL through pg-boss (its own schema, `pgboss`, created on first start).
 * A request that sends mail only inserts a job; a worker sends it. A failed send (mail server down,
 * refused, timed out) fails the job and pg-boss schedules a retry with exponential backoff, so an
 * outage delays mail and loses none. After the last retry the job moves to the dead-letter queue,
 * where it stays in the database for an operator to look at.
 */

export const MAIL_QUEUE = 'mail-send';
export const MAIL_DEAD_LETTER_QUEUE = 'mail-undeliverable';

export type MailRetryPolicy = {
  retryLimit: number;
  /** First retry after about this many seconds; with backoff each later wait roughly doubles. */
  retryDelaySeconds: number;
  retryBackoff: boolean;
  /** How often an idle worker looks for new jobs (pg-boss's minimum is 0.5 s). */
  pollingIntervalSeconds: number;
};

/** 12 retries from 10 s with doubling waits span about a day: long enough to ride out a mail-server outage. */
export const DEFAULT_MAIL_RETRY: MailRetryPolicy = { retryLimit: 12, retryDelaySeconds: 10, retryBackoff: true, pollingIntervalSeconds: 1 };

export type PgConnectionOptions = {
  url?: string;
  host?: string;
  port?: number;
  username?: string;
  password?: string | (() => string) | (() => Promise<string>);
  database?: string;
};

/** Lets pg-boss insert its job through a TypeORM transaction, so the job commits or rolls back with the caller's rows. */
function transactionDb(manager: EntityManager): PgBoss.Db {
  const runner = manager.queryRunner;
  if (!runner) throw new Error('enqueue inside a transaction needs a transactional EntityManager');
  return { executeSql: async (text, values) => ({ rows: (await runner.query(text, values, true)).records }) };
}

export type EnqueueOptions = { manager?: EntityManager };

export class MailQueue {
  private workerId: string | null = null;

  private constructor(
    private readonly boss: PgBoss,
    private readonly retry: MailRetryPolicy,
    private readonly logger: Logger,
  ) {}

  static async open(connection: PgConnectionOptions, logger: Logger, retry: MailRetryPolicy = DEFAULT_MAIL_RETRY): Promise<MailQueue> {
    const boss = new PgBoss({
      ...(connection.url
        ? { connectionString: connection.url }
        : { host: connection.host, port: connection.port, user: connection.username, password: connection.password, database: connection.database }),
      application_name: 'loftline-mail',
      max: 3,
      schedule: false, // no cron jobs: keeps pg-boss from running its clock monitor
    });
    // pg-boss reports background failures (lost connection, maintenance) as 'error' events; unhandled they would crash the process.
    boss.on('error', (err) => logger.error({ err }, 'mail queue error'));
    await boss.start();
    const queueOptions = { retryLimit: retry.retryLimit, retryDelay: retry.retryDelaySeconds, retryBackoff: retry.retryBackoff };
    // Nobody works the dead-letter queue: its jobs wait there, whole, for an operator. pg-boss keeps a dead letter for
    // twice the original job's retention (14 days by default), so about four weeks.
    if (!(await boss.getQueue(MAIL_DEAD_LETTER_QUEUE))) await boss.createQueue(MAIL_DEAD_LETTER_QUEUE);
    if (!(await boss.getQueue(MAIL_QUEUE))) await boss.createQueue(MAIL_QUEUE, { name: MAIL_QUEUE, ...queueOptions, deadLetter: MAIL_DEAD_LETTER_QUEUE });
    return new MailQueue(boss, retry, logger);
  }

  /** Queues one message and returns the job id. Pass `manager` to enqueue inside the caller's transaction. */
  async enqueue(message: MailMessage, options: EnqueueOptions = {}): Promise<string> {
    const data = mailMessageSchema.parse(message);
    const id = await this.boss.send(MAIL_QUEUE, data, {
      retryLimit: this.retry.retryLimit,
      retryDelay: this.retry.retryDelaySeconds,
      retryBackoff: this.retry.retryBackoff,
      expireInSeconds: 120,
      ...(options.manager ? { db: transactionDb(options.manager) } : {}),
    });
    if (!id) throw new Error('the mail queue did not accept the message');
    this.logger.info({ jobId: id, to: data.to, subject: data.subject }, 'mail queued');
    return id;
  }

  /** Starts sending queued mail through `mailer`. One worker per process; a second call is ignored. */
  async startWorker(mailer: Mailer): Promise<void> {
    if (this.workerId) return;
    this.workerId = await this.boss.work<MailMessage>(
      MAIL_QUEUE,
      { includeMetadata: true, batchSize: 1, pollingIntervalSeconds: this.retry.pollingIntervalSeconds },
      async (jobs) => {
        for (const job of jobs) {
          const message = mailMessageSchema.parse(job.data);
          try {
            await mailer.send(message);
            this.logger.info({ jobId: job.id, to: message.to, attempt: job.retryCount + 1 }, 'mail sent');
          } catch (err) {
            // Never log the body: invitation and reset mails carry secret links.
            const last = job.retryCount >= job.retryLimit;
            this.logger.warn({ jobId: job.id, to: message.to, attempt: job.retryCount + 1, err: (err as Error).message }, last ? 'mail undeliverable; moved to the dead-letter queue' : 'mail send failed; will retry');
            throw err;
          }
        }
      },
    );
  }

  /** Counts by state, for tests and the health of the queue. */
  async counts(): Promise<{ queued: number; deadLetters: number }> {
    const [main, dead] = await Promise.all([this.boss.getQueueSize(MAIL_QUEUE), this.boss.getQueueSize(MAIL_DEAD_LETTER_QUEUE)]);
    return { queued: main, deadLetters: dead };
  }

  async stop(): Promise<void> {
    if (this.workerId) await this.boss.offWork({ id: this.workerId });
    this.workerId = null;
    await this.boss.stop({ graceful: true, wait: true, timeout: 5_000 });
  }
}
