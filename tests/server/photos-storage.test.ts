// One contract suite for every PhotoStorage driver: the folder driver, and the S3 driver against s3rver (a local
// S3-compatible fake from the npm registry; see photos-fixtures.ts).
import { randomBytes, randomUUID } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buffer } from 'node:stream/consumers';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FsPhotoStorage } from '../../server/src/modules/photos/fs-storage';
import type { PhotoStorage } from '../../server/src/modules/photos/photo-storage';
import { photoStorageFromEnv } from '../../server/src/modules/photos/photo-storage-config';
import { S3PhotoStorage } from '../../server/src/modules/photos/s3-storage';
import { sha, startFakeS3 } from './photos-fixtures';

async function upload(storage: PhotoStorage, uploadId: string, bytes: Buffer, chunkBytes: number): Promise<void> {
  for (let offset = 0; offset < bytes.length; offset += chunkBytes) {
    await storage.writeChunk(uploadId, offset, bytes.subarray(offset, offset + chunkBytes));
  }
}

interface Driver {
  name: string;
  open(): Promise<{ storage: PhotoStorage; close(): Promise<void> }>;
}

const fsDriver: Driver = {
  name: 'folder driver (fs-storage)',
  async open() {
    const dir = mkdtempSync(join(tmpdir(), 'loftline-photos-'));
    return { storage: new FsPhotoStorage(dir), close: async () => rmSync(dir, { recursive: true, force: true }) };
  },
};

const s3Driver: Driver = {
  name: 'S3 driver (s3-storage) against s3rver',
  async open() {
    const s3 = await startFakeS3();
    const storage = new S3PhotoStorage({ endpoint: s3.endpoint, bucket: s3.bucket, region: 'us-east-1', forcePathStyle: true, ...s3.credentials });
    return {
      storage,
      close: async () => {
        storage.destroy();
        await s3.close();
      },
    };
  },
};

describe.each([fsDriver, s3Driver])('PhotoStorage contract: $name', (driver) => {
  let storage: PhotoStorage;
  let close: () => Promise<void>;
  beforeAll(async () => {
    ({ storage, close } = await driver.open());
  });
  afterAll(async () => close());

  it('knows nothing about a photo it was never given', async () => {
    const unknown = sha(randomBytes(16));
    expect(await storage.has(unknown)).toBe(false);
    expect(await storage.size(unknown)).toBeNull();
    expect(await storage.get(unknown)).toBeNull();
  });

  it('assembles chunks written in order into the photo, byte-identical, under its SHA-256', async () => {
    const bytes = randomBytes(300_001);
    const uploadId = randomUUID();
    await upload(storage, uploadId, bytes, 65_536);
    expect(await storage.has(sha(bytes))).toBe(false); // not visible before it is checked
    expect(await storage.assemble(uploadId, bytes.length, sha(bytes))).toEqual({ kind: 'stored', bytes: bytes.length });
    expect(await storage.has(sha(bytes))).toBe(true);
    expect(await storage.size(sha(bytes))).toBe(bytes.length);
    const stream = await storage.get(sha(bytes));
    expect(sha(await buffer(stream!))).toBe(sha(bytes));
  });

  it('a chunk written again at the same offset (a retry after a lost answer) replaces the first attempt', async () => {
    const bytes = randomBytes(200_000);
    const uploadId = randomUUID();
    await storage.writeChunk(uploadId, 0, randomBytes(100_000)); // garbage first attempt
    await storage.writeChunk(uploadId, 0, bytes.subarray(0, 100_000));
    await storage.writeChunk(uploadId, 100_000, bytes.subarray(100_000));
    expect((await storage.assemble(uploadId, bytes.length, sha(bytes))).kind).toBe('stored');
    expect(sha(await buffer((await storage.get(sha(bytes)))!))).toBe(sha(bytes));
  });

  it('says how much it has when an upload is not complete, and finishes once the rest arrives', async () => {
    const bytes = randomBytes(150_000);
    const uploadId = randomUUID();
    await storage.writeChunk(uploadId, 0, bytes.subarray(0, 50_000));
    expect(await storage.assemble(uploadId, bytes.length, sha(bytes))).toEqual({ kind: 'incomplete', receivedBytes: 50_000 });
    await storage.writeChunk(uploadId, 50_000, bytes.subarray(50_000));
    expect((await storage.assemble(uploadId, bytes.length, sha(bytes))).kind).toBe('stored');
  });

  it('rejects bytes whose SHA-256 is not the declared one, stores nothing and drops the chunks', async () => {
    const bytes = randomBytes(70_000);
    const claimed = sha(randomBytes(8));
    const uploadId = randomUUID();
    await upload(storage, uploadId, bytes, 32_768);
    expect(await storage.assemble(uploadId, bytes.length, claimed)).toEqual({ kind: 'hash-mismatch', actualSha256: sha(bytes) });
    expect(await storage.has(claimed)).toBe(false);
    expect(await storage.has(sha(bytes))).toBe(false);
    expect(await storage.assemble(uploadId, bytes.length, sha(bytes))).toEqual({ kind: 'incomplete', receivedBytes: 0 });
  });

  it('two uploads of the same photo finishing at once leave one photo with the right bytes', async () => {
    const bytes = randomBytes(120_000);
    const [a, b] = [randomUUID(), randomUUID()];
    await Promise.all([upload(storage, a, bytes, 40_000), upload(storage, b, bytes, 25_000)]);
    const results = await Promise.all([storage.assemble(a, bytes.length, sha(bytes)), storage.assemble(b, bytes.length, sha(bytes))]);
    expect(results.map((r) => r.kind)).toEqual(['stored', 'stored']);
    expect(await storage.size(sha(bytes))).toBe(bytes.length);
    expect(sha(await buffer((await storage.get(sha(bytes)))!))).toBe(sha(bytes));
  });

  it('refuses keys that are not a SHA-256 or an upload id (no path or key injection)', async () => {
    await expect(storage.has('../../etc/passwd')).rejects.toThrow(/SHA-256/);
    await expect(storage.writeChunk('../x', 0, Buffer.from('x'))).rejects.toThrow(/upload id/);
  });

  it('discarding an upload that left nothing is not an error', async () => {
    await expect(storage.discardUpload(randomUUID())).resolves.toBeUndefined();
  });
});

describe('photo storage settings (PHOTO_STORAGE and S3_*)', () => {
  it('defaults to the folder driver under DATA_DIR/photos', () => {
    expect(photoStorageFromEnv({}, '/tmp/x').kind).toBe('fs');
  });
  it('builds the S3 driver when asked and the bucket is named', () => {
    const s = photoStorageFromEnv({ PHOTO_STORAGE: 's3', S3_BUCKET: 'b-photos', S3_FORCE_PATH_STYLE: 'true' }, '/tmp/x');
    expect(s.kind).toBe('s3');
    (s as S3PhotoStorage).destroy();
  });
  it('lists every bad setting in one clear error', () => {
    expect(() => photoStorageFromEnv({ PHOTO_STORAGE: 's3', S3_ENDPOINT: 'not a url', S3_ACCESS_KEY_ID: 'k' }, '/tmp/x')).toThrow(
      /S3_ENDPOINT must be a URL[\s\S]*S3_BUCKET[\s\S]*S3_SECRET_ACCESS_KEY/,
    );
    expect(() => photoStorageFromEnv({ PHOTO_STORAGE: 'ftp' }, '/tmp/x')).toThrow(/PHOTO_STORAGE must be fs or s3/);
  });
});
