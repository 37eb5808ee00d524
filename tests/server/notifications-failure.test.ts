// A broken mail queue must never cost anyone their data: the push is applied and kept, the announcement is rolled
// back to its savepoint (its once-only key with it), so the next entry into review is announced when mail works.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { MailMessage, MailQueue } from '../../server/src/app-deps';
import { startTestApp, type TestApp, type TestUser } from './helpers/test-app';
import { device, eventRecords, push, setState, spotCreate } from './notifications-fixtures';

class FlakyMail implements MailQueue {
  broken = true;
  readonly sent: MailMessage[] = [];
  async enqueue(m: MailMessage): Promise<void> {
    if (this.broken) throw new Error('mail queue unavailable');
    this.sent.push(m);
  }
}

let app: TestApp;
let lead: TestUser, safety: TestUser;
const mail = new FlakyMail();
let nowMs = Date.now();

beforeAll(async () => {
  app = await startTestApp({ mail, clock: { now: () => new Date(nowMs) } });
  lead = await app.signUpUser({ role: 'lead' });
  safety = await app.signUpUser({ role: 'safety', clubId: lead.clubId });
});
afterAll(() => app?.close());

describe('notifications when mail fails', () => {
  it('the push is kept when queuing the e-mail fails, and the event is announced once mail works again', async () => {
    const clubId = lead.clubId!;
    const phone = device(lead);
    const { ids, changes } = eventRecords('Outing with a broken mail server');
    const spot = spotCreate(ids, '40m');
    await push(app, clubId, phone, [...changes, spot], nowMs);
    const answer = await push(app, clubId, phone, [setState(spot.recordId, 'waiting-review')], nowMs);
    expect(answer.rejected).toEqual([]);
    const [row] = await app.deps.dataSource.query('SELECT state FROM antenna_spots WHERE id = $1', [spot.recordId]);
    expect(row.state).toBe('waiting-review');
    const [{ n }] = await app.deps.dataSource.query('SELECT count(*)::int AS n FROM notifications_sent WHERE club_id = $1', [clubId]);
    expect(n).toBe(0);

    mail.broken = false;
    await push(app, clubId, phone, [setState(spot.recordId, 'planned')], nowMs);
    await push(app, clubId, phone, [setState(spot.recordId, 'waiting-review')], nowMs);
    expect(mail.sent.map((m) => m.to)).toEqual([safety.email]);
  });
});
