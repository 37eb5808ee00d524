// The scout's day with no signal, in Chromium (playwright-core): open the app once online, go offline, make 50
// edits and attach 5 photos, close the page, reopen it still offline (the service worker serves the app shell),
// go online, and find all 50 edits and the 5 photos, byte-identical, on the server.
// The edits and photos go through the app's own sync client and photo queue (useMutate, useAttachPhoto) via the
// test-build hook in components/offline/e2e-hooks.tsx; the screens themselves are covered by tests/e2e/scout-*.
import { createHash } from 'node:crypto';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
// Brings in the type of window.__loftlineE2E, the test-build hook the page exposes.
import type {} from '../../components/offline/e2e-api';
import { api, pullAll, until } from './helpers/api';
import { launchBrowser, newPage, screenshot } from './helpers/browser';
import { DEMO_PASSWORD, DEMO_SITE, DEMO_USERS } from './helpers/demo-users';
import { baseUrl, signIn } from './helpers/session';

const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');

describe('offline: a scout works with no network, the app reopens from the service worker, everything syncs', () => {
  let browser: Browser;
  let context: BrowserContext;
  let page: Page;
  let token: string;
  let clubId: string;
  let siteId: string;
  let site: { refLat: number; refLon: number };

  beforeAll(async () => {
    const signedIn = await api<{ accessToken: string }>('/api/auth/sign-in', { json: { email: DEMO_USERS.scout, password: DEMO_PASSWORD } });
    token = signedIn.body.accessToken;
    const me = await api<{ clubs: { id: string }[] }>('/api/me', { token });
    clubId = me.body.clubs[0]!.id;
    const sites = await api<{ id: string; name: string; refLat: number; refLon: number }[]>(`/api/clubs/${clubId}/sites`, { token });
    const demo = sites.body.find((s) => s.name === DEMO_SITE)!;
    siteId = demo.id;
    site = demo;
    browser = await launchBrowser();
    ({ context, page } = await newPage(browser, 'phone'));
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('50 edits and 5 photos made offline survive closing the page and reach the server byte-identical', { timeout: 300_000 }, async () => {
    // Online, once: sign in, open the survey, and let the service worker install and take control.
    await signIn(page, DEMO_USERS.scout);
    await page.goto(`${baseUrl()}/sites/${siteId}/survey`);
    await page.waitForFunction(() => navigator.serviceWorker?.controller != null, null, { timeout: 120_000 });
    await page.waitForFunction(() => globalThis.__loftlineE2E !== undefined, null, { timeout: 60_000 });

    await context.setOffline(true);
    const apiReachable = await page.evaluate(() => fetch('/api/health').then(() => true, () => false));
    expect(apiReachable, 'the page must really be offline (including requests through the service worker)').toBe(false);

    // 10 new supports and 4 edits of each, every edit a different field: 50 edits.
    const made = await page.evaluate(
      async ({ siteId: sid, lat, lon }) => {
        const h = globalThis.__loftlineE2E!;
        const ids: string[] = [];
        for (let i = 0; i < 10; i++) {
          ids.push(await h.create('supports', { siteId: sid, kind: 'tree', label: `Offline tree ${i}`, lat: lat + i * 0.0001, lon: lon + i * 0.0001 }));
        }
        for (const [i, id] of ids.entries()) {
          await h.update('supports', id, { heightM: 10 + i });
          await h.update('supports', id, { notes: `limb at ${8 + i} m looks sound` });
          await h.update('supports', id, { condition: `checked offline, edit ${i}` });
          await h.update('supports', id, { species: i % 2 ? 'oak' : 'ash' });
        }
        return ids;
      },
      { siteId, lat: site.refLat, lon: site.refLon },
    );
    expect(made).toHaveLength(10);

    // Five real JPEGs drawn in the page (canvas), attached to the first five supports.
    const photos = await page.evaluate(async ({ ids, siteId: sid }) => {
      const out: { base64: string; recordId: string }[] = [];
      for (let i = 0; i < 5; i++) {
        const canvas = document.createElement('canvas');
        canvas.width = 320;
        canvas.height = 240;
        const ctx = canvas.getContext('2d')!;
        ctx.fillStyle = `hsl(${i * 60}, 60%, 45%)`;
        ctx.fillRect(0, 0, 320, 240);
        ctx.fillStyle = '#fff';
        ctx.font = '40px sans-serif';
        ctx.fillText(`tree ${i}`, 40, 130);
        const blob: Blob = await new Promise((ok) => canvas.toBlob((b) => ok(b!), 'image/jpeg', 0.9));
        const bytes = new Uint8Array(await blob.arrayBuffer());
        let s = '';
        for (const b of bytes) s += String.fromCharCode(b);
        const base64 = btoa(s);
        const recordId = await globalThis.__loftlineE2E!.attachPhoto({ siteId: sid, subjectCollection: 'supports', subjectId: ids[i]! }, base64, 'image/jpeg');
        out.push({ base64, recordId });
      }
      return out;
    }, { ids: made, siteId });
    expect(photos).toHaveLength(5);
    expect(await page.evaluate(() => globalThis.__loftlineE2E!.photosWaiting())).toBe(5);

    // Close the page and reopen the app, still offline: the service worker serves it.
    await page.close();
    page = await context.newPage();
    const reopened = await page.goto(`${baseUrl()}/sites/${siteId}/survey`);
    expect(reopened?.status()).toBe(200);
    expect(reopened?.fromServiceWorker()).toBe(true);
    await page.waitForFunction(() => globalThis.__loftlineE2E !== undefined, null, { timeout: 60_000 });
    await page.waitForFunction(() => globalThis.__loftlineE2E!.records('supports').length >= 10, null, { timeout: 30_000 });
    expect(await page.evaluate(() => globalThis.__loftlineE2E!.photosWaiting())).toBe(5);
    await screenshot(page, 'offline-reopened', 'phone');
    // Nothing reached the server while offline.
    const before = await pullAll(token, clubId);
    expect(before.filter((r) => made.includes(r.id))).toHaveLength(0);

    // Back online: the sync engine pushes the outbox and the photo queue uploads.
    await context.setOffline(false);
    const wanted = new Set(made);
    const synced = await until('all 10 supports with all 4 edits on the server', async () => {
      const all = await pullAll(token, clubId);
      const ours = all.filter((r) => r.collection === 'supports' && wanted.has(r.id));
      return ours.length === 10 && ours.every((r) => r.fields.species && r.fields.condition && r.fields.notes && r.fields.heightM) ? all : null;
    });
    for (const [i, id] of made.entries()) {
      expect(synced.find((r) => r.id === id)?.fields).toMatchObject({
        label: `Offline tree ${i}`,
        heightM: 10 + i,
        notes: `limb at ${8 + i} m looks sound`,
        condition: `checked offline, edit ${i}`,
        species: i % 2 ? 'oak' : 'ash',
      });
    }
    for (const p of photos) {
      const bytes = Buffer.from(p.base64, 'base64');
      const record = synced.find((r) => r.id === p.recordId);
      expect(record?.fields).toMatchObject({ sha256: sha(bytes), bytes: bytes.length, mimeType: 'image/jpeg' });
      const stored = await until(`photo ${sha(bytes).slice(0, 8)} on the server`, async () => {
        const r = await fetch(`${baseUrl()}/api/clubs/${clubId}/photos/${sha(bytes)}`, { headers: { authorization: `Bearer ${token}` } });
        return r.status === 200 ? Buffer.from(await r.arrayBuffer()) : null;
      });
      expect(sha(stored)).toBe(sha(bytes));
      expect(stored.equals(bytes)).toBe(true);
    }
    await until('the photo queue to empty', async () => (await page.evaluate(() => globalThis.__loftlineE2E!.photosWaiting())) === 0);
  });
});
