import type { z } from 'zod';
import { pullResponseSchema, pushResponseSchema, TransportError, type SyncTransport } from '../protocol';

/*
 * The sync transport over HTTP: the only file in sync/ that calls fetch. The bearer token comes from an injected
 * provider (the app's session); on 401 it is asked once for a fresh token before giving up.
 */

export interface FetchTransportOptions {
  /** Origin of the server ('' for the same origin as the app). */
  baseUrl: string;
  clubId: string;
  getAccessToken: (opts: { refresh: boolean }) => Promise<string | null>;
  fetch?: typeof fetch;
}

export function createFetchTransport(opts: FetchTransportOptions): SyncTransport {
  const doFetch = opts.fetch ?? ((input: RequestInfo | URL, init?: RequestInit) => globalThis.fetch(input, init));
  const url = (what: 'push' | 'pull') => `${opts.baseUrl}/api/clubs/${encodeURIComponent(opts.clubId)}/sync/${what}`;

  async function post<T>(what: 'push' | 'pull', body: unknown, schema: z.ZodType<T>): Promise<T> {
    const send = async (refresh: boolean) => {
      const token = await opts.getAccessToken({ refresh });
      if (!token) throw new TransportError('unauthorized', 'not signed in');
      try {
        return await doFetch(url(what), {
          method: 'POST',
          headers: { 'content-type': 'application/json', authorization: `Bearer ${token}` },
          body: JSON.stringify(body),
        });
      } catch (err) {
        throw new TransportError('offline', err instanceof Error ? err.message : 'network request failed');
      }
    };
    let res = await send(false);
    if (res.status === 401) res = await send(true);
    if (res.status === 401) throw new TransportError('unauthorized', 'the server did not accept the sign-in', 401);
    if (res.status === 403 || res.status === 404) throw new TransportError('forbidden', 'not a member of this club', res.status);
    if (res.status >= 500) throw new TransportError('server', `server error ${res.status}`, res.status);
    let json: unknown;
    try {
      json = await res.json();
    } catch {
      throw new TransportError(res.ok ? 'bad-response' : 'server', `unreadable answer (HTTP ${res.status})`, res.status);
    }
    if (!res.ok) {
      const message = (json as { message?: unknown } | null)?.message;
      throw new TransportError('bad-request', typeof message === 'string' ? message : `HTTP ${res.status}`, res.status);
    }
    const parsed = schema.safeParse(json);
    if (!parsed.success) throw new TransportError('bad-response', `the server's answer does not follow the sync protocol: ${parsed.error.issues[0]?.message}`);
    return parsed.data;
  }

  return {
    push: (request) => post('push', request, pushResponseSchema),
    pull: (request) => post('pull', request, pullResponseSchema),
  };
}
