// Crews assigned to stations, end to end in Chromium on the demo stack, on this file's OWN event (created by REST on
// the demo site, two stations pushed by the lead's second device; all removed at the end): the lead picks the demo
// crew member as crew of one station in the station form (wide, and offline at phone size from the member list the
// device saved), the server stores crewMemberIds, a cleared spot of each station mails the named crew its own sheet
// and every crew member the other (saying no crew is named), and the crew member's sheets screen lists the sheets of
// their own station first under its own heading.
import { randomUUID } from 'node:crypto';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { api, apiSignIn, pullAll, until } from './helpers/api';
import { browserForFile, byTestId, newPage, screenshot, type ViewportName } from './helpers/browser';
import { DEMO_PASSWORD, DEMO_USERS } from './helpers/demo-users';
import { waitForMail } from './helpers/mailbox';
import { baseUrl, signIn } from './helpers/session';
import { eventReviewOnServer, liveOf as live, pushFrom, type Change } from './helpers/sync-push';

const browser = browserForFile(beforeAll, afterAll);
const tag = randomUUID().slice(0, 6);
const eventName = `Crew check ${tag}`;
const ids = { low: randomUUID(), high: randomUUID(), lowSpot: randomUUID(), highSpot: randomUUID() };
let eventId: string;
let clubId: string;
let lead: { token: string; userId: string };
let safety: { token: string; userId: string };
let crewUserId: string;
const contexts: BrowserContext[] = [];

/** Pushes changes from a second device of the person holding `token` (as a phone's sync would). */
const pushAs = (token: string, changes: Change[]) => pushFrom(token, clubId, changes);

async function signInWithId(email: string) {
  const { token } = await apiSignIn(email, DEMO_PASSWORD);
  const me = await api<{ user: { id: string } }>('/api/me', { token });
  return { token, userId: me.body.user.id };
}


async function openAs(role: keyof typeof DEMO_USERS, viewport: ViewportName): Promise<{ page: Page; context: BrowserContext; errors: string[] }> {
  const p = await newPage(browser(), viewport);
  contexts.push(p.context);
  await signIn(p.page, DEMO_USERS[role]);
  return p;
}

beforeAll(async () => {
  lead = await signInWithId(DEMO_USERS.lead);
  safety = await signInWithId(DEMO_USERS.safety);
  ({ clubId } = await apiSignIn(DEMO_USERS.lead, DEMO_PASSWORD));
  const members = await api<{ userId: string; email: string }[]>(`/api/clubs/${clubId}/members`, { token: lead.token });
  crewUserId = members.body.find((m) => m.email === DEMO_USERS.crew)!.userId;
  const events = await api<{ id: string; siteId: string; name: string }[]>(`/api/clubs/${clubId}/events`, { token: lead.token });
  const siteId = events.body.find((e) => e.name === 'Midwinter Field Outing')!.siteId;
  const made = await api<{ id: string }>(`/api/clubs/${clubId}/events`, { token: lead.token, json: { siteId, name: eventName, startsOn: '2027-01-16', endsOn: '2027-01-16', notes: 'Made by the crew-assignment browser test' } });
  expect(made.status).toBe(201);
  eventId = made.body.id;
  // The low-band station is made first, so "its own station first" cannot be the list's natural order.
  const rejected = await pushAs(lead.token, [
    { collection: 'stations', recordId: ids.low, fields: { eventId, name: `Low ${tag}`, bands: ['40m'], mode: 'ssb', powerW: 100, purpose: 'regional', notes: '' } },
    { collection: 'stations', recordId: ids.high, fields: { eventId, name: `High ${tag}`, bands: ['20m'], mode: 'cw', powerW: 100, purpose: 'long-distance', notes: '' } },
  ]);
  expect(rejected).toEqual([]);
});

afterAll(async () => {
  for (const c of contexts) await c.close();
  if (!eventId) return;
  await pushAs(lead.token, [
    { collection: 'antennaSpots', recordId: ids.lowSpot, op: 'delete' },
    { collection: 'antennaSpots', recordId: ids.highSpot, op: 'delete' },
    { collection: 'stations', recordId: ids.low, op: 'delete' },
    { collection: 'stations', recordId: ids.high, op: 'delete' },
  ]);
  await api(`/api/clubs/${clubId}/events/${eventId}`, { method: 'DELETE', token: lead.token });
});

describe('crews assigned to stations', { timeout: 300_000 }, () => {
  it('the lead picks the demo crew member for one station in the form (wide); the server stores crewMemberIds; the card says who crews each', async () => {
    const { page, errors } = await openAs('lead', 'wide');
    await page.goto(`${baseUrl()}/events/${eventId}/plan`);
    await byTestId(page, `station-${ids.high}`).click();
    await byTestId(page, 'station-form').waitFor();
    const chip = byTestId(page, `station-crew-${crewUserId}`);
    await chip.waitFor();
    await byTestId(page, 'station-crew-none').waitFor(); // no crew named yet: the form says who then gets the sheets
    expect(await byTestId(page, 'station-crew-none').textContent()).toContain('every crew member of the club gets its sheet e-mail');
    // Crew members are listed first (members with role crew, then the rest by name).
    const firstChip = await page.locator('[data-testid^="station-crew-"][role="checkbox"]').first().getAttribute('data-testid');
    expect(firstChip).toBe(`station-crew-${crewUserId}`);
    await chip.click();
    expect(await chip.getAttribute('aria-checked')).toBe('true');
    expect(await byTestId(page, 'station-crew-none').count()).toBe(0);
    await byTestId(page, 'station-crew').scrollIntoViewIfNeeded();
    await screenshot(page, 'crew-assign-form', 'wide');
    await byTestId(page, 'station-save').click();
    await until('the crew on the server', async () => live(await pullAll(lead.token, clubId), 'stations').find((s) => s.id === ids.high && JSON.stringify(s.fields.crewMemberIds) === JSON.stringify([crewUserId])));
    await expect.poll(() => byTestId(page, `station-${ids.high}`).textContent()).toContain('Crew: Ray Castellano');
    expect(await byTestId(page, `station-${ids.low}`).textContent()).toContain('Crew: none named');
    await byTestId(page, 'plan-stations').scrollIntoViewIfNeeded();
    await screenshot(page, 'crew-assign-stations', 'wide');
    expect(errors).toEqual([]);
  });

  it('at phone size, offline after a reload, the form lists the members the device saved; with none saved it says so and keeps the chosen crew', async () => {
    const { page, context, errors } = await openAs('lead', 'phone');
    await page.goto(`${baseUrl()}/events/${eventId}/plan`);
    await byTestId(page, `station-${ids.high}`).click();
    await byTestId(page, `station-crew-${crewUserId}`).waitFor(); // online: the list comes from the server and is saved
    await page.waitForFunction(() => navigator.serviceWorker?.controller != null, null, { timeout: 120_000 });
    await context.setOffline(true);
    await page.reload();
    await byTestId(page, `station-${ids.high}`).click({ timeout: 60_000 });
    const chip = byTestId(page, `station-crew-${crewUserId}`);
    await chip.waitFor({ timeout: 60_000 });
    expect(await chip.getAttribute('aria-checked'), 'the crew already chosen stays chosen offline').toBe('true');
    await byTestId(page, 'station-crew-cached').waitFor({ timeout: 60_000 });
    await byTestId(page, 'station-crew').scrollIntoViewIfNeeded();
    await screenshot(page, 'crew-assign-form-offline', 'phone');
    await byTestId(page, 'station-cancel').click();
    // With no saved member list at all (another phone, never online in the plan): the form says the list needs a
    // connection, and the person already chosen stays chosen (shown without a name) so saving loses nothing.
    await page.evaluate(() => Object.keys(localStorage).filter((k) => k.startsWith('loftline.members.')).forEach((k) => localStorage.removeItem(k)));
    await page.reload();
    await byTestId(page, `station-${ids.high}`).click({ timeout: 60_000 });
    await byTestId(page, 'station-crew-offline').waitFor({ timeout: 60_000 });
    expect(await byTestId(page, 'station-crew-offline').textContent()).toMatch(/needs a connection.*already chosen stays chosen/);
    expect(await byTestId(page, `station-crew-${crewUserId}`).getAttribute('aria-checked')).toBe('true');
    await byTestId(page, 'station-crew').scrollIntoViewIfNeeded();
    await screenshot(page, 'crew-assign-form-no-list', 'phone');
    await byTestId(page, 'station-save').click();
    await byTestId(page, 'station-form').waitFor({ state: 'detached' });
    await context.setOffline(false);
    await until('the crew still on the server after an offline save', async () => live(await pullAll(lead.token, clubId), 'stations').find((s) => s.id === ids.high && JSON.stringify(s.fields.crewMemberIds) === JSON.stringify([crewUserId]) && s));
    expect(errors).toEqual([]);
  });

  it('a cleared spot of each station: the named crew gets its own sheet, the other goes to every crew member saying none is named; the crew’s sheets screen lists its station first', async () => {
    const all = await pullAll(lead.token, clubId);
    const supportOf = (label: string) => live(all, 'supports').find((s) => s.fields.label === label)!.id;
    const spot = (id: string, stationId: string, band: string, supportId: string) => ({
      collection: 'antennaSpots',
      recordId: id,
      fields: { eventId, stationId, band, shape: 'inverted-v', supportIds: [supportId], state: 'waiting-review', notes: '' },
    });
    expect(await pushAs(lead.token, [spot(ids.lowSpot, ids.low, '40m', supportOf('Big bur oak')), spot(ids.highSpot, ids.high, '20m', supportOf('Creek sycamore'))])).toEqual([]);

    // The safety officer accepts every result of both spots, judged by the same shared review the app and server use.
    const evaluated = await eventReviewOnServer(lead.token, clubId, eventId);
    expect(evaluated).toHaveLength(2);
    const decisions: Change[] = [];
    for (const e of evaluated) {
      expect(e.evaluated, `the ${e.spot.band} spot can be built`).not.toBeNull();
      expect(e.results.filter((r) => r.level === 'blocked'), `no blocked result on the ${e.spot.band} spot`).toEqual([]);
      for (const r of e.results) {
        decisions.push({ collection: 'reviewDecisions', recordId: randomUUID(), fields: { spotId: e.spot.id, resultKey: r.key, decision: 'accept', reason: 'Checked on the walk-round with the lead', inputsFingerprint: e.fingerprint, decidedAt: new Date().toISOString(), decidedBy: safety.userId } });
      }
    }
    expect(await pushAs(safety.token, decisions)).toEqual([]);

    // Mail: the named crew member hears of the high station's sheet as theirs; the low one (no crew) says so.
    const highMail = await until('the high station sheet mail', async () => {
      const m = await waitForMail(DEMO_USERS.crew, new RegExp(`· ${eventName}$`), 60_000);
      return m.text.includes(`/sheets/${ids.highSpot}`) && m.text.includes(`/sheets/${ids.lowSpot}`) && m;
    });
    const [highPart, lowPart] = [ids.highSpot, ids.lowSpot].map((id) => highMail.text.split('\n- ').find((part) => part.includes(`/sheets/${id}`))!);
    expect(highPart).toContain(`20m inverted-V dipole for High ${tag}`);
    expect(highPart).not.toContain('No crew is named');
    expect(lowPart).toContain('No crew is named for this station, so every crew member gets this.');

    // The crew member's sheets screen: their own station's antennas first, under their own heading.
    const { page, errors } = await openAs('crew', 'phone');
    await page.goto(`${baseUrl()}/events/${eventId}/sheets`);
    const mine = byTestId(page, 'sheets-mine');
    await mine.locator(`[data-testid="sheets-open-${ids.high}-20m"]`).waitFor({ timeout: 60_000 });
    expect(await mine.textContent()).toContain('Antennas you raise');
    expect(await mine.textContent()).toContain(`You are named as crew of High ${tag}.`);
    const others = byTestId(page, 'sheets-others');
    await others.locator(`[data-testid="sheets-open-${ids.low}-40m"]`).waitFor();
    expect(await mine.locator(`[data-testid="sheets-open-${ids.low}-40m"]`).count()).toBe(0);
    const [a, b] = [await mine.boundingBox(), await others.boundingBox()];
    expect(a!.y + a!.height).toBeLessThanOrEqual(b!.y + 1);
    await screenshot(page, 'crew-assign-sheets', 'phone');
    expect(errors).toEqual([]);
  });
});
