import type { Logger } from 'pino';
import type { MailQueue as AppMailQueue } from '../../app-deps';
import { FileMailbox } from './file-mailbox';
import type { MailMessage } from './mail-message';
import { DEFAULT_MAIL_RETRY, MailQueue, type EnqueueOptions, type MailRetryPolicy, type PgConnectionOptions } from './mail-queue';
import type { MailSettings } from './mail-settings';
import { createMailer, type Mailer } from './mail-transport';

/** What the rest of the server sees of mail (deps.mail): queue a message; the worker sends it later. */
export interface MailOutbox {
  /** Resolves once the message is safely queued (committed with `options.manager`'s transaction), not when it is sent. */
  enqueue(message: MailMessage, options?: EnqueueOptions): Promise<void>;
}

export interface MailService extends MailOutbox {
  readonly settings: MailSettings;
  /** The fake mailbox, or null when mail goes out by SMTP. */
  readonly mailbox: FileMailbox | null;
  readonly queue: MailQueue;
  startWorker(): Promise<void>;
  stop(): Promise<void>;
}

export async function openMailService(input: {
  connection: PgConnectionOptions;
  settings: MailSettings;
  logger: Logger;
  now?: () => Date;
  retry?: MailRetryPolicy;
  /** Replaces the transport the settings name (tests use it to count attempts). */
  mailer?: Mailer;
}): Promise<MailService> {
  const { settings, logger } = input;
  const now = input.now ?? (() => new Date());
  const mailbox = settings.transport === 'fake' ? new FileMailbox(settings.mailboxDir) : null;
  const queue = await MailQueue.open(input.connection, logger, input.retry ?? DEFAULT_MAIL_RETRY);
  let mailer: Mailer | null = null;
  return {
    settings,
    mailbox,
    queue,
    async enqueue(message, options) {
      await queue.enqueue(message, options);
    },
    async startWorker() {
      mailer ??= input.mailer ?? createMailer(settings, mailbox, now);
      await queue.startWorker(mailer);
    },
    async stop() {
      await queue.stop();
      mailer?.close();
    },
  };
}

/** Queues a message through the app's outbox (deps.mail); with `options.manager`, inside the caller's transaction. */
export function enqueueMail(deps: { mail: AppMailQueue }, message: MailMessage, options?: EnqueueOptions): Promise<void> {
  return deps.mail.enqueue(message, options);
}

/** Starts the sending worker when deps.mail is the queued service (a test double has nothing to start). */
export async function startMailWorker(deps: { mail: object }): Promise<void> {
  const mail = deps.mail as Partial<MailService>;
  if (typeof mail.startWorker === 'function') await mail.startWorker();
}
