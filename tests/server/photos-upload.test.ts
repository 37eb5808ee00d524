// The photo routes end to end against the real app and PostgreSQL, with each storage driver (folder, and S3 via
// s3rver): upload in chunks, the same photo twice, two devices at once, a hash mismatch, who may do what, bad input.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PHOTO_CHUNK_MAX_BYTES } from '../../shared/schemas';
import { type FakeS3, fakeJpeg, sha, startFakeS3 } from './photos-fixtures';
import { type TestApp, type TestUser, startTestApp } from './helpers/test-app';

async function put(t: TestApp, user: TestUser, path: string, body: Uint8Array): Promise<{ status: number; body: any }> {
  const res = await fetch(`${t.baseUrl}${path}`, {
    method: 'PUT',
    headers: { ...user.auth, 'content-type': 'application/octet-stream' },
    body: body as BodyInit,
  });
  return { status: res.status, body: await res.json() };
}

/** Creates an upload and sends every chunk in order; returns the upload id. */
async function uploadAll(t: TestApp, user: TestUser, bytes: Buffer, chunkBytes = 100_000, claimedSha = sha(bytes)): Promise<string> {
  const base = `/api/clubs/${user.clubId}/photos/${claimedSha}/uploads`;
  const created = await t.api('POST', base, { auth: user, body: { bytes: bytes.length, mimeType: 'image/jpeg' } });
  expect(created.status).toBe(201);
  const uploadId = created.body.uploadId as string;
  for (let offset = 0; offset < bytes.length; offset += chunkBytes) {
    const r = await put(t, user, `${base}/${uploadId}?offset=${offset}`, bytes.subarray(offset, offset + chunkBytes));
    expect(r.status, JSON.stringify(r.body)).toBe(200);
    expect(r.body.receivedBytes).toBe(Math.min(offset + chunkBytes, bytes.length));
  }
  return uploadId;
}

const drivers: { name: string; env: () => Promise<{ env: Record<string, string>; close(): Promise<void> }> }[] = [
  { name: 'folder storage', env: async () => ({ env: { PHOTO_STORAGE: 'fs' }, close: async () => {} }) },
  {
    name: 'S3 storage (s3rver)',
    env: async () => {
      const s3: FakeS3 = await startFakeS3();
      return { env: s3.env, close: () => s3.close() };
    },
  },
];

describe.each(drivers)('photo routes with $name', (driver) => {
  let t: TestApp;
  let closeStorage: () => Promise<void>;
  let dataDir: string;
  let scout: TestUser;
  let scout2: TestUser;
  let crew: TestUser;
  let outsider: TestUser;

  beforeAll(async () => {
    const storage = await driver.env();
    closeStorage = storage.close;
    dataDir = mkdtempSync(join(tmpdir(), 'loftline-photo-routes-'));
    const saved = { ...process.env };
    Object.assign(process.env, storage.env);
    try {
      t = await startTestApp({ config: { dataDir } });
    } finally {
      for (const k of Object.keys(storage.env)) if (saved[k] === undefined) delete process.env[k];
      Object.assign(process.env, saved);
    }
    scout = await t.signUpUser({ role: 'scout' });
    scout2 = await t.signUpUser({ role: 'scout', clubId: scout.clubId });
    crew = await t.signUpUser({ role: 'crew', clubId: scout.clubId });
    outsider = await t.signUpUser({ role: 'scout' });
  });
  afterAll(async () => {
    await t?.close();
    await closeStorage?.();
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('uploads a photo in chunks; HEAD and GET then give its size, type and identical bytes', async () => {
    const bytes = fakeJpeg(350_000);
    const path = `/api/clubs/${scout.clubId}/photos/${sha(bytes)}`;
    expect((await t.api('HEAD', path, { auth: scout })).status).toBe(404);
    const uploadId = await uploadAll(t, scout, bytes);
    const done = await t.api('POST', `${path}/uploads/${uploadId}/complete`, { auth: scout });
    expect(done.body).toEqual({ state: 'stored', sha256: sha(bytes), bytes: bytes.length });
    const head = await t.api('HEAD', path, { auth: crew }); // any member may read
    expect(head.status).toBe(200);
    expect(head.headers.get('content-length')).toBe(String(bytes.length));
    expect(head.headers.get('content-type')).toBe('image/jpeg');
    const got = await fetch(`${t.baseUrl}${path}`, { headers: crew.auth });
    expect(got.status).toBe(200);
    expect(sha(new Uint8Array(await got.arrayBuffer()))).toBe(sha(bytes));
    // Finishing again (a retry after a lost answer) is still "stored".
    expect((await t.api('POST', `${path}/uploads/${uploadId}/complete`, { auth: scout })).body.state).toBe('stored');
  });

  it('the same photo twice is a no-op: the second start answers "already have it" and creates no upload', async () => {
    const bytes = fakeJpeg(20_000);
    const path = `/api/clubs/${scout.clubId}/photos/${sha(bytes)}`;
    const id = await uploadAll(t, scout, bytes);
    await t.api('POST', `${path}/uploads/${id}/complete`, { auth: scout });
    const again = await t.api('POST', `${path}/uploads`, { auth: scout2, body: { bytes: bytes.length, mimeType: 'image/jpeg' } });
    expect(again.status).toBe(200);
    expect(again.body).toEqual({ state: 'stored', sha256: sha(bytes), bytes: bytes.length });
    const [{ n }] = await t.deps.dataSource.query('SELECT count(*)::int AS n FROM photo_uploads WHERE sha256 = $1', [sha(bytes)]);
    expect(n).toBe(0);
  });

  it('the same photo from two devices at once ends as one stored photo, with both devices told "stored"', async () => {
    const bytes = fakeJpeg(400_000);
    const path = `/api/clubs/${scout.clubId}/photos/${sha(bytes)}`;
    const [a, b] = await Promise.all([uploadAll(t, scout, bytes, 64_000), uploadAll(t, scout2, bytes, 150_000)]);
    const results = await Promise.all([
      t.api('POST', `${path}/uploads/${a}/complete`, { auth: scout }),
      t.api('POST', `${path}/uploads/${b}/complete`, { auth: scout2 }),
    ]);
    expect(results.map((r) => [r.status, r.body.state])).toEqual([
      [200, 'stored'],
      [200, 'stored'],
    ]);
    const objects = await t.deps.dataSource.query('SELECT bytes FROM photo_objects WHERE sha256 = $1', [sha(bytes)]);
    expect(objects).toEqual([{ bytes: bytes.length }]);
    const got = await fetch(`${t.baseUrl}${path}`, { headers: scout.auth });
    expect(sha(new Uint8Array(await got.arrayBuffer()))).toBe(sha(bytes));
  });

  it('rejects bytes that do not hash to the photo’s SHA-256, keeps nothing and forgets the upload', async () => {
    const bytes = fakeJpeg(50_000);
    const claimed = sha(fakeJpeg(10));
    const path = `/api/clubs/${scout.clubId}/photos/${claimed}`;
    const id = await uploadAll(t, scout, bytes, 20_000, claimed);
    const done = await t.api('POST', `${path}/uploads/${id}/complete`, { auth: scout });
    expect(done.status).toBe(400);
    expect(done.body).toMatchObject({ code: 'hash_mismatch', details: { expectedSha256: claimed, actualSha256: sha(bytes) } });
    expect((await t.api('HEAD', path, { auth: scout })).status).toBe(404);
    expect((await t.api('HEAD', `/api/clubs/${scout.clubId}/photos/${sha(bytes)}`, { auth: scout })).status).toBe(404);
    expect((await t.api('GET', `${path}/uploads/${id}`, { auth: scout })).body.code).toBe('upload_not_found');
  });

  it('a chunk at the wrong offset is refused with the offset the server has; finishing early is refused', async () => {
    const bytes = fakeJpeg(30_000);
    const base = `/api/clubs/${scout.clubId}/photos/${sha(bytes)}/uploads`;
    const { body } = await t.api('POST', base, { auth: scout, body: { bytes: bytes.length, mimeType: 'image/jpeg' } });
    expect((await put(t, scout, `${base}/${body.uploadId}?offset=0`, bytes.subarray(0, 10_000))).status).toBe(200);
    const wrong = await put(t, scout, `${base}/${body.uploadId}?offset=20000`, bytes.subarray(20_000));
    expect(wrong).toMatchObject({ status: 409, body: { code: 'offset_mismatch', details: { receivedBytes: 10_000 } } });
    const early = await t.api('POST', `${base}/${body.uploadId}/complete`, { auth: scout });
    expect(early.status).toBe(409);
    expect(early.body).toMatchObject({ code: 'upload_incomplete', details: { receivedBytes: 10_000 } });
    const past = await put(t, scout, `${base}/${body.uploadId}?offset=10000`, fakeJpeg(25_000));
    expect(past).toMatchObject({ status: 400, body: { code: 'chunk_past_end' } });
  });

  it('another club must upload the photo itself: it cannot see or read a photo it never had', async () => {
    const bytes = fakeJpeg(15_000);
    const id = await uploadAll(t, scout, bytes);
    await t.api('POST', `/api/clubs/${scout.clubId}/photos/${sha(bytes)}/uploads/${id}/complete`, { auth: scout });
    const theirs = `/api/clubs/${outsider.clubId}/photos/${sha(bytes)}`;
    expect((await t.api('HEAD', theirs, { auth: outsider })).status).toBe(404);
    const start = await t.api('POST', `${theirs}/uploads`, { auth: outsider, body: { bytes: bytes.length, mimeType: 'image/jpeg' } });
    expect(start.status).toBe(201);
  });
});

describe('photo routes: who may do what, and bad input', () => {
  let t: TestApp;
  let dataDir: string;
  let scout: TestUser;
  let crew: TestUser;
  let outsider: TestUser;
  let stored: Buffer;
  beforeAll(async () => {
    dataDir = mkdtempSync(join(tmpdir(), 'loftline-photo-authz-'));
    t = await startTestApp({ config: { dataDir } });
    scout = await t.signUpUser({ role: 'scout' });
    crew = await t.signUpUser({ role: 'crew', clubId: scout.clubId });
    outsider = await t.signUpUser({ role: 'lead' });
    stored = fakeJpeg(5_000);
    const id = await uploadAll(t, scout, stored);
    await t.api('POST', `/api/clubs/${scout.clubId}/photos/${sha(stored)}/uploads/${id}/complete`, { auth: scout });
  });
  afterAll(async () => {
    await t?.close();
    rmSync(dataDir, { recursive: true, force: true });
  });
  const create = (bytes: number, mimeType = 'image/jpeg') => ({ bytes, mimeType });

  it('no token → 401; not a member → 404 (the club is not admitted to exist); crew may read but not upload → 403', async () => {
    const path = `/api/clubs/${scout.clubId}/photos/${sha(stored)}`;
    expect((await t.api('GET', path)).status).toBe(401);
    expect((await t.api('GET', path, { auth: outsider })).status).toBe(404);
    expect((await t.api('POST', `${path}/uploads`, { auth: outsider, body: create(10) })).status).toBe(404);
    expect((await t.api('GET', path, { auth: crew })).status).toBe(200);
    const denied = await t.api('POST', `${path}/uploads`, { auth: crew, body: create(10) });
    expect(denied.status).toBe(403);
    expect(denied.body.code).toBe('forbidden');
  });

  it('bad hashes, sizes and types get a clear 400 and nothing is created', async () => {
    const base = `/api/clubs/${scout.clubId}/photos`;
    const notHex = await t.api('POST', `${base}/${'Z'.repeat(64)}/uploads`, { auth: scout, body: create(10) });
    expect(notHex).toMatchObject({ status: 400, body: { code: 'validation_failed' } });
    expect(notHex.body.message).toMatch(/sha256/);
    const h = sha(fakeJpeg(10));
    const tooBig = await t.api('POST', `${base}/${h}/uploads`, { auth: scout, body: create(20_000_001) });
    expect(tooBig.body.message).toMatch(/at most 20 MB/);
    const gif = await t.api('POST', `${base}/${h}/uploads`, { auth: scout, body: create(10, 'image/gif') });
    expect(gif).toMatchObject({ status: 400, body: { code: 'validation_failed' } });
    const [{ n }] = await t.deps.dataSource.query('SELECT count(*)::int AS n FROM photo_uploads');
    expect(n).toBe(0);
  });

  it('a chunk over the size limit → 413; an empty chunk, a bad offset or bytes that are not the declared image → 400', async () => {
    const bytes = fakeJpeg(PHOTO_CHUNK_MAX_BYTES + 10);
    const base = `/api/clubs/${scout.clubId}/photos/${sha(bytes)}/uploads`;
    const { body } = await t.api('POST', base, { auth: scout, body: create(bytes.length) });
    const url = `${base}/${body.uploadId}`;
    expect((await put(t, scout, `${url}?offset=0`, bytes)).status).toBe(413);
    expect((await put(t, scout, `${url}?offset=0`, new Uint8Array(0))).body.code).toBe('empty_chunk');
    expect((await put(t, scout, `${url}?offset=-1`, bytes.subarray(0, 10))).body.code).toBe('validation_failed');
    const png = await t.api('POST', base.replace(sha(bytes), sha(stored.subarray(0, 100))), { auth: scout, body: create(100, 'image/png') });
    const notPng = await put(t, scout, `${base.replace(sha(bytes), sha(stored.subarray(0, 100)))}/${png.body.uploadId}?offset=0`, stored.subarray(0, 100));
    expect(notPng.status).toBe(400);
    expect(notPng.body.code).toBe('not_an_image');
  });
});
