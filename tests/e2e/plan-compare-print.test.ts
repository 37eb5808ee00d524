// Issue 7's lead and crew screens that plan-day.test.ts does not cover, in Chromium on the demo site, on an event
// of this file's own (made by REST, two stations pushed by the lead's second device, removed afterwards):
//  (a) two and three candidates compared side by side on a wide screen, each with its own pattern pictures and
//      clearances; a phone shows one candidate at a time;
//  (b) the printed crew sheets: one PDF page per cleared antenna, no navigation chrome, the cautions on each;
//  (c) with no Web Worker (removed, or its script answering 404) the plan computes on the main thread, gives the
//      same ranked candidates as the worker did, and says where it computed.
import { randomUUID } from 'node:crypto';
import path from 'node:path';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PROTOCOL_VERSION, SCHEMA_VERSION, encodeHlc } from '../../sync/protocol';
import { api, apiSignIn, pullAll, until } from './helpers/api';
import { SCREENSHOT_DIR, VIEWPORTS, byTestId, launchBrowser, newPage, screenshot, type ViewportName } from './helpers/browser';
import { DEMO_PASSWORD, DEMO_SITE, DEMO_USERS } from './helpers/demo-users';
import { baseUrl, signIn } from './helpers/session';

type Person = { context: BrowserContext; page: Page; errors: string[] };

let browser: Browser;
let leadToken: string;
let clubId: string;
let eventId: string;
const stationIds = { low: randomUUID(), high: randomUUID() };
const needKeys = [`${stationIds.low}:40m`, `${stationIds.high}:20m`, `${stationIds.high}:15m`];
const contexts: BrowserContext[] = [];
const deviceId = `e2e-compare-${randomUUID().slice(0, 8)}`;
let mutationId = 1;

async function push(changes: { collection: string; recordId: string; op?: 'upsert' | 'delete'; fields?: Record<string, unknown> }[]) {
  const now = Date.now();
  const mutations = changes.map((c, i) => ({ mutationId: mutationId++, collection: c.collection, recordId: c.recordId, op: c.op ?? 'upsert', fields: c.fields ?? {}, baseClocks: {}, clock: encodeHlc({ wallMs: now, counter: i, node: deviceId }) }));
  const r = await api<{ rejected: unknown[] }>(`/api/clubs/${clubId}/sync/push`, { token: leadToken, json: { type: 'push', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, deviceId, mutations } });
  expect(r.status).toBe(200);
  expect(r.body.rejected).toEqual([]);
}

async function open(role: keyof typeof DEMO_USERS, viewport: ViewportName): Promise<Person> {
  const p = await newPage(browser, viewport);
  contexts.push(p.context);
  await signIn(p.page, DEMO_USERS[role]);
  return p;
}

const planUrl = () => `${baseUrl()}/events/${eventId}/plan`;
const box = async (page: Page, id: string) => (await byTestId(page, id).boundingBox())!;

/** The ranked candidates of every antenna as the screen lists them (title and summary of each row). */
async function rankedRows(page: Page): Promise<Record<string, string[]>> {
  const out: Record<string, string[]> = {};
  for (const key of needKeys) {
    await byTestId(page, `candidates-need-${key}`).click();
    await byTestId(page, 'candidate-0').waitFor();
    out[key] = await page.locator('[data-testid^="candidate-"]').evaluateAll((els) =>
      els.filter((e) => /^candidate-\d+$/.test(e.getAttribute('data-testid') ?? '')).map((e) => (e.textContent ?? '').trim()),
    );
  }
  return out;
}

beforeAll(async () => {
  ({ token: leadToken, clubId } = await apiSignIn(DEMO_USERS.lead, DEMO_PASSWORD));
  const sites = await api<{ id: string; name: string }[]>(`/api/clubs/${clubId}/sites`, { token: leadToken });
  const siteId = sites.body.find((s) => s.name === DEMO_SITE)!.id;
  // Dated before the demo outing, so a list of the club's events still starts with the demo one.
  const made = await api<{ id: string }>(`/api/clubs/${clubId}/events`, { token: leadToken, json: { siteId, name: `Compare and print check ${deviceId.slice(-4)}`, startsOn: '2026-12-19', endsOn: '2026-12-19', notes: '' } });
  expect(made.status).toBe(201);
  eventId = made.body.id;
  await push([
    { collection: 'stations', recordId: stationIds.low, fields: { eventId, name: 'Low band check', bands: ['40m'], mode: 'ssb', powerW: 100, purpose: 'regional', crewMemberIds: [], notes: '' } },
    { collection: 'stations', recordId: stationIds.high, fields: { eventId, name: 'High band check', bands: ['20m', '15m'], mode: 'cw', powerW: 100, purpose: 'long-distance', crewMemberIds: [], notes: '' } },
  ]);
  browser = await launchBrowser();
});

afterAll(async () => {
  for (const c of contexts) await c.close();
  await browser?.close();
  if (!eventId) return;
  // Leave the shared stack as it was: this event's spots and stations, then the event itself.
  const all = await pullAll(leadToken, clubId);
  const spots = all.filter((r) => r.collection === 'antennaSpots' && r.deletedAt === null && r.fields.eventId === eventId);
  await push([...spots.map((s) => ({ collection: 'antennaSpots', recordId: s.id, op: 'delete' as const })), ...Object.values(stationIds).map((id) => ({ collection: 'stations', recordId: id, op: 'delete' as const }))]);
  await api(`/api/clubs/${clubId}/events/${eventId}`, { method: 'DELETE', token: leadToken });
});

describe('compare, print and the main-thread fallback on an event of its own', { timeout: 600_000 }, () => {
  let workerRows: Record<string, string[]>;

  it('(a) a wide screen compares two, then three candidates side by side, each with its own pattern pictures and clearances', async () => {
    const { page, errors } = await open('lead', 'wide');
    const workerLoaded = page.waitForRequest((r) => r.url().endsWith('/plan-worker.js'), { timeout: 60_000 });
    await page.goto(planUrl());
    await byTestId(page, 'candidate-0').waitFor({ timeout: 90_000 });
    await workerLoaded;
    expect(await byTestId(page, 'plan-main-thread').count()).toBe(0);
    workerRows = await rankedRows(page);
    for (const key of needKeys) expect(workerRows[key]!.length, key).toBeGreaterThanOrEqual(3);

    await byTestId(page, `candidates-need-${needKeys[0]}`).click();
    // Each row's title names its supports (say "1. Big bur oak – Lone hackberry" or "2. Inverted-V at Centre mast spot").
    const supportLabels = (await pullAll(leadToken, clubId)).filter((r) => r.collection === 'supports' && r.deletedAt === null).map((r) => r.fields.label as string);
    const titles = await Promise.all([0, 1, 2, 3].map(async (i) => (await byTestId(page, `candidate-${i}`).locator('div[dir="auto"]').first().textContent())!));
    await byTestId(page, 'candidate-compare-0').click();
    await byTestId(page, 'candidate-compare-1').click();
    await expect.poll(() => byTestId(page, 'plan-detail').textContent()).toContain('Comparing 2 spots');
    const checkPanels = async (n: number) => {
      const boxes = [];
      for (let i = 0; i < n; i++) {
        const id = `plan-candidate-${i}`;
        await byTestId(page, `${id}-pattern-elevation`).waitFor();
        await byTestId(page, `${id}-pattern-azimuth`).waitFor();
        expect(await byTestId(page, `${id}-clearances`).textContent(), id).toMatch(/\S/);
        await byTestId(page, `${id}-cautions`).waitFor();
        boxes.push(await box(page, id));
        // Each picture sits inside its own panel (scaled to the column, not spilling into the next one).
        for (const pic of ['elevation', 'azimuth']) {
          const b = await box(page, `${id}-pattern-${pic}`);
          expect(b.x, `${id} ${pic}`).toBeGreaterThanOrEqual(boxes[i]!.x - 1);
          expect(b.x + b.width, `${id} ${pic}`).toBeLessThanOrEqual(boxes[i]!.x + boxes[i]!.width + 1);
        }
      }
      for (let i = 1; i < n; i++) {
        expect(Math.abs(boxes[i]!.y - boxes[0]!.y), 'same top').toBeLessThanOrEqual(4);
        expect(boxes[i]!.x).toBeGreaterThanOrEqual(boxes[i - 1]!.x + boxes[i - 1]!.width);
      }
      expect(await byTestId(page, `plan-candidate-${n}`).count()).toBe(0);
      // Each panel is its own candidate (no two panels alike).
      const texts = await Promise.all(Array.from({ length: n }, async (_, i) => (await byTestId(page, `plan-candidate-${i}`).textContent())!));
      expect(new Set(texts).size).toBe(n);
      return texts;
    };
    const two = await checkPanels(2);
    expect(two).toHaveLength(2);
    await byTestId(page, 'candidate-compare-2').click();
    await expect.poll(() => byTestId(page, 'plan-detail').textContent()).toContain('Comparing 3 spots');
    const three = await checkPanels(3);
    // The panels are the picked candidates in the order picked: each panel's title names its candidate's supports.
    for (let i = 0; i < 3; i++) {
      const supports = supportLabels.filter((l) => titles[i]!.includes(l));
      expect(supports.length, titles[i]).toBeGreaterThan(0);
      for (const w of supports) expect(three[i], `panel ${i}`).toContain(w);
    }
    await byTestId(page, 'plan-detail').evaluate((el) => el.scrollIntoView({ block: 'start' }));
    await screenshot(page, 'plan-compare-three', 'wide');
    await byTestId(page, 'plan-candidate-0-pattern').evaluate((el) => el.scrollIntoView({ block: 'start' }));
    await screenshot(page, 'plan-compare-three-pictures', 'wide');
    // A fourth pick keeps the three latest: the first drops out and the others move up.
    await byTestId(page, 'candidate-compare-3').click();
    await expect.poll(() => byTestId(page, 'plan-candidate-0').textContent()).toBe(three[1]);
    expect(await byTestId(page, 'plan-candidate-1').textContent()).toBe(three[2]);
    expect(three).not.toContain(await byTestId(page, 'plan-candidate-2').textContent());
    expect(await byTestId(page, 'plan-candidate-3').count()).toBe(0);
    expect(errors).toEqual([]);
  });

  it('(a) a phone has no compare buttons and shows one candidate at a time', async () => {
    const { page, errors } = await open('lead', 'phone');
    await page.goto(planUrl());
    await byTestId(page, 'candidate-0').waitFor({ timeout: 90_000 });
    expect(await page.locator('[data-testid^="candidate-compare-"]').count()).toBe(0);
    await byTestId(page, 'candidate-0').click();
    await byTestId(page, 'plan-candidate-0-pattern-elevation').waitFor();
    const first = await byTestId(page, 'plan-candidate-0').textContent();
    await byTestId(page, 'candidate-1').click();
    await expect.poll(() => byTestId(page, 'plan-candidate-0').textContent()).not.toBe(first);
    expect(await byTestId(page, 'plan-candidate-1').count()).toBe(0);
    expect(await byTestId(page, 'plan-detail').textContent()).not.toContain('Comparing');
    await byTestId(page, 'plan-candidate-0').evaluate((el) => el.scrollIntoView({ block: 'start' }));
    await screenshot(page, 'plan-one-candidate', 'phone');
    expect(errors).toEqual([]);
  });

  it('(c) with window.Worker removed the plan computes on the main thread, says so, and ranks the same candidates', async () => {
    const p = await open('lead', 'wide');
    await p.context.addInitScript(() => Object.defineProperty(window, 'Worker', { value: undefined, configurable: true, writable: true }));
    let workerRequests = 0;
    p.page.on('request', (r) => { if (r.url().endsWith('/plan-worker.js')) workerRequests++; });
    await p.page.goto(planUrl());
    await byTestId(p.page, 'candidate-0').waitFor({ timeout: 90_000 });
    await byTestId(p.page, 'plan-main-thread').waitFor();
    expect(await byTestId(p.page, 'plan-main-thread').textContent()).toMatch(/not in the background/);
    expect(await rankedRows(p.page)).toEqual(workerRows);
    expect(workerRequests).toBe(0);
    await byTestId(p.page, 'plan-main-thread').evaluate((el) => el.scrollIntoView({ block: 'center' }));
    await screenshot(p.page, 'plan-main-thread', 'wide');
    expect(p.errors).toEqual([]);
  });

  it('(c) with /plan-worker.js answering 404 the plan falls back to the main thread with the same ranked candidates', async () => {
    // Its own context with the service worker blocked, so the 404 below is what the page's Worker receives.
    const context = await browser.newContext({ viewport: VIEWPORTS.wide, deviceScaleFactor: 1, locale: 'en-US', timezoneId: 'UTC', serviceWorkers: 'block' });
    contexts.push(context);
    let refused = 0;
    await context.route('**/plan-worker.js', (route) => { refused++; return route.fulfill({ status: 404, contentType: 'text/plain', body: 'not here' }); });
    const page = await context.newPage();
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(e.message));
    await signIn(page, DEMO_USERS.lead);
    await page.goto(planUrl());
    await byTestId(page, 'candidate-0').waitFor({ timeout: 90_000 });
    await byTestId(page, 'plan-main-thread').waitFor();
    expect(refused).toBeGreaterThan(0);
    expect(await rankedRows(page)).toEqual(workerRows);
    expect(errors).toEqual([]);
  });

  it('(b) the printed sheets: one PDF page per cleared antenna, no navigation, the cautions on every sheet', async () => {
    // The lead assigns all three antennas and sends them for review; the safety officer accepts every result.
    const lead = await open('lead', 'wide');
    await lead.page.goto(planUrl());
    await byTestId(lead.page, 'candidate-0').waitFor({ timeout: 90_000 });
    await byTestId(lead.page, 'plan-assign-all').click();
    await until('three assignments', async () => (await lead.page.locator('[data-testid^="assignment-send-"]').count()) === 3);
    for (let i = 0; i < 20; i++) {
      const send = lead.page.locator('[data-testid^="assignment-send-"]');
      if ((await send.count()) === 0) break;
      await send.first().click();
      await lead.page.waitForTimeout(300);
    }
    const spots = await until('three spots waiting for review', async () => {
      const s = (await pullAll(leadToken, clubId)).filter((r) => r.collection === 'antennaSpots' && r.deletedAt === null && r.fields.eventId === eventId);
      return s.length === 3 && s.every((x) => x.fields.state === 'waiting-review') && s;
    });
    const safety = await open('safety', 'wide');
    await safety.page.goto(`${baseUrl()}/events/${eventId}/review`);
    await byTestId(safety.page, 'review-screen').waitFor();
    await safety.page.locator('[data-testid^="review-result-"][data-testid$="-accept"]').first().waitFor({ timeout: 60_000 });
    for (let i = 0; i < 60; i++) {
      const accept = safety.page.locator('[data-testid^="review-result-"][data-testid$="-accept"]').first();
      if ((await accept.count()) === 0) break;
      const id = (await accept.getAttribute('data-testid'))!.replace(/-accept$/, '');
      const reason = byTestId(safety.page, `${id}-reason`);
      if ((await reason.count()) && !(await reason.inputValue())) await reason.fill('Walked the spot with the lead; ropes and keep-out flagged');
      await accept.click();
      await safety.page.waitForTimeout(150);
    }
    // Cleared to raise is worked out from the decisions (shared/review), as every screen shows it.
    await until('three spots cleared to raise', async () => (await safety.page.locator('[data-testid^="review-state-"]', { hasText: 'Cleared to raise' }).count()) === 3);
    await screenshot(safety.page, 'review-compare-event-cleared', 'wide');

    for (const who of [{ role: 'lead' as const, viewport: 'wide' as const }, { role: 'crew' as const, viewport: 'phone' as const }]) {
      const { page, errors } = who.role === 'lead' ? lead : await open(who.role, who.viewport);
      await page.goto(`${baseUrl()}/events/${eventId}/sheets`);
      await until('three sheets listed', async () => (await page.locator('[data-testid^="sheets-open-"]').count()) === 3);
      await page.emulateMedia({ media: 'print' });
      // Under print: the navigation, the list and the buttons are gone; each cleared antenna is a sheet with its cautions.
      for (const chrome of ['side-nav', 'bottom-bar', 'phone-header', 'sheets-print']) expect(await byTestId(page, chrome).isVisible(), `${who.role}: ${chrome}`).toBe(false);
      expect(await page.locator('[data-testid^="sheets-open-"]').first().isVisible()).toBe(false);
      const sheets = page.locator('[data-sheet="page"]');
      expect(await sheets.count()).toBe(3);
      for (const s of spots) {
        const sheet = byTestId(page, `sheet-${s.id}`);
        expect(await sheet.isVisible(), `sheet ${s.id}`).toBe(true);
        const cautions = byTestId(page, `sheet-cautions-${s.id}`);
        expect(await cautions.isVisible()).toBe(true);
        // The cautions of every clearance figure (common2.md "Safety"): energised lines, planning estimates, who decides.
        expect(await cautions.textContent()).toMatch(/energi[sz]ed/i);
        expect(await sheet.locator('[data-testid="sheet-wire"]').isVisible()).toBe(true);
      }
      const pdf = await page.pdf({ format: 'Letter', printBackground: true });
      // Page objects of the PDF ("/Type /Pages" is the page tree, not a page).
      const pages = pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? [];
      expect(pages.length, `${who.role} PDF pages`).toBe(3);
      // The whole printed layout as one picture, to look at (tests/.artifacts/screenshots).
      await page.screenshot({ path: path.join(SCREENSHOT_DIR, `sheets-print-all-${who.viewport}.png`), fullPage: true });
      await page.emulateMedia({ media: 'screen' });
      expect(errors).toEqual([]);
    }
  });
});
