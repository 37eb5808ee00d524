import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PROTOCOL_VERSION, SCHEMA_VERSION, encodeHlc } from '../../sync/protocol';
import { api, apiSignIn } from './helpers/api';
import { byTestId, browserForFile, newPage, screenshot } from './helpers/browser';
import { DEMO_PASSWORD, DEMO_USERS } from './helpers/demo-users';
import { waitForMail } from './helpers/mailbox';
import { goToNav, signIn } from './helpers/session';

/*
 * Review e-mails on the whole stack (pg-boss queue, worker, fake mailbox) and the settings switches in Chromium:
 * a spot the lead sends to review reaches the safety officer's mailbox with the review link; a crew member turns
 * "Antenna sheets ready" off in Settings and the server keeps it.
 */

const browser = browserForFile(beforeAll, afterAll);

async function pushAs(token: string, clubId: string, deviceId: string, changes: { collection: string; recordId: string; op?: string; fields?: object }[], first: number) {
  const now = Date.now();
  const mutations = changes.map((c, i) => ({
    mutationId: first + i,
    collection: c.collection,
    recordId: c.recordId,
    op: c.op ?? 'upsert',
    fields: c.fields ?? {},
    baseClocks: {},
    clock: encodeHlc({ wallMs: now, counter: i, node: deviceId }),
  }));
  const r = await api<{ type: string; rejected: unknown[] }>(`/api/clubs/${clubId}/sync/push`, {
    token,
    json: { type: 'push', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, deviceId, mutations },
  });
  expect(r.status).toBe(200);
  expect(r.body.rejected).toEqual([]);
}

describe('review e-mails', () => {
  it('a spot sent to review arrives in the safety officer’s mailbox with the review link (then the test removes its records)', async () => {
    const { token, clubId } = await apiSignIn(DEMO_USERS.lead, DEMO_PASSWORD);
    const deviceId = `e2e-notify-${randomUUID().slice(0, 8)}`;
    const ids = { site: randomUUID(), event: randomUUID(), station: randomUUID(), spot: randomUUID() };
    const eventName = `Notification check ${ids.event.slice(0, 6)}`;
    await pushAs(token, clubId, deviceId, [
      { collection: 'sites', recordId: ids.site, fields: { name: 'Notification test field', refLat: 44.93, refLon: -92.87, notes: '' } },
      { collection: 'events', recordId: ids.event, fields: { siteId: ids.site, name: eventName, startsOn: '2026-12-19', endsOn: '2026-12-19', notes: '' } },
      { collection: 'stations', recordId: ids.station, fields: { eventId: ids.event, name: 'CW station', bands: ['40m'], mode: 'cw', powerW: 100, purpose: 'long-distance', notes: '' } },
      {
        collection: 'antennaSpots',
        recordId: ids.spot,
        fields: { eventId: ids.event, stationId: ids.station, band: '40m', shape: 'inverted-v', supportIds: [randomUUID()], state: 'waiting-review', notes: '' },
      },
    ], 1);
    try {
      const mail = await waitForMail(DEMO_USERS.safety, new RegExp(`waiting for your review · ${eventName}`));
      expect(mail.text).toContain('40m inverted-V dipole for CW station');
      expect(mail.text).toMatch(new RegExp(`https?://[^\\s]+/events/${ids.event}/review`));
    } finally {
      await pushAs(token, clubId, deviceId, [
        { collection: 'antennaSpots', recordId: ids.spot, op: 'delete' },
        { collection: 'stations', recordId: ids.station, op: 'delete' },
        { collection: 'events', recordId: ids.event, op: 'delete' },
        { collection: 'sites', recordId: ids.site, op: 'delete' },
      ], 5);
    }
  });

  it('a crew member turns "Antenna sheets ready" off in Settings at phone size; it stays off after a reload and on the server', async () => {
    const { context, page, errors } = await newPage(browser(), 'phone');
    const { token, clubId } = await apiSignIn(DEMO_USERS.crew, DEMO_PASSWORD);
    try {
      await signIn(page, DEMO_USERS.crew);
      await goToNav(page, 'settings');
      const toggle = byTestId(page, 'settings-notifications-sheetReady');
      await toggle.waitFor();
      expect(await byTestId(page, 'settings-notifications-reviewWaiting').count(), 'a crew member sees only the kinds a crew receives').toBe(0);
      const input = page.getByRole('switch', { name: 'E-mail me: Antenna sheets ready' });
      expect(await input.isChecked()).toBe(true);
      await input.click();
      await expect.poll(async () => (await api<{ settings: { sheetReady: boolean } }>(`/api/clubs/${clubId}/notification-settings`, { token })).body.settings.sheetReady).toBe(false);
      await screenshot(page, 'settings-notifications-crew', 'phone');
      await page.reload();
      await byTestId(page, 'settings-notifications-sheetReady').waitFor();
      await expect.poll(() => page.getByRole('switch', { name: 'E-mail me: Antenna sheets ready' }).isChecked()).toBe(false);
      expect(errors).toEqual([]);
    } finally {
      // Leave the demo crew member as they were: other suites wait for their sheet e-mails.
      await api(`/api/clubs/${clubId}/notification-settings`, { method: 'PUT', token, json: { reviewWaiting: true, spotSentBack: true, spotCleared: true, sheetReady: true } });
      await context.close();
    }
  });
});
