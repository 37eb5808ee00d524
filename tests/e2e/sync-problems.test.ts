import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PROTOCOL_VERSION, SCHEMA_VERSION, encodeHlc } from '../../sync/protocol';
import { api, apiSignIn, pullAll, until } from './helpers/api';
import { byTestId, browserForFile, newPage, screenshot } from './helpers/browser';
import { DEMO_PASSWORD, DEMO_SITE, DEMO_USERS } from './helpers/demo-users';
import { baseUrl, signIn } from './helpers/session';

/*
 * The "Changes to check" screen on the whole stack, on the demo club: the scout and the safety officer (both may
 * survey) record a tree's height at the same time on two devices; the lead sees both values with who recorded
 * them and the on-site caution, at phone and wide sizes, and picks "use the other value", which syncs to the
 * server as an ordinary change. A scout's refused push of a station (scouts lack plan.write, shared/schemas/roles.ts)
 * shows on the scout's screen and is dismissed. The test adds one support of its own and removes it afterwards.
 */

const browser = browserForFile(beforeAll, afterAll);

type Signed = { token: string; clubId: string };
let lead: Signed;
let scout: Signed;
let safety: Signed;
let siteId: string;
const supportId = randomUUID();
const label = `Sync-check ash ${supportId.slice(0, 4)}`;
const scoutDevice = `e2e-problems-scout-${supportId.slice(0, 8)}`;
const safetyDevice = `e2e-problems-safety-${supportId.slice(0, 8)}`;
let scoutNext = 1;

async function push(who: Signed, deviceId: string, mutations: object[]) {
  const r = await api<{ type: string; rejected: { code: string }[] }>(`/api/clubs/${who.clubId}/sync/push`, {
    token: who.token,
    json: { type: 'push', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, deviceId, mutations },
  });
  expect(r.status).toBe(200);
  return r.body;
}

beforeAll(async () => {
  lead = await apiSignIn(DEMO_USERS.lead, DEMO_PASSWORD);
  scout = await apiSignIn(DEMO_USERS.scout, DEMO_PASSWORD);
  safety = await apiSignIn(DEMO_USERS.safety, DEMO_PASSWORD);
  const sites = await api<{ id: string; name: string }[]>(`/api/clubs/${lead.clubId}/sites`, { token: lead.token });
  siteId = sites.body.find((s) => s.name === DEMO_SITE)!.id;
});

afterAll(async () => {
  // Remove the support this file added, whatever happened above.
  if (scout) await push(scout, scoutDevice, [{ mutationId: scoutNext++, collection: 'supports', recordId: supportId, op: 'delete', clock: encodeHlc({ wallMs: Date.now(), counter: 0, node: scoutDevice }) }]);
});

describe('values recorded twice', () => {
  it('the lead sees both heights with who and when and the caution (phone and wide), uses the other value, and the server then holds it', async () => {
    // The scout's tree at 12 m, then 14 m (later clock); the safety officer, who saw only the 12 m, records 11 m
    // (earlier clock). Merge rule (server/src/modules/sync/merge.ts): the later clock is kept, the other set aside.
    const t0 = Date.now() - 60_000;
    const created = encodeHlc({ wallMs: t0, counter: 0, node: scoutDevice });
    const first = await push(scout, scoutDevice, [
      { mutationId: scoutNext++, collection: 'supports', recordId: supportId, op: 'upsert', clock: created, fields: { siteId, kind: 'tree', label, lat: 44.93135, lon: -92.86655, heightM: 12 } },
      { mutationId: scoutNext++, collection: 'supports', recordId: supportId, op: 'upsert', clock: encodeHlc({ wallMs: t0 + 20_000, counter: 0, node: scoutDevice }), fields: { heightM: 14 }, baseClocks: { heightM: created } },
    ]);
    expect(first.rejected).toEqual([]);
    const second = await push(safety, safetyDevice, [
      { mutationId: 1, collection: 'supports', recordId: supportId, op: 'upsert', clock: encodeHlc({ wallMs: t0 + 10_000, counter: 0, node: safetyDevice }), fields: { heightM: 11 }, baseClocks: { heightM: created } },
    ]);
    expect(second.rejected).toEqual([]);
    const listed = await api<{ id: string; keptValue: number; otherValue: number }[]>(`/api/clubs/${lead.clubId}/sync/conflicts?recordId=${supportId}`, { token: lead.token });
    expect(listed.body).toHaveLength(1);
    expect(listed.body[0]).toMatchObject({ keptValue: 14, otherValue: 11 });
    const card = `conflict-${listed.body[0]!.id}`;

    // Phone: through the sync indicator's link.
    const phone = await newPage(browser(), 'phone');
    await signIn(phone.page, DEMO_USERS.lead);
    await byTestId(phone.page, 'sync-indicator').click();
    // The indicator tells the lead there are values recorded twice (other conflicts of the demo may add to the count).
    await expect.poll(() => byTestId(phone.page, 'sync-indicator-details').textContent(), { timeout: 30_000 }).toMatch(/recorded twice at once/);
    await byTestId(phone.page, 'sync-indicator-problems-link').click();
    await byTestId(phone.page, 'sync-problems-title').waitFor();
    const text = byTestId(phone.page, `${card}-text`);
    // The label comes from the lead's local copy of the support, so this also waits for the pull.
    // The people's names come from the member list, which may arrive after the conflicts.
    await until('the conflict to name the tree and both people', async () => { const t = (await text.textContent()) ?? ''; return t.includes(label) && t.includes('Tomas Ekberg'); }, 60_000);
    const sentence = (await text.textContent())!;
    expect(sentence).toMatch(new RegExp(`${label} height: kept 14\\.0 m \\(June Okafor.*, \\d\\d:\\d\\d.*\\); also recorded 11\\.0 m \\(Tomas Ekberg.*, \\d\\d:\\d\\d.*\\)`));
    expect(sentence).not.toMatch(/correct/i);
    expect(await byTestId(phone.page, `${card}-caution`).textContent()).toMatch(/Both values must be checked on site.*not the correct one.*Treat every power line as energised/);
    await screenshot(phone.page, 'sync-problems-lead', 'phone');
    expect(phone.errors).toEqual([]);
    await phone.context.close();

    // Wide: straight to the route; the lead settles it there.
    const wide = await newPage(browser(), 'wide');
    await signIn(wide.page, DEMO_USERS.lead);
    await wide.page.goto(`${baseUrl()}/sync-problems`);
    await until('the conflict to name the tree', async () => (await byTestId(wide.page, `${card}-text`).textContent().catch(() => ''))?.includes(label) ?? false, 60_000);
    await byTestId(wide.page, `${card}-note`).fill('Measured again from 25 m with the clinometer: 11 m.');
    await screenshot(wide.page, 'sync-problems-lead', 'wide');
    await byTestId(wide.page, `${card}-use-other`).click();
    await byTestId(wide.page, card).waitFor({ state: 'detached', timeout: 30_000 });
    const onServer = await until('the other value to reach the server', async () => {
      const s = (await pullAll(lead.token, lead.clubId)).find((r) => r.collection === 'supports' && r.id === supportId);
      return s?.fields.heightM === 11 ? s : null;
    }, 60_000);
    expect(onServer.fields.heightM).toBe(11);
    const all = await api<{ id: string; choice: string; note: string; resolvedBy: string }[]>(`/api/clubs/${lead.clubId}/sync/conflicts?recordId=${supportId}&open=false`, { token: lead.token });
    expect(all.body.find((c) => c.id === listed.body[0]!.id)).toMatchObject({ choice: 'other', note: 'Measured again from 25 m with the clinometer: 11 m.' });
    const open = await api<unknown[]>(`/api/clubs/${lead.clubId}/sync/conflicts?recordId=${supportId}`, { token: lead.token });
    expect(open.body).toEqual([]);
    expect(wide.errors).toEqual([]);
    await wide.context.close();
  });
});

describe('refused changes', () => {
  it('a scout’s refused station push shows on the scout’s screen with the reason, and is dismissed', async () => {
    const stationId = randomUUID();
    const refused = await push(scout, scoutDevice, [
      {
        mutationId: scoutNext++, collection: 'stations', recordId: stationId, op: 'upsert', clock: encodeHlc({ wallMs: Date.now(), counter: 0, node: scoutDevice }),
        fields: { eventId: randomUUID(), name: 'Scout’s own 20m station', bands: ['20m'], mode: 'ssb', powerW: 100, purpose: 'long-distance' },
      },
    ]);
    expect(refused.rejected).toEqual([expect.objectContaining({ code: 'forbidden' })]);
    const mine = await api<{ id: string }[]>(`/api/clubs/${scout.clubId}/sync/rejected?recordId=${stationId}`, { token: scout.token });
    const card = `refused-${mine.body[0]!.id}`;

    const phone = await newPage(browser(), 'phone');
    await signIn(phone.page, DEMO_USERS.scout);
    await phone.page.goto(`${baseUrl()}/sync-problems`);
    await byTestId(phone.page, card).waitFor({ timeout: 30_000 });
    expect(await byTestId(phone.page, `${card}-reason`).textContent()).toMatch(/Your role in this club \(scout\) may not change stations/);
    expect(await byTestId(phone.page, `${card}-what`).textContent()).toContain('station “Scout’s own 20m station”');
    // A scout sees no conflict list: that is for the people who plan and check.
    expect(await byTestId(phone.page, 'sync-problems-conflicts').count()).toBe(0);
    await screenshot(phone.page, 'sync-problems-scout', 'phone');
    await byTestId(phone.page, `${card}-dismiss`).click();
    await byTestId(phone.page, card).waitFor({ state: 'detached' });
    const after = await api<{ id: string }[]>(`/api/clubs/${scout.clubId}/sync/rejected`, { token: scout.token });
    expect(after.body.map((r) => r.id)).not.toContain(mine.body[0]!.id);
    expect(phone.errors).toEqual([]);
    await phone.context.close();
  });
});
