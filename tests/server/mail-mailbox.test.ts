// The fake mail transport and the dev mailbox: every message is kept as a JSON file in ${DATA_DIR}/mailbox/ with its
// links intact, readable at /api/dev/mailbox (JSON for programs, a page for browsers), and gone (404) once SMTP is
// configured. The templates carry the links the app expects (invite/<token>, reset-password?token=<token>).
import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { FileMailbox } from '../../server/src/modules/mail/file-mailbox';
import { storedMailSchema } from '../../server/src/modules/mail/mail-message';
import { loadConfig } from '../../server/src/config';
import { mailboxDir, mailSettingsFromConfig } from '../../server/src/modules/mail/mail-settings';
import { invitationMail, passwordResetMail } from '../../server/src/modules/mail/mail-templates';
import { createMailer } from '../../server/src/modules/mail/mail-transport';
import { startTestApp } from './helpers/test-app';

const dirs: string[] = [];
const tempDir = () => {
  const d = mkdtempSync(join(tmpdir(), 'loftline-mailbox-'));
  dirs.push(d);
  return d;
};
afterAll(() => {
  for (const d of dirs) rmSync(d, { recursive: true, force: true });
});

const TOKEN = 'Zq3_-x9Yk2mP0aB7cD4eF6gH8iJ1kL5nO0pQ2rS4tU6'; // base64url, the shape of a real token
const expiresAt = new Date('2026-12-08T21:30:00Z');

describe('mail templates', () => {
  it('the invitation names the club, the role, the expiry and carries ${APP_URL}/invite/<token> in text and HTML', () => {
    const m = invitationMail({ to: 'sam@kestrel.test', appUrl: 'http://127.0.0.1:8080/', token: TOKEN, clubName: 'Kestrel Ridge Amateur Radio Club', role: 'safety', invitedBy: 'Ada Admin (K0ADA)', expiresAt });
    expect(m.subject).toBe("You're invited to Kestrel Ridge Amateur Radio Club on Loftline");
    expect(m.text).toContain('Ada Admin (K0ADA) has invited you to join Kestrel Ridge Amateur Radio Club on Loftline as a safety officer.');
    expect(m.text).toContain(`http://127.0.0.1:8080/invite/${TOKEN}\n`);
    expect(m.text).toContain('Tuesday 8 December 2026, 21:30 UTC');
    expect(m.html).toContain(`href="http://127.0.0.1:8080/invite/${TOKEN}"`);
  });

  it('the club name is escaped in the HTML part (a club called <script> stays text)', () => {
    const m = invitationMail({ to: 'a@kestrel.test', appUrl: 'http://x.test', token: TOKEN, clubName: '<script>alert(1)</script>', role: 'admin', invitedBy: 'A', expiresAt });
    expect(m.html).not.toContain('<script>');
    expect(m.html).toContain('&lt;script&gt;');
    expect(m.text).toContain('as a club admin');
  });

  it('the password reset carries ${APP_URL}/reset-password?token=<token> and says it lasts 1 hour', () => {
    const m = passwordResetMail({ to: 'a@kestrel.test', appUrl: 'https://loftline.example.test', token: TOKEN });
    expect(m.text).toContain(`https://loftline.example.test/reset-password?token=${TOKEN}`);
    expect(m.text).toContain('expires in 1 hour');
    expect(m.html).toContain(`href="https://loftline.example.test/reset-password?token=${TOKEN}"`);
  });
});

describe('fake transport and file mailbox', () => {
  it('keeps each message as one JSON file (id, to, from, subject, text, html, sentAt) with links byte for byte', async () => {
    const dir = join(tempDir(), 'mailbox');
    const mailbox = new FileMailbox(dir);
    const sentAt = new Date('2026-12-01T22:00:00.000Z');
    const mailer = createMailer({ transport: 'fake', from: 'Loftline <no-reply@loftline.test>', mailboxDir: dir }, mailbox, () => sentAt);
    const m = invitationMail({ to: 'sam@kestrel.test', appUrl: 'http://127.0.0.1:8080', token: TOKEN, clubName: 'Kestrel Ridge', role: 'scout', invitedBy: 'Ada', expiresAt });
    await mailer.send(m);
    const files = readdirSync(dir);
    expect(files).toHaveLength(1);
    const stored = storedMailSchema.parse(JSON.parse(readFileSync(join(dir, files[0]!), 'utf8')));
    expect(stored).toMatchObject({ to: 'sam@kestrel.test', from: 'Loftline <no-reply@loftline.test>', subject: m.subject, text: m.text, html: m.html, sentAt: sentAt.toISOString() });
    expect(files[0]).toBe(`${stored.id}.json`);
    expect(await mailbox.get(stored.id)).toEqual(stored);
  });

  it('lists newest first, filters by recipient (any case), and answers null for an unknown or malformed id', async () => {
    const mailbox = new FileMailbox(join(tempDir(), 'mailbox'));
    expect(await mailbox.list()).toEqual([]);
    const base = { from: 'x@loftline.test', text: 't', html: null };
    await mailbox.save({ ...base, to: 'a@kestrel.test', subject: 'first' }, new Date('2026-12-01T10:00:00Z'));
    await mailbox.save({ ...base, to: 'b@kestrel.test', subject: 'second' }, new Date('2026-12-01T11:00:00Z'));
    await mailbox.save({ ...base, to: 'a@kestrel.test', subject: 'third' }, new Date('2026-12-01T12:00:00Z'));
    expect((await mailbox.list()).map((m) => m.subject)).toEqual(['third', 'second', 'first']);
    expect((await mailbox.list({ to: 'A@Kestrel.test' })).map((m) => m.subject)).toEqual(['third', 'first']);
    expect(await mailbox.get('00000000-0000-4000-8000-000000000000')).toBeNull();
    expect(await mailbox.get('../../etc/passwd')).toBeNull();
  });
});

describe('dev mailbox routes', () => {
  it('GET /api/dev/mailbox answers JSON (newest first), a page for a browser, and each message by id', async () => {
    const dataDir = tempDir();
    const t = await startTestApp({ config: { dataDir } });
    try {
      const mailbox = new FileMailbox(mailboxDir(dataDir));
      const saved = await mailbox.save({ to: 'sam@kestrel.test', from: 'x@loftline.test', subject: 'Hello <Sam>', text: `Open ${t.baseUrl}/invite/${TOKEN}`, html: null }, new Date());
      const list = await t.api('GET', '/api/dev/mailbox');
      expect(list.status).toBe(200);
      expect(list.body).toEqual([saved]);
      const one = await t.api('GET', `/api/dev/mailbox/${saved.id}`);
      expect(one.body).toEqual(saved);
      const page = await t.api('GET', '/api/dev/mailbox', { headers: { accept: 'text/html' } });
      expect(page.headers.get('content-type')).toMatch(/text\/html/);
      expect(page.body).toContain('Hello &lt;Sam&gt;');
      expect(page.body).toContain(mailboxDir(dataDir));
      const msgPage = await t.api('GET', `/api/dev/mailbox/${saved.id}`, { headers: { accept: 'text/html' } });
      expect(msgPage.body).toContain(`<a href="${t.baseUrl}/invite/${TOKEN}">`);
      const missing = await t.api('GET', '/api/dev/mailbox/00000000-0000-4000-8000-000000000000');
      expect(missing.status).toBe(404);
      expect(missing.body.code).toBe('not_found');
      const badQuery = await t.api('GET', '/api/dev/mailbox?limit=5');
      expect(badQuery.status).toBe(400);
    } finally {
      await t.close();
    }
  });

  it('with SMTP configured the dev mailbox does not exist (404), so no mail can be read over HTTP', async () => {
    const t = await startTestApp({
      config: { dataDir: tempDir(), mail: { transport: 'smtp', from: 'Loftline <n@loftline.test>', smtp: { host: '127.0.0.1', port: 2525 } } },
    });
    try {
      expect((await t.api('GET', '/api/dev/mailbox')).status).toBe(404);
      expect((await t.api('GET', '/api/dev/mailbox/00000000-0000-4000-8000-000000000000')).status).toBe(404);
    } finally {
      await t.close();
    }
  });
});

describe('mail settings from the environment', () => {
  const settings = (env: Record<string, string>) => mailSettingsFromConfig(loadConfig({ DATA_DIR: '/tmp/loftline-mail-env', ...env }, () => 'x'.repeat(40)));

  it('no SMTP_HOST: the fake mailbox in ${DATA_DIR}/mailbox', () => {
    expect(settings({})).toEqual({ transport: 'fake', from: expect.any(String), mailboxDir: '/tmp/loftline-mail-env/mailbox' });
  });

  it('SMTP_HOST alone switches to SMTP (port 587, STARTTLS when offered, no auth)', () => {
    expect(settings({ SMTP_HOST: 'mail.example.test', SMTP_FROM: 'Club <club@example.test>' })).toEqual({
      transport: 'smtp',
      from: 'Club <club@example.test>',
      smtp: { host: 'mail.example.test', port: 587, secure: false, auth: null },
    });
  });

  it('port 465 means TLS from the first byte unless SMTP_SECURE says otherwise; user and password become auth', () => {
    expect(settings({ SMTP_HOST: 'm.test', SMTP_PORT: '465', SMTP_USER: 'u', SMTP_PASS: 'p' })).toMatchObject({ smtp: { port: 465, secure: true, auth: { user: 'u', pass: 'p' } } });
    expect(settings({ SMTP_HOST: 'm.test', SMTP_PORT: '465', SMTP_SECURE: 'false' })).toMatchObject({ smtp: { secure: false } });
    expect(settings({ SMTP_HOST: 'm.test', SMTP_PORT: '2525', SMTP_SECURE: 'true' })).toMatchObject({ smtp: { port: 2525, secure: true } });
  });

  it('MAIL_TRANSPORT=fake keeps the fake mailbox even with SMTP_HOST set; a bad SMTP_SECURE stops the start', () => {
    expect(settings({ SMTP_HOST: 'm.test', MAIL_TRANSPORT: 'fake' }).transport).toBe('fake');
    expect(() => settings({ SMTP_HOST: 'm.test', SMTP_SECURE: 'maybe' })).toThrow(/SMTP_SECURE must be true or false/);
  });
});
