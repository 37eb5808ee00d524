// startStack end to end: a private cluster in the data folder, migrations, the demo scenario on first start only,
// and a second start on the same folder that keeps everything (issue 2: "a second start reuses the data").
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { DEMO_CLUB, DEMO_EVENT_NAME, DEMO_PASSWORD, DEMO_USERS } from '../../server/src/dev/demo-scenario';
import { startStack, type Stack } from '../../server/src/dev/stack';

const dataDir = mkdtempSync(join(tmpdir(), 'loftline-stack-test-'));
chmodSync(dataDir, 0o755); // mkdtemp makes it 0700: the postgres OS user could not enter it
const env = { LOG_LEVEL: 'silent' };
let stack: Stack | null = null;

async function json(url: string, init: RequestInit = {}) {
  const res = await fetch(url, { ...init, headers: { 'content-type': 'application/json', ...(init.headers ?? {}) } });
  return { status: res.status, body: await res.json() };
}

async function signIn(base: string, email: string, password = DEMO_PASSWORD) {
  const r = await json(`${base}/api/auth/sign-in`, { method: 'POST', body: JSON.stringify({ email, password }) });
  expect(r.status, `${email} signs in`).toBe(200);
  return { authorization: `Bearer ${r.body.accessToken}` };
}

describe('startStack', () => {
  afterAll(async () => {
    await stack?.stop();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('first start: migrates, seeds the demo club with one user per role, site, event and survey', async () => {
    stack = await startStack({ dataDir, port: 0, host: '127.0.0.1', seedDemo: true, mail: 'fake', env });
    expect(stack.migrated.length).toBeGreaterThan(0);
    expect(stack.demo?.created).toBe(true);
    expect(stack.mailboxDir).toBe(join(dataDir, 'mailbox'));
    expect((await json(`${stack.url}/api/health`)).body).toEqual({ ok: true, db: 'up' });

    for (const u of DEMO_USERS) {
      const me = await json(`${stack.url}/api/me`, { headers: await signIn(stack.url, u.email) });
      expect(me.body.clubs).toEqual([expect.objectContaining({ name: DEMO_CLUB.name, callSign: DEMO_CLUB.callSign, role: u.role })]);
    }
    const counts = await stack.deps.dataSource.query(
      `SELECT (SELECT count(*) FROM supports WHERE kind = 'tree') AS trees, (SELECT count(*) FROM supports WHERE kind = 'mast') AS masts,
              (SELECT count(*) FROM hazards WHERE kind = 'power-line' AND voltage_kv = 12.47 AND jsonb_array_length(points) = 3) AS lines,
              (SELECT count(*) FROM operating_positions) AS positions, (SELECT count(*) FROM events WHERE name = $1) AS events`,
      [DEMO_EVENT_NAME],
    );
    expect(counts[0]).toEqual({ trees: 9, masts: 2, lines: 1, positions: 2, events: 1 });
    const [event] = await stack.deps.dataSource.query('SELECT starts_on FROM events');
    expect(event.starts_on > new Date().toISOString().slice(0, 10)).toBe(true);
  });

  it('a second start on the same data folder keeps the data and does not seed again', async () => {
    const headers = await signIn(stack!.url, 'lead@kestrel.test');
    const clubId = stack!.demo!.clubId;
    const made = await json(`${stack!.url}/api/clubs/${clubId}/sites`, {
      method: 'POST',
      headers,
      body: JSON.stringify({ name: 'Second meadow', refLat: 38.9, refLon: -97.6 }),
    });
    expect(made.status).toBe(201);
    await stack!.stop();
    stack = null;

    stack = await startStack({ dataDir, port: 0, host: '127.0.0.1', seedDemo: true, mail: 'fake', env });
    expect(stack.migrated).toEqual([]);
    expect(stack.demo).toBeNull();
    const sites = await json(`${stack.url}/api/clubs/${clubId}/sites`, { headers: await signIn(stack.url, 'lead@kestrel.test') });
    expect(sites.body.map((s: { name: string }) => s.name).sort()).toEqual(['Alder Bend Meadows', 'Second meadow']);
    const [{ n }] = await stack.deps.dataSource.query('SELECT count(*)::int AS n FROM users');
    expect(n).toBe(DEMO_USERS.length);
  });

  it('the forgot-password mail goes through the queue into the fake mailbox', async () => {
    const r = await json(`${stack!.url}/api/auth/forgot-password`, { method: 'POST', body: JSON.stringify({ email: 'scout@kestrel.test' }) });
    expect(r.status).toBe(202);
    let found: { subject: string; text: string } | undefined;
    for (let i = 0; i < 60 && !found; i++) {
      const box = await json(`${stack!.url}/api/dev/mailbox?to=scout@kestrel.test`);
      found = Array.isArray(box.body) ? box.body[0] : box.body.messages?.[0];
      if (!found) await new Promise((ok) => setTimeout(ok, 250));
    }
    expect(found?.subject).toMatch(/reset/i);
  });
});
