// The mail queue against real PostgreSQL (pg-boss) and a real SMTP peer on 127.0.0.1 (the smtp-server package):
// an outage of the mail server delays mail and loses none, retries back off, undeliverable mail is kept in a
// dead-letter queue, and a job enqueued in a transaction commits or rolls back with it (issue 2, "E-mail").
import { randomBytes } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { pino } from 'pino';
import { SMTPServer } from 'smtp-server';
import { afterAll, describe, expect, inject, it } from 'vitest';
import { createDataSource } from '../../server/src/db/data-source';
import { dropDatabase, ensureDatabase } from '../../server/src/dev/pg-cluster';
import { MAIL_DEAD_LETTER_QUEUE, MAIL_QUEUE, MailQueue, type MailRetryPolicy } from '../../server/src/modules/mail/mail-queue';
import { openMailService, type MailService } from '../../server/src/modules/mail/mail-service';
import type { MailSettings } from '../../server/src/modules/mail/mail-settings';

const logger = pino({ level: 'silent' });
const FAST_RETRY: MailRetryPolicy = { retryLimit: 8, retryDelaySeconds: 1, retryBackoff: true, pollingIntervalSeconds: 0.5 };
const databases: string[] = [];
const pg = inject('pg');

async function freshDatabase(): Promise<string> {
  const name = `mailq_${process.pid}_${randomBytes(4).toString('hex')}`;
  await ensureDatabase(`${pg.baseUrl}postgres`, name, pg.templateDb);
  databases.push(name);
  return `${pg.baseUrl}${name}`;
}

afterAll(async () => {
  for (const name of databases) await dropDatabase(`${pg.baseUrl}postgres`, name);
});

type Received = { raw: string; at: number };

/** A local SMTP server that answers 451 ("try again later") to the first `refuse` messages, then accepts. */
function smtpPeer(refuse: number) {
  const received: Received[] = [];
  let refusals = refuse;
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, _session, callback) {
      let raw = '';
      stream.setEncoding('utf8');
      stream.on('data', (chunk: string) => (raw += chunk));
      stream.on('end', () => {
        if (refusals > 0) {
          refusals--;
          const err = Object.assign(new Error('mailbox busy, try again later'), { responseCode: 451 });
          return callback(err);
        }
        received.push({ raw, at: Date.now() });
        callback();
      });
    },
  });
  return {
    received,
    listen: (port = 0) => new Promise<number>((ok) => server.listen(port, '127.0.0.1', () => ok((server.server.address() as AddressInfo).port))),
    close: () => new Promise<void>((ok) => server.close(() => ok())),
  };
}

const smtpSettings = (port: number): MailSettings => ({ transport: 'smtp', from: 'Loftline <noreply@loftline.test>', smtp: { host: '127.0.0.1', port, secure: false, auth: null } });

async function waitFor<T>(what: string, probe: () => Promise<T | undefined | false>, timeoutMs = 45_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const v = await probe();
    if (v) return v;
    if (Date.now() > until) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

type JobRow = { id: string; name: string; state: string; retry_count: number; data: { to: string; subject: string; text: string } };
/** Reads pg-boss's job table directly: what is queued, retried, done or dead. */
const jobs = (url: string) => {
  const ds = createDataSource({ url, poolSize: 1 });
  return {
    async rows(name = MAIL_QUEUE): Promise<JobRow[]> {
      if (!ds.isInitialized) await ds.initialize();
      return ds.query('SELECT id, name, state, retry_count, data FROM pgboss.job WHERE name = $1 ORDER BY created_on', [name]);
    },
    async query<T>(sql: string, params: unknown[]): Promise<T[]> {
      if (!ds.isInitialized) await ds.initialize();
      return ds.query(sql, params);
    },
    close: () => (ds.isInitialized ? ds.destroy() : Promise.resolve()),
  };
};

describe('mail queue (pg-boss)', () => {
  let mail: MailService | undefined;
  afterAll(async () => {
    await mail?.stop();
  });

  it('a mail-server outage (connection refused, then 451 refusals) delays three messages and loses none: each arrives once, links intact', async () => {
    const url = await freshDatabase();
    // Find a free port, then leave it closed: the mail server is "down".
    const probe = smtpPeer(0);
    const port = await probe.listen();
    await probe.close();

    mail = await openMailService({ connection: { url }, settings: smtpSettings(port), logger, retry: FAST_RETRY });
    const table = jobs(url);
    const links = ['abc', 'def', 'ghi'].map((k) => `http://127.0.0.1:8080/invite/${k}_${randomBytes(8).toString('base64url')}`);
    for (const [i, link] of links.entries()) {
      await mail.enqueue({ to: `member${i}@kestrel.test`, subject: `Invitation ${i}`, text: `Accept here:\n${link}\n`, html: `<a href="${link}">accept</a>` });
    }
    await mail.startWorker();

    // While the server is down every job fails and is scheduled for a retry; none is dropped.
    await waitFor('a failed attempt on every job', async () => {
      const rows = await table.rows();
      return rows.length === 3 && rows.every((r) => r.retry_count >= 1 && r.state !== 'completed');
    });

    // The server comes back on the same port but refuses the first two messages with 451.
    const peer = smtpPeer(2);
    await peer.listen(port);
    try {
      await waitFor('all three messages delivered', async () => peer.received.length >= 3 && peer.received);
      const rows = await waitFor('all jobs completed', async () => {
        const r = await table.rows();
        return r.every((j) => j.state === 'completed') && r;
      });
      expect(rows).toHaveLength(3);
      expect(Math.max(...rows.map((r) => r.retry_count))).toBeGreaterThanOrEqual(2);
      // Exactly once each, with the link byte for byte.
      await new Promise((r) => setTimeout(r, 1500));
      expect(peer.received).toHaveLength(3);
      for (const [i, link] of links.entries()) {
        const copies = peer.received.filter((m) => m.raw.includes(`Subject: Invitation ${i}`));
        expect(copies).toHaveLength(1);
        expect(copies[0]!.raw).toContain(link);
        expect(copies[0]!.raw).toContain(`To: member${i}@kestrel.test`);
      }
    } finally {
      await mail.stop();
      mail = undefined;
      await peer.close();
      await table.close();
    }
  });

  it('after the last retry a message moves to the dead-letter queue with its content, not into the void', async () => {
    const url = await freshDatabase();
    const peer = smtpPeer(1000);
    const port = await peer.listen();
    const svc = await openMailService({ connection: { url }, settings: smtpSettings(port), logger, retry: { ...FAST_RETRY, retryLimit: 1 } });
    const table = jobs(url);
    try {
      await svc.enqueue({ to: 'lost@kestrel.test', subject: 'Never delivered', text: 'Reset: http://127.0.0.1/reset-password?token=xyz', html: '' });
      await svc.startWorker();
      const dead = await waitFor('a dead letter', async () => {
        const r = await table.rows(MAIL_DEAD_LETTER_QUEUE);
        return r.length > 0 && r;
      });
      expect(dead[0]!.data).toMatchObject({ to: 'lost@kestrel.test', subject: 'Never delivered' });
      const kept: { days: number }[] = await table.query(
        "SELECT extract(epoch FROM keep_until - now()) / 86400 AS days FROM pgboss.job WHERE name = $1",
        [MAIL_DEAD_LETTER_QUEUE],
      );
      // pg-boss keeps a dead letter for twice the job's 14-day default retention (plans.js failJobs: keep_until + (keep_until - start_after)).
      expect(Number(kept[0]!.days)).toBeGreaterThan(27);
      const [original] = await table.rows();
      expect(original).toMatchObject({ state: 'failed', retry_count: 1 });
      expect(peer.received).toHaveLength(0);
    } finally {
      await svc.stop();
      await peer.close();
      await table.close();
    }
  });

  it('a job enqueued inside a transaction exists only if the transaction commits', async () => {
    const url = await freshDatabase();
    const ds = createDataSource({ url, poolSize: 2 });
    await ds.initialize();
    const queue = await MailQueue.open({ url }, logger, FAST_RETRY);
    const table = jobs(url);
    try {
      const msg = (subject: string) => ({ to: 'tx@kestrel.test', subject, text: 'hello', html: '' });
      await expect(
        ds.transaction(async (manager) => {
          await queue.enqueue(msg('rolled back'), { manager });
          throw new Error('the caller fails after queueing');
        }),
      ).rejects.toThrow('the caller fails');
      await ds.transaction(async (manager) => {
        await queue.enqueue(msg('committed'), { manager });
      });
      const rows = await table.rows();
      expect(rows.map((r) => r.data.subject)).toEqual(['committed']);
    } finally {
      await queue.stop();
      await table.close();
      await ds.destroy();
    }
  });

  it('refuses to queue a message that is not a mail (bad recipient) before it reaches the database', async () => {
    const url = await freshDatabase();
    const queue = await MailQueue.open({ url }, logger, FAST_RETRY);
    try {
      await expect(queue.enqueue({ to: 'not-an-address', subject: 's', text: 't', html: '' })).rejects.toThrow(/e-mail address/);
      expect(await queue.counts()).toEqual({ queued: 0, deadLetters: 0 });
    } finally {
      await queue.stop();
    }
  });
});
