// An inverted-V keeps the leg direction the lead chose, end to end in Chromium on the demo stack, on this file's OWN
// event (created by REST on the demo site, one 20 m station pushed by the lead's second device; all removed at the
// end): the lead hand-picks the Big bur oak with legs typed at 30° (a bearing the engine never offers, so never its
// best) after a refused 200°, assigns it, and the server's antenna spot holds legAzimuthDeg 30; the spot is sent for
// review from the phone, the safety officer's queue names its legs, the acceptance is judged at 30°, and the crew's
// sheet says to run the legs toward 30° and 210°; moving to the 90° direction of the same oak re-plans the spot at 90°.
import { randomUUID } from 'node:crypto';
import type { BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { legEndOffsetM, planSite } from '../../shared/plan';
import { api, apiSignIn, pullAll, until } from './helpers/api';
import { browserForFile, byTestId, newPage, screenshot, type ViewportName } from './helpers/browser';
import { DEMO_PASSWORD, DEMO_USERS } from './helpers/demo-users';
import { baseUrl, signIn } from './helpers/session';
import { eventReviewOnServer, eventSiteFileOnServer, liveOf, pushFrom, type Change } from './helpers/sync-push';

const browser = browserForFile(beforeAll, afterAll);
const tag = randomUUID().slice(0, 6);
const stationId = randomUUID();
let eventId: string;
let clubId: string;
let oakId: string;
let lead: { token: string; userId: string };
let safety: { token: string; userId: string };
const decisionIds: string[] = [];
const contexts: BrowserContext[] = [];

async function signInWithId(email: string) {
  const { token, clubId: club } = await apiSignIn(email, DEMO_PASSWORD);
  const me = await api<{ user: { id: string } }>('/api/me', { token });
  clubId = club;
  return { token, userId: me.body.user.id };
}

async function openAs(role: keyof typeof DEMO_USERS, viewport: ViewportName, path: string): Promise<{ page: Page; errors: string[] }> {
  const p = await newPage(browser(), viewport);
  contexts.push(p.context);
  await signIn(p.page, DEMO_USERS[role]);
  await p.page.goto(`${baseUrl()}${path}`);
  return p;
}

const spotOnServer = async () => liveOf(await pullAll(lead.token, clubId), 'antennaSpots').find((s) => s.fields.eventId === eventId && s.fields.stationId === stationId);

/** The hand picker: an inverted-V from the Big bur oak, the legs at a typed bearing or one of the engine's directions. */
async function checkByHand(page: Page, legs: { typed: string } | { option: string }) {
  await byTestId(page, 'candidate-0').waitFor({ timeout: 120_000 }); // the plan is computed
  await byTestId(page, 'hand-shape-inverted-v').click();
  await byTestId(page, `hand-a-${oakId}`).click();
  if ('typed' in legs) {
    await byTestId(page, 'hand-legs-typed').click();
    await byTestId(page, 'hand-legs-typed').last().fill(legs.typed);
  } else {
    await byTestId(page, `hand-legs-${legs.option}`).click();
  }
  await byTestId(page, 'hand-check').click();
}

beforeAll(async () => {
  lead = await signInWithId(DEMO_USERS.lead);
  safety = await signInWithId(DEMO_USERS.safety);
  const events = await api<{ id: string; siteId: string; name: string }[]>(`/api/clubs/${clubId}/events`, { token: lead.token });
  const siteId = events.body.find((e) => e.name === 'Midwinter Field Outing')!.siteId;
  const made = await api<{ id: string }>(`/api/clubs/${clubId}/events`, { token: lead.token, json: { siteId, name: `Leg check ${tag}`, startsOn: '2027-01-23', endsOn: '2027-01-23', notes: 'Made by the leg-direction browser test' } });
  expect(made.status).toBe(201);
  eventId = made.body.id;
  oakId = liveOf(await pullAll(lead.token, clubId), 'supports').find((s) => s.fields.siteId === siteId && s.fields.label === 'Big bur oak')!.id;
  const station = { eventId, name: `Legs ${tag}`, bands: ['20m'], mode: 'cw', powerW: 100, purpose: 'long-distance', notes: '' };
  expect(await pushFrom(lead.token, clubId, [{ collection: 'stations', recordId: stationId, fields: station }])).toEqual([]);
});

afterAll(async () => {
  for (const c of contexts) await c.close();
  if (!eventId) return;
  const spot = await spotOnServer();
  if (decisionIds.length) await pushFrom(safety.token, clubId, decisionIds.map((id) => ({ collection: 'reviewDecisions', recordId: id, op: 'delete' })));
  const gone: Change[] = [{ collection: 'stations', recordId: stationId, op: 'delete' }];
  if (spot) gone.unshift({ collection: 'antennaSpots', recordId: spot.id, op: 'delete' });
  await pushFrom(lead.token, clubId, gone);
  await api(`/api/clubs/${clubId}/events/${eventId}`, { method: 'DELETE', token: lead.token });
});

describe('an inverted-V keeps the leg direction the lead chose', { timeout: 300_000 }, () => {
  it('wide: a typed 200° is refused in plain words; 30° opens the oak with legs 30°–210°, and assigning stores legAzimuthDeg 30 on the server', async () => {
    const { page, errors } = await openAs('lead', 'wide', `/events/${eventId}/plan`);
    // The ranked list names each inverted-V's legs too (one of the engine's four directions).
    const first = byTestId(page, 'candidate-0');
    await first.waitFor({ timeout: 120_000 });
    await first.scrollIntoViewIfNeeded();
    await screenshot(page, 'plan-legs-list', 'wide');
    expect(await page.locator('[data-testid^="candidate-"][role="link"]').allTextContents()).toContainEqual(expect.stringMatching(/Inverted-V at .*, legs run (0|45|90|135)° – (180|225|270|315)°/));
    await checkByHand(page, { typed: '200' });
    const refused = byTestId(page, 'hand-legs-typed-error');
    await expect.poll(() => refused.textContent()).toMatch(/0 to 179\.9° true.*a wire along 200° is along 20°/);
    expect(await byTestId(page, 'plan-detail').count(), 'a refused bearing opens nothing').toBe(0);
    await byTestId(page, 'hand-legs').scrollIntoViewIfNeeded();
    await screenshot(page, 'plan-legs-refused', 'wide');

    await byTestId(page, 'hand-legs-typed').last().fill('30');
    await byTestId(page, 'hand-check').click();
    const legs = byTestId(page, 'plan-candidate-0-legs');
    await legs.waitFor();
    expect(await legs.textContent()).toContain('Inverted-V legs run 30° – 210° true from the apex');
    // Leg ends 4.36 m out: a 20 m leg at the 120° apex, leg·sin 60° (what the engine uses; right-triangle trigonometry).
    expect(await legs.textContent()).toMatch(/each leg end comes down 4\.[34] m out from the support/);
    expect(legEndOffsetM(5.03, 120)).toBeCloseTo(4.36, 2);
    // The typed bearing is not one of the engine's directions, and its pictures are drawn all the same.
    await byTestId(page, 'plan-candidate-0-pattern-elevation').waitFor();
    await byTestId(page, 'plan-candidate-0-pattern-azimuth').waitFor();
    await legs.scrollIntoViewIfNeeded();
    await screenshot(page, 'plan-legs-candidate', 'wide');
    await byTestId(page, 'plan-candidate-0-assign').click();

    const stored = await until('the spot with its leg bearing on the server', async () => {
      const s = await spotOnServer();
      return s && s.fields.legAzimuthDeg === 30 && s;
    });
    expect(stored.fields).toMatchObject({ shape: 'inverted-v', supportIds: [oakId], band: '20m', state: 'planned' });
    const where = byTestId(page, `assignment-where-${stored.id}`);
    await expect.poll(() => where.textContent()).toBe('Inverted-V from Big bur oak, legs run 30° – 210°');
    await byTestId(page, 'plan-assignments').scrollIntoViewIfNeeded();
    await screenshot(page, 'plan-legs-assigned', 'wide');
    expect(errors).toEqual([]);
  });

  it('phone: sent for review; the safety officer’s acceptance is judged at 30°; the crew sheet says to run the legs toward 30° and 210°', async () => {
    const spot = (await spotOnServer())!;
    const lp = await openAs('lead', 'phone', `/events/${eventId}/plan`);
    await byTestId(lp.page, `assignment-send-${spot.id}`).click({ timeout: 120_000 });
    await until('the spot waiting for review with a fingerprint that includes its legs', async () => {
      const s = await spotOnServer();
      return s && s.fields.state === 'waiting-review' && /\.l[0-9a-f]{8}(\.|$)/.test(String(s.fields.inputsFingerprint));
    });
    await byTestId(lp.page, `assignment-open-${spot.id}`).click();
    await byTestId(lp.page, 'plan-candidate-0-legs').scrollIntoViewIfNeeded();
    expect(await byTestId(lp.page, 'plan-candidate-0-legs').textContent()).toContain('legs run 30° – 210°');
    await screenshot(lp.page, 'plan-legs-open', 'phone');
    expect(lp.errors).toEqual([]);

    // The safety officer's queue names the legs of the wire being judged.
    const sp = await openAs('safety', 'phone', `/events/${eventId}/review`);
    const card = byTestId(sp.page, `review-spot-${stationId}-20m`);
    await card.waitFor({ timeout: 120_000 });
    expect(await card.textContent()).toContain(`Legs ${tag} · 20m · inverted-V at Big bur oak, legs run 30° – 210°`);
    await screenshot(sp.page, 'plan-legs-review', 'phone');
    expect(sp.errors).toEqual([]);

    const [e] = await eventReviewOnServer(lead.token, clubId, eventId);
    expect(e.evaluated!.candidate.wireAzimuthDeg).toBe(30);
    expect(e.results.filter((r) => r.level === 'blocked')).toEqual([]);
    const decisions = e.results.map((r) => {
      const id = randomUUID();
      decisionIds.push(id);
      return { collection: 'reviewDecisions', recordId: id, fields: { spotId: spot.id, resultKey: r.key, decision: 'accept', reason: 'Walked the legs out at 30° and 210° with the lead', inputsFingerprint: e.fingerprint, decidedAt: new Date().toISOString(), decidedBy: safety.userId } };
    });
    expect(await pushFrom(safety.token, clubId, decisions)).toEqual([]);

    const crew = await openAs('crew', 'phone', `/events/${eventId}/sheets/${spot.id}`);
    const sheetLegs = byTestId(crew.page, 'sheet-legs');
    await sheetLegs.waitFor({ timeout: 120_000 });
    expect(await sheetLegs.textContent()).toMatch(/^Run one leg toward 30° and the other toward 210° \(true, from the apex\): each leg end comes down 4\.[34] m out from the foot of Big bur oak$/);
    await sheetLegs.scrollIntoViewIfNeeded();
    await screenshot(crew.page, 'plan-legs-sheet', 'phone');
    expect(crew.errors).toEqual([]);
  });

  it('wide: moving to the 90° direction of the same oak re-plans the spot at 90°: planned again, since the acceptances were made for the 30° wire', async () => {
    const { page, errors } = await openAs('lead', 'wide', `/events/${eventId}/plan`);
    await checkByHand(page, { option: '90' });
    await expect.poll(() => byTestId(page, 'plan-candidate-0-legs').textContent()).toContain('legs run 90° – 270°');
    expect(await byTestId(page, 'plan-candidate-0-assign').textContent()).toContain('Move the assignment here');
    await byTestId(page, 'plan-candidate-0-assign').click();
    const moved = await until('the spot moved to 90°', async () => {
      const s = await spotOnServer();
      return s && s.fields.legAzimuthDeg === 90 && s;
    });
    expect(moved.fields.state).toBe('planned');
    const [e] = await eventReviewOnServer(lead.token, clubId, eventId);
    expect(e.evaluated!.candidate.wireAzimuthDeg).toBe(90);
    expect(e.review.state).toBe('planned');
    expect(errors).toEqual([]);
  });

  it('wide: “assign all stations” stores the direction the engine chose (one of its four for an inverted-V, none for a flat-top)', async () => {
    const { page, errors } = await openAs('lead', 'wide', `/events/${eventId}/plan`);
    await byTestId(page, 'candidate-0').waitFor({ timeout: 120_000 });
    await byTestId(page, 'plan-assign-all').click();
    await expect.poll(() => byTestId(page, 'plan-assign-message').textContent(), { timeout: 30_000 }).toMatch(/assigned by the engine/);
    // The engine's pick for this station, from the same records (the app's worker runs the same planSite).
    const file = await eventSiteFileOnServer(lead.token, clubId, eventId);
    const pick = planSite(file).assignment.spots.find((x) => x.stationId === stationId)!.candidate!;
    const want = { shape: pick.shape, supportIds: pick.supportIds, legAzimuthDeg: pick.shape === 'inverted-v' ? pick.wireAzimuthDeg : null };
    const stored = await until('the engine’s pick on the server', async () => {
      const s = await spotOnServer();
      return s && s.fields.shape === want.shape && JSON.stringify(s.fields.supportIds) === JSON.stringify(want.supportIds) && s.fields.legAzimuthDeg === want.legAzimuthDeg && s;
    });
    if (pick.shape === 'inverted-v') expect([0, 45, 90, 135]).toContain(stored.fields.legAzimuthDeg);
    const [e] = await eventReviewOnServer(lead.token, clubId, eventId);
    expect(e.evaluated!.candidate.id).toBe(pick.id);
    expect(errors).toEqual([]);
  });
});
