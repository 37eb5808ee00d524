// The phone's uploader (sync/photos) against the real server and PostgreSQL, through a network that cuts:
// a request lost before it reaches the server, a chunk cut off halfway through its body, and an answer lost after
// the server committed. The upload must resume from the server's offset each time (never restart, never
// duplicate) and end with the photo stored byte-identical. SHA-256 reference: node:crypto (FIPS 180-4).
import { request as httpRequest } from 'node:http';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MemoryPhotoDatabase, createMemoryPhotoStore, httpPhotoApi, uploadPhoto, type PhotoRequest } from '../../sync/photos';
import { fakeJpeg, sha } from './photos-fixtures';
import { type TestApp, type TestUser, startTestApp } from './helpers/test-app';

type Cut = 'before-send' | 'mid-body' | 'answer-lost';

/** An authenticated fetch for one user that applies the next scheduled cut to the n-th request matching it. */
function cuttingRequest(t: TestApp, user: TestUser, plan: Map<number, Cut>, log: string[]): PhotoRequest {
  let n = 0;
  return async (path, init) => {
    const i = ++n;
    log.push(`${init.method} ${path.replace(/^.*\/photos\/[0-9a-f]{64}/, '…')}`);
    const cut = plan.get(i);
    const url = `${t.baseUrl}${path}`;
    const headers = { ...init.headers, ...user.auth };
    if (cut === 'before-send') throw new TypeError('network unreachable (test cut before send)');
    if (cut === 'mid-body') {
      const body = init.body as Uint8Array;
      await new Promise<void>((resolve) => {
        const req = httpRequest(url, { method: init.method, headers: { ...headers, 'content-length': String(body.length) } });
        req.on('error', () => resolve());
        req.write(body.subarray(0, Math.floor(body.length / 2)), () => setTimeout(() => (req.destroy(), resolve()), 50));
      });
      throw new TypeError('connection reset (test cut mid-body)');
    }
    const res = await fetch(url, { method: init.method, headers, body: init.body as BodyInit | undefined });
    if (cut === 'answer-lost') {
      await res.arrayBuffer();
      throw new TypeError('connection reset (test cut after the server answered)');
    }
    return res;
  };
}

describe('photo upload through a cutting network (sync/photos uploader against the real server)', () => {
  let t: TestApp;
  let dataDir: string;
  let scout: TestUser;
  let scout2: TestUser;
  beforeAll(async () => {
    dataDir = mkdtempSync(join(tmpdir(), 'loftline-photo-resume-'));
    t = await startTestApp({ config: { dataDir } });
    scout = await t.signUpUser({ role: 'scout' });
    scout2 = await t.signUpUser({ role: 'scout', clubId: scout.clubId });
  });
  afterAll(async () => {
    await t?.close();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('an upload cut three times (before send, mid-body, answer lost) resumes each time and ends byte-identical', async () => {
    const clubId = scout.clubId!;
    const bytes = fakeJpeg(10 * 64 * 1024 + 123); // 11 chunks of 64 KiB
    const db = new MemoryPhotoDatabase();
    await createMemoryPhotoStore(db).add({ clubId, sha256: sha(bytes), mimeType: 'image/jpeg', data: bytes }, 1);
    // Requests: 1 HEAD, 2 POST start, 3 PUT@0, 4 PUT@64K … The cuts hit the 3rd chunk, then (after resuming) more.
    const plan = new Map<number, Cut>([[5, 'before-send']]);
    const log: string[] = [];
    const outcomes: string[] = [];
    const offsets: number[] = [];
    const attempt = async (cuts: Map<number, Cut>) => {
      // A new store object over the same data each time: the phone restarting between attempts.
      const store = createMemoryPhotoStore(db);
      const entry = (await store.waiting(clubId))[0]!;
      const api = httpPhotoApi(cuttingRequest(t, scout, cuts, log), clubId);
      const outcome = await uploadPhoto(entry, { store, api, clubId, chunkBytes: 64 * 1024 });
      outcomes.push(outcome.kind);
      const [row] = await t.deps.dataSource.query('SELECT received_bytes FROM photo_uploads WHERE sha256 = $1', [sha(bytes)]);
      offsets.push(row?.received_bytes ?? -1);
    };
    await attempt(plan); // cut before the 3rd chunk is sent
    // Resume: 1 HEAD, 2 GET state, 3 PUT@128K, 4 PUT@192K cut halfway through its body.
    await attempt(new Map([[4, 'mid-body']]));
    // Resume: 1 HEAD, 2 GET state, 3 PUT@192K, 4 PUT@256K whose answer is lost after the server committed it.
    await attempt(new Map([[4, 'answer-lost']]));
    await attempt(new Map()); // the rest, and finish

    expect(outcomes).toEqual(['retry', 'retry', 'retry', 'uploaded']);
    expect(offsets).toEqual([2 * 65536, 3 * 65536, 5 * 65536, -1]); // a half body is never counted; a lost answer is
    expect(log.filter((l) => l.startsWith('POST …/uploads') && !l.endsWith('/complete'))).toHaveLength(1); // resumed, never restarted
    expect(log.filter((l) => l.startsWith('GET …/uploads/'))).toHaveLength(3); // each resume asked the server's offset
    const got = await fetch(`${t.baseUrl}/api/clubs/${clubId}/photos/${sha(bytes)}`, { headers: scout.auth });
    expect(sha(new Uint8Array(await got.arrayBuffer()))).toBe(sha(bytes));
    expect((await createMemoryPhotoStore(db).get(clubId, sha(bytes)))?.state).toBe('uploaded');
  });

  it('the same photo from two devices at once: both uploaders finish, the server keeps one photo', async () => {
    const clubId = scout.clubId!;
    const bytes = fakeJpeg(700_000);
    const device = async (user: TestUser) => {
      const store = createMemoryPhotoStore();
      const entry = await store.add({ clubId, sha256: sha(bytes), mimeType: 'image/jpeg', data: bytes }, 1);
      const api = httpPhotoApi(cuttingRequest(t, user, new Map(), []), clubId);
      return { store, outcome: await uploadPhoto(entry, { store, api, clubId, chunkBytes: 100_000 }) };
    };
    const [a, b] = await Promise.all([device(scout), device(scout2)]);
    expect([a.outcome.kind, b.outcome.kind]).toEqual(['uploaded', 'uploaded']);
    expect(await a.store.countWaiting(clubId)).toBe(0);
    expect(await b.store.countWaiting(clubId)).toBe(0);
    const objects = await t.deps.dataSource.query('SELECT bytes FROM photo_objects WHERE club_id = $1 AND sha256 = $2', [clubId, sha(bytes)]);
    expect(objects).toEqual([{ bytes: bytes.length }]);
    const got = await fetch(`${t.baseUrl}/api/clubs/${clubId}/photos/${sha(bytes)}`, { headers: scout.auth });
    expect(sha(new Uint8Array(await got.arrayBuffer()))).toBe(sha(bytes));
  });
});
