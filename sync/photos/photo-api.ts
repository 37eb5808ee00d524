import { z } from 'zod';
import { type PhotoMimeType, type PhotoUploadState, apiErrorSchema, photoUploadStateSchema } from '../../shared/schemas';

/*
 * The photo routes as the uploader sees them (see server/src/modules/photos/router.ts). The requests go through
 * a `PhotoRequest` the app supplies (its authenticated fetch: bearer token, refresh on 401), so this file holds no
 * token and no global fetch. Every answer is parsed with the shared zod schemas before it is believed.
 */

export type PhotoRequest = (path: string, init: { method: string; headers?: Record<string, string>; body?: Uint8Array | string }) => Promise<Response>;

/** The request did not produce an answer the uploader can act on. `retryable` false: retrying will not help. */
export class PhotoApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly retryable: boolean,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = 'PhotoApiError';
  }
}

const offsetDetailsSchema = z.object({ receivedBytes: z.number().int().min(0) });

/** What a chunk PUT or a finish can answer. */
export type ChunkAnswer = { kind: 'state'; state: PhotoUploadState } | { kind: 'rewind'; receivedBytes: number } | { kind: 'gone' };

export interface PhotoApi {
  has(sha256: string): Promise<boolean>;
  start(sha256: string, bytes: number, mimeType: PhotoMimeType): Promise<PhotoUploadState>;
  /** null: the server no longer knows this upload (finished elsewhere, or abandoned). */
  state(sha256: string, uploadId: string): Promise<PhotoUploadState | null>;
  putChunk(sha256: string, uploadId: string, offsetBytes: number, data: Uint8Array): Promise<ChunkAnswer>;
  complete(sha256: string, uploadId: string): Promise<ChunkAnswer>;
  /** The stored bytes, to show a photo this device does not hold. */
  download(sha256: string): Promise<{ mimeType: string; data: Uint8Array }>;
}

async function failure(res: Response): Promise<PhotoApiError> {
  let body: unknown = null;
  try {
    body = await res.json();
  } catch {
    body = null;
  }
  const e = apiErrorSchema.safeParse(body);
  const code = e.success ? e.data.code : 'http_error';
  const message = e.success ? e.data.message : `the server answered ${res.status}`;
  // 5xx, 408 and 429 may pass; 401 may pass once the session is refreshed or the person signs in again.
  const retryable = res.status >= 500 || res.status === 408 || res.status === 429 || res.status === 401;
  return new PhotoApiError(res.status, code, message, retryable, e.success ? e.data.details : undefined);
}

async function send(request: PhotoRequest, path: string, init: Parameters<PhotoRequest>[1]): Promise<Response> {
  try {
    return await request(path, init);
  } catch (err) {
    throw new PhotoApiError(0, 'offline', 'could not reach the server', true, err instanceof Error ? err.message : undefined);
  }
}

async function stateOf(res: Response): Promise<PhotoUploadState> {
  const parsed = photoUploadStateSchema.safeParse(await res.json().catch(() => null));
  if (!parsed.success) throw new PhotoApiError(res.status, 'bad_response', 'the server sent an answer this app does not understand', true);
  return parsed.data;
}

/** `rewind` when the server says it holds a different number of bytes than we assumed (409 with receivedBytes). */
async function chunkAnswer(res: Response): Promise<ChunkAnswer> {
  if (res.ok) return { kind: 'state', state: await stateOf(res) };
  const err = await failure(res);
  if (res.status === 409) {
    const d = offsetDetailsSchema.safeParse(err.details);
    if (d.success) return { kind: 'rewind', receivedBytes: d.data.receivedBytes };
  }
  if (res.status === 404 && err.code === 'upload_not_found') return { kind: 'gone' };
  throw err;
}

export function httpPhotoApi(request: PhotoRequest, clubId: string): PhotoApi {
  const base = (sha256: string) => `/api/clubs/${clubId}/photos/${sha256}`;
  return {
    async has(sha256) {
      const res = await send(request, base(sha256), { method: 'HEAD' });
      if (res.status === 200) return true;
      if (res.status === 404) return false;
      throw await failure(res);
    },
    async start(sha256, bytes, mimeType) {
      const res = await send(request, `${base(sha256)}/uploads`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ bytes, mimeType }),
      });
      if (!res.ok) throw await failure(res);
      return stateOf(res);
    },
    async state(sha256, uploadId) {
      const res = await send(request, `${base(sha256)}/uploads/${uploadId}`, { method: 'GET' });
      if (res.ok) return stateOf(res);
      const err = await failure(res);
      if (res.status === 404 && err.code === 'upload_not_found') return null;
      throw err;
    },
    async putChunk(sha256, uploadId, offsetBytes, data) {
      const res = await send(request, `${base(sha256)}/uploads/${uploadId}?offset=${offsetBytes}`, {
        method: 'PUT',
        headers: { 'content-type': 'application/octet-stream' },
        body: data,
      });
      return chunkAnswer(res);
    },
    async complete(sha256, uploadId) {
      const res = await send(request, `${base(sha256)}/uploads/${uploadId}/complete`, { method: 'POST' });
      return chunkAnswer(res);
    },
    async download(sha256) {
      const res = await send(request, base(sha256), { method: 'GET' });
      if (!res.ok) throw await failure(res);
      return { mimeType: res.headers.get('content-type') ?? 'application/octet-stream', data: new Uint8Array(await res.arrayBuffer()) };
    },
  };
}
