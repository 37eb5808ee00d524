import { inject } from 'vitest';
import { PROTOCOL_VERSION, SCHEMA_VERSION } from '../../../sync/protocol';

/* Talking to the server from a browser test, the way a second device would: REST and the sync pull route. */

const baseUrl = (): string => inject('baseUrl');

export async function api<T>(path: string, init: { method?: string; token?: string; json?: unknown } = {}): Promise<{ status: number; body: T }> {
  const res = await fetch(`${baseUrl()}${path}`, {
    method: init.method ?? (init.json === undefined ? 'GET' : 'POST'),
    headers: { ...(init.json === undefined ? {} : { 'content-type': 'application/json' }), ...(init.token ? { authorization: `Bearer ${init.token}` } : {}) },
    body: init.json === undefined ? undefined : JSON.stringify(init.json),
  });
  const text = res.headers.get('content-type')?.includes('json') ? await res.text() : '';
  return { status: res.status, body: (text ? JSON.parse(text) : undefined) as T };
}

export type PulledRecord = { collection: string; id: string; fields: Record<string, unknown>; deletedAt: string | null };

/** Every record the server holds for the club, through the sync pull route (what any phone would receive). */
export async function pullAll(token: string, clubId: string): Promise<PulledRecord[]> {
  const out: PulledRecord[] = [];
  let cursor = '0';
  for (;;) {
    const r = await api<{ type: string; changes: PulledRecord[]; cursor: string; hasMore: boolean }>(`/api/clubs/${clubId}/sync/pull`, {
      token,
      json: { type: 'pull', protocolVersion: PROTOCOL_VERSION, schemaVersion: SCHEMA_VERSION, cursor, limit: 1000 },
    });
    if (r.status !== 200 || r.body.type !== 'changes') throw new Error(`pull failed: ${r.status} ${JSON.stringify(r.body)}`);
    out.push(...r.body.changes);
    cursor = r.body.cursor;
    if (!r.body.hasMore) return out;
  }
}

/** Poll `fn` until it gives a truthy value (the server catching up), or fail saying what was awaited. */
export async function until<T>(what: string, fn: () => Promise<T | null | undefined | false>, timeoutMs = 90_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  let last: unknown;
  while (Date.now() < end) {
    try {
      const v = await fn();
      if (v) return v;
    } catch (err) {
      last = err;
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  throw new Error(`timed out waiting for ${what}${last ? `: ${String(last)}` : ''}`);
}

/** Sign in over the API: the access token and the first club, for checking what reached the server. */
export async function apiSignIn(email: string, password: string): Promise<{ token: string; clubId: string }> {
  const signedIn = await api<{ accessToken: string }>('/api/auth/sign-in', { json: { email, password } });
  if (signedIn.status !== 200) throw new Error(`sign-in failed: ${signedIn.status}`);
  const me = await api<{ clubs: { id: string }[] }>('/api/me', { token: signedIn.body.accessToken });
  return { token: signedIn.body.accessToken, clubId: me.body.clubs[0]!.id };
}
