// Invitations end to end against real PostgreSQL and the real pg-boss mail queue with the fake transport: the admin
// invites an e-mail with a role, the message lands in the dev mailbox with a working link, and accepting it makes a
// member with that role (issue 2: "invite members by e-mail with a role, accept an invitation from the link").
import { createHash } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitationSchema, tokensSchema } from '../../shared/schemas';
import type { Clock } from '../../server/src/app-deps';
import { AppError } from '../../server/src/http/errors';
import { mailSettingsFromConfig } from '../../server/src/modules/mail/mail-settings';
import { openMailService, type MailService } from '../../server/src/modules/mail/mail-service';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';

// Starts at the real time: access tokens are checked against the real clock by passport-jwt.
let now = Date.now();
const clock: Clock = { now: () => new Date(now) };
const dataDir = mkdtempSync(join(tmpdir(), 'loftline-invite-'));
let t: TestApp;
let mail: MailService;

beforeAll(async () => {
  t = await startTestApp({ clock, config: { dataDir } });
  // The real outbox on the test app's own database, so invitation rows and mail jobs share one transaction.
  mail = await openMailService({
    connection: { url: String((t.deps.dataSource.options as { url?: string }).url) },
    settings: mailSettingsFromConfig(t.deps.config),
    logger: t.deps.logger,
    retry: { retryLimit: 3, retryDelaySeconds: 1, retryBackoff: true, pollingIntervalSeconds: 0.5 },
  });
  t.deps.mail = mail;
  await mail.startWorker();
});
afterAll(async () => {
  await mail?.stop();
  await t?.close();
  rmSync(dataDir, { recursive: true, force: true });
});

/** Waits for the worker to deliver a message to `to` into the fake mailbox, read through the dev mailbox route. */
async function mailTo(to: string, count = 1): Promise<{ subject: string; text: string; html: string }[]> {
  for (let i = 0; i < 100; i++) {
    const res = await t.api('GET', `/api/dev/mailbox?to=${encodeURIComponent(to)}`);
    expect(res.status).toBe(200);
    if (res.body.length >= count) return res.body;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail to ${to}`);
}

function inviteToken(text: string): string {
  const m = /\/invite\/([A-Za-z0-9_-]+)/.exec(text);
  if (!m) throw new Error(`no invitation link in: ${text}`);
  return m[1]!;
}

async function clubWithAdmin(): Promise<{ admin: TestUser; clubId: string }> {
  const admin = await t.signUpUser({ displayName: 'Ada Admin' });
  const res = await t.api('POST', '/api/clubs', { auth: admin, body: { name: 'Kestrel Ridge Amateur Radio Club', callSign: 'K0KRC' } });
  return { admin, clubId: res.body.id };
}

let n = 0;
const freshEmail = () => `invitee${++n}-${Date.now()}@kestrel.test`;

describe('invitations', () => {
  it('invite → e-mail in the fake mailbox with the app link → preview → sign up in the same step → member with the role', async () => {
    const { admin, clubId } = await clubWithAdmin();
    const email = freshEmail();
    const created = await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email: email.toUpperCase(), role: 'scout' } });
    expect(created.status).toBe(201);
    const inv = invitationSchema.parse(created.body);
    expect(inv).toMatchObject({ email, role: 'scout', clubId, clubName: 'Kestrel Ridge Amateur Radio Club', acceptedAt: null });
    // 7-day expiry from the injected clock
    expect(new Date(inv.expiresAt).getTime() - now).toBe(7 * 24 * 3600 * 1000);

    const [message] = await mailTo(email);
    expect(message!.subject).toContain('Kestrel Ridge Amateur Radio Club');
    expect(message!.text).toContain('as a scout');
    expect(message!.text).toContain(`${t.baseUrl}/invite/`);
    const token = inviteToken(message!.text);
    expect(message!.html).toContain(`${t.baseUrl}/invite/${token}`);

    const preview = await t.api('GET', `/api/invitations/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body).toEqual({ clubName: 'Kestrel Ridge Amateur Radio Club', email, role: 'scout', expiresAt: inv.expiresAt, needsSignUp: true });

    const accepted = await t.api('POST', '/api/invitations/accept', {
      body: { token, signUp: { password: 'a long field-day password', displayName: 'Sam Scout', callSign: 'kd0sam' } },
    });
    expect(accepted.status).toBe(200);
    const tokens = tokensSchema.parse(accepted.body);
    expect(tokens.user).toMatchObject({ email, displayName: 'Sam Scout', callSign: 'KD0SAM' });
    const clubs = await t.api('GET', '/api/clubs', { auth: tokens.accessToken });
    expect(clubs.body).toEqual([expect.objectContaining({ id: clubId, role: 'scout' })]);
    // and the new account signs in with the password chosen on the invitation page
    const signIn = await t.api('POST', '/api/auth/sign-in', { body: { email, password: 'a long field-day password' } });
    expect(signIn.status).toBe(200);

    const list = await t.api('GET', `/api/clubs/${clubId}/invitations`, { auth: admin });
    expect(list.body[0]).toMatchObject({ id: inv.id, acceptedAt: new Date(now).toISOString() });
  });

  it('the token is stored only as its sha256 and works once (a second accept is 410 invitation_used)', async () => {
    const { admin, clubId } = await clubWithAdmin();
    const email = freshEmail();
    await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email, role: 'crew' } });
    const token = inviteToken((await mailTo(email))[0]!.text);
    const rows: { token_hash: string }[] = await t.deps.dataSource.query('SELECT token_hash FROM invitations WHERE email = $1', [email]);
    expect(rows).toEqual([{ token_hash: createHash('sha256').update(token).digest('hex') }]);

    const signUp = { password: 'another long password', displayName: 'Cy Crew' };
    const [a, b] = await Promise.all([
      t.api('POST', '/api/invitations/accept', { body: { token, signUp } }),
      t.api('POST', '/api/invitations/accept', { body: { token, signUp } }),
    ]);
    expect([a.status, b.status].sort()).toEqual([200, 410]);
    const again = await t.api('POST', '/api/invitations/accept', { body: { token, signUp } });
    expect(again.status).toBe(410);
    expect(again.body.code).toBe('invitation_used');
    expect((await t.api('GET', `/api/invitations/${token}`)).status).toBe(410);
  });

  it('a signed-in user accepts with their bearer token; a different signed-in e-mail gets 403 with a clear message', async () => {
    const { admin, clubId } = await clubWithAdmin();
    const invitee = await t.signUpUser({ email: freshEmail() });
    const other = await t.signUpUser({ email: freshEmail() });
    await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email: invitee.email, role: 'safety' } });
    const token = inviteToken((await mailTo(invitee.email))[0]!.text);
    expect((await t.api('GET', `/api/invitations/${token}`)).body.needsSignUp).toBe(false);

    const wrong = await t.api('POST', '/api/invitations/accept', { auth: other, body: { token } });
    expect(wrong.status).toBe(403);
    expect(wrong.body.code).toBe('invitation_email_mismatch');
    expect(wrong.body.message).toContain(invitee.email);
    expect(wrong.body.message).toContain(other.email);

    const anonymous = await t.api('POST', '/api/invitations/accept', { body: { token } });
    expect(anonymous.status).toBe(401);
    expect(anonymous.body.code).toBe('sign_in_required');
    const takenSignUp = await t.api('POST', '/api/invitations/accept', { body: { token, signUp: { password: 'long enough password', displayName: 'X' } } });
    expect(takenSignUp.status).toBe(409);

    const ok = await t.api('POST', '/api/invitations/accept', { auth: invitee, body: { token } });
    expect(ok.status).toBe(200);
    expect(ok.body.user.id).toBe(invitee.id);
    const club = await t.api('GET', `/api/clubs/${clubId}`, { auth: invitee });
    expect(club.body.role).toBe('safety');
  });

  it('re-inviting the same e-mail replaces the old link: the old token is dead, the new one carries the new role', async () => {
    const { admin, clubId } = await clubWithAdmin();
    const email = freshEmail();
    await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email, role: 'crew' } });
    const oldToken = inviteToken((await mailTo(email, 1))[0]!.text);
    await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email, role: 'lead' } });
    const newest = (await mailTo(email, 2))[0]!;
    const newToken = inviteToken(newest.text);
    expect(newToken).not.toBe(oldToken);
    expect(newest.text).toContain('as a lead');

    const dead = await t.api('GET', `/api/invitations/${oldToken}`);
    expect(dead.status).toBe(404);
    expect(dead.body.code).toBe('invitation_not_found');
    const list = await t.api('GET', `/api/clubs/${clubId}/invitations`, { auth: admin });
    expect(list.body.filter((i: { email: string }) => i.email === email)).toEqual([expect.objectContaining({ role: 'lead', acceptedAt: null })]);
    expect((await t.api('GET', `/api/invitations/${newToken}`)).body.role).toBe('lead');
  });

  it('a revoked invitation stops working; revoking twice is 404', async () => {
    const { admin, clubId } = await clubWithAdmin();
    const email = freshEmail();
    const inv = await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email, role: 'scout' } });
    const token = inviteToken((await mailTo(email))[0]!.text);
    expect((await t.api('DELETE', `/api/clubs/${clubId}/invitations/${inv.body.id}`, { auth: admin })).status).toBe(204);
    expect((await t.api('GET', `/api/invitations/${token}`)).status).toBe(404);
    expect((await t.api('POST', '/api/invitations/accept', { body: { token, signUp: { password: 'long enough password', displayName: 'X' } } })).status).toBe(404);
    expect((await t.api('DELETE', `/api/clubs/${clubId}/invitations/${inv.body.id}`, { auth: admin })).status).toBe(404);
    expect((await t.api('GET', `/api/clubs/${clubId}/invitations`, { auth: admin })).body).toEqual([]);
  });

  it('an invitation expires after 7 days (410 invitation_expired), judged by the injected clock', async () => {
    const { admin, clubId } = await clubWithAdmin();
    const email = freshEmail();
    await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email, role: 'scout' } });
    const token = inviteToken((await mailTo(email))[0]!.text);
    const start = now;
    try {
      now = start + 7 * 24 * 3600 * 1000 - 1000;
      expect((await t.api('GET', `/api/invitations/${token}`)).status).toBe(200);
      now = start + 7 * 24 * 3600 * 1000;
      const expired = await t.api('POST', '/api/invitations/accept', { body: { token, signUp: { password: 'long enough password', displayName: 'Late' } } });
      expect(expired.status).toBe(410);
      expect(expired.body.code).toBe('invitation_expired');
    } finally {
      now = start;
    }
  });

  it('inviting someone who is already a member is 409 already_member, and sends no mail', async () => {
    const { admin, clubId } = await clubWithAdmin();
    const res = await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email: admin.email, role: 'crew' } });
    expect(res.status).toBe(409);
    expect(res.body.code).toBe('already_member');
    const rows: unknown[] = await t.deps.dataSource.query('SELECT 1 FROM invitations WHERE email = $1', [admin.email]);
    expect(rows).toEqual([]);
  });

  it('when the mail cannot be queued the invitation is rolled back with it (503, no orphan row)', async () => {
    const { admin, clubId } = await clubWithAdmin();
    const email = freshEmail();
    const real = t.deps.mail;
    t.deps.mail = { enqueue: async () => Promise.reject(new AppError('mail_unavailable', 'unavailable', 'the mail queue is not answering')) };
    try {
      const res = await t.api('POST', `/api/clubs/${clubId}/invitations`, { auth: admin, body: { email, role: 'scout' } });
      expect(res.status).toBe(503);
    } finally {
      t.deps.mail = real;
    }
    const rows: unknown[] = await t.deps.dataSource.query('SELECT 1 FROM invitations WHERE email = $1', [email]);
    expect(rows).toEqual([]);
  });
});
