import { apiErrorSchema, tokensSchema } from '@/shared/schemas';
import { tokenStore } from './token-store';

/*
 * The one way the app talks to the server. Adds the bearer token, refreshes it once when the server
 * answers 401 (access tokens live 15 minutes), and turns every failure into an ApiRequestError that
 * carries the server's plain-words message.
 */

export const API_BASE: string = process.env.EXPO_PUBLIC_API_URL ?? '';

export class ApiRequestError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'ApiRequestError';
  }
}

export type ApiInit = Omit<RequestInit, 'body'> & { json?: unknown; body?: BodyInit; auth?: boolean };

let refreshing: Promise<boolean> | null = null;

/** Trade the refresh token for new tokens; concurrent callers share one request (tokens rotate). */
async function refreshTokens(): Promise<boolean> {
  refreshing ??= (async () => {
    const tokens = tokenStore.get();
    if (!tokens) return false;
    try {
      const res = await fetch(`${API_BASE}/api/auth/refresh`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ refreshToken: tokens.refreshToken }),
      });
      if (!res.ok) {
        // Only a definite refusal signs the person out; a network failure keeps the session for later.
        if (res.status === 401 || res.status === 400) tokenStore.set(null);
        return false;
      }
      const parsed = tokensSchema.safeParse(await res.json());
      if (!parsed.success) return false;
      tokenStore.set(parsed.data);
      return true;
    } catch {
      return false;
    }
  })().finally(() => {
    refreshing = null;
  });
  return refreshing;
}

async function send(path: string, init: ApiInit): Promise<Response> {
  const { json, auth = true, headers, ...rest } = init;
  const h = new Headers(headers);
  // Some routes (the dev mailbox) also answer HTML to a browser; the app always wants JSON.
  if (!h.has('accept')) h.set('accept', 'application/json');
  if (json !== undefined) h.set('content-type', 'application/json');
  const tokens = tokenStore.get();
  if (auth && tokens) h.set('authorization', `Bearer ${tokens.accessToken}`);
  return fetch(`${API_BASE}${path}`, { ...rest, headers: h, body: json !== undefined ? JSON.stringify(json) : rest.body });
}

async function errorFrom(res: Response): Promise<ApiRequestError> {
  let body: unknown = null;
  try {
    body = await res.json();
  } catch {
    body = null;
  }
  const parsed = apiErrorSchema.safeParse(body);
  if (parsed.success) return new ApiRequestError(res.status, parsed.data.code, parsed.data.message, parsed.data.details);
  return new ApiRequestError(res.status, 'http_error', `The server answered ${res.status}. Try again in a moment.`);
}

export async function apiFetch<T = unknown>(path: string, init: ApiInit = {}): Promise<T> {
  let res: Response;
  try {
    res = await send(path, init);
    if (res.status === 401 && init.auth !== false && tokenStore.get()) {
      if (await refreshTokens()) res = await send(path, init);
    }
  } catch {
    throw new ApiRequestError(0, 'offline', 'Could not reach the Loftline server. Check the connection and try again.');
  }
  if (!res.ok) throw await errorFrom(res);
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  return (text ? JSON.parse(text) : undefined) as T;
}

/** A message fit to show a person, whatever was thrown. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiRequestError) return error.message;
  if (error instanceof Error) return error.message;
  return 'Something went wrong. Try again.';
}

/**
 * Field errors the server sent back (`details.issues`, each with a path such as "email" or
 * "signUp.password"), keyed by the path's last named segment: the form field it belongs to.
 */
export function fieldErrors(error: unknown): Record<string, string> {
  const out: Record<string, string> = {};
  if (!(error instanceof ApiRequestError) || !error.details) return out;
  type Issue = { path?: string | (string | number)[]; message?: string };
  const d = error.details as { issues?: Issue[] } | Issue[];
  const issues = Array.isArray(d) ? d : d.issues;
  for (const issue of issues ?? []) {
    const segments = (typeof issue.path === 'string' ? issue.path.split('.') : (issue.path ?? []).map(String)).filter((p) => p !== '' && !/^\d+$/.test(p));
    const key = segments[segments.length - 1];
    if (key !== undefined && issue.message && !(key in out)) out[key] = issue.message;
  }
  return out;
}
