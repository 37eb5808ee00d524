import { describe, expect, it } from 'vitest';
import type { PhotoUploadState } from '../../shared/schemas';
import { createMemoryPhotoStore } from './memory-photo-store';
import { type PhotoApi, PhotoApiError } from './photo-api';
import { PhotoQueue } from './photo-queue';
import { sha256Hex } from './sha256';

const CLUB = '11111111-1111-4111-8111-111111111111';
const UPLOAD = '33333333-3333-4333-8333-333333333333';

/** A server in a few lines: enough to drive the queue (the real routes are tested in tests/server/photos-*). */
function fakeServer() {
  const stored = new Map<string, Uint8Array>();
  const s = { offline: false, requests: 0, stored };
  const gate = () => {
    s.requests += 1;
    if (s.offline) throw new PhotoApiError(0, 'offline', 'could not reach the server', true);
  };
  let pending: Uint8Array = new Uint8Array(0);
  const uploading = (sha256: string, bytes: number): PhotoUploadState => ({ state: 'uploading', uploadId: UPLOAD, sha256, bytes, receivedBytes: pending.length, chunkMaxBytes: 1 << 20 });
  const api: PhotoApi = {
    has: async (sha) => (gate(), stored.has(sha)),
    start: async (sha, bytes) => (gate(), (pending = new Uint8Array(0)), uploading(sha, bytes)),
    state: async () => (gate(), null),
    putChunk: async (sha, _id, offset, data) => {
      gate();
      if (offset !== pending.length) return { kind: 'rewind', receivedBytes: pending.length };
      pending = new Uint8Array([...pending, ...data]);
      return { kind: 'state', state: uploading(sha, 0) };
    },
    complete: async (sha) => {
      gate();
      stored.set(sha, pending);
      return { kind: 'state', state: { state: 'stored', sha256: sha, bytes: pending.length } };
    },
    download: async () => {
      throw new Error('not used');
    },
  };
  return { s, api };
}

function photo(seed: number) {
  const data = new Uint8Array(5000).map((_, i) => (i + seed) % 251);
  return { clubId: CLUB, sha256: sha256Hex(data), mimeType: 'image/jpeg' as const, data };
}

describe('PhotoQueue', () => {
  it('uploads what is added, counts what waits, and tells its listeners', async () => {
    const { s, api } = fakeServer();
    const queue = new PhotoQueue({ store: createMemoryPhotoStore(), api, clubId: CLUB, chunkBytes: 1000, setTimer: () => null, clearTimer: () => undefined });
    let notified = 0;
    queue.subscribe(() => void (notified += 1));
    const p = photo(1);
    await queue.add(p);
    await queue.idle();
    expect(queue.getStatus()).toEqual({ waiting: 0, uploading: false, lastError: null });
    expect(sha256Hex(s.stored.get(p.sha256)!)).toBe(p.sha256);
    expect(notified).toBeGreaterThan(1);
  });

  it('with no network it keeps the photo waiting, says why, and retries after a backoff (exponential, jittered)', async () => {
    const { s, api } = fakeServer();
    s.offline = true;
    const timers: { fn: () => void; ms: number }[] = [];
    const queue = new PhotoQueue({
      store: createMemoryPhotoStore(),
      api,
      clubId: CLUB,
      random: () => 0.5,
      setTimer: (fn, ms) => timers.push({ fn, ms }),
      clearTimer: () => undefined,
    });
    await queue.add(photo(2));
    await queue.idle();
    expect(queue.getStatus()).toMatchObject({ waiting: 1, lastError: 'no connection to the server' });
    // attempt 1 of DEFAULT_BACKOFF (1 s base): between 1 s and 2 s; with random 0.5 → 1.5 s (sync/engine/backoff.ts)
    expect(timers.at(-1)!.ms).toBe(1500);
    s.offline = false;
    timers.at(-1)!.fn();
    await queue.idle();
    expect(queue.getStatus()).toMatchObject({ waiting: 0, lastError: null });
  });

  it('does not try while the browser says it is offline, and runs when the network comes back', async () => {
    const { s, api } = fakeServer();
    const listeners = new Map<string, () => void>();
    const win = { addEventListener: (t: string, l: () => void) => void listeners.set(t, l), removeEventListener: () => undefined };
    const navigator = { onLine: false };
    const queue = new PhotoQueue({ store: createMemoryPhotoStore(), api, clubId: CLUB, triggers: { window: win, navigator }, setTimer: () => null, clearTimer: () => undefined });
    queue.start();
    await queue.add(photo(3));
    await queue.idle();
    expect(s.requests).toBe(0);
    expect(queue.getStatus()).toMatchObject({ waiting: 1, lastError: 'waiting for a connection' });
    navigator.onLine = true;
    listeners.get('online')!();
    await queue.idle();
    expect(queue.getStatus().waiting).toBe(0);
    queue.stop();
  });
});
