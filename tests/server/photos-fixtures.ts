// Shared by the photo suites: a local S3 fake (s3rver from the npm registry, on 127.0.0.1 port 0, in a temp
// folder) and photo-like bytes. SHA-256 reference: Node's node:crypto (OpenSSL, FIPS 180-4).
import { createHash, randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { CreateBucketCommand, S3Client } from '@aws-sdk/client-s3';
import S3rver from 's3rver';

export const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

/** Random bytes that start with a JPEG SOI marker (FF D8 FF E0), which is all the server's type check reads. */
export function fakeJpeg(bytes: number): Buffer {
  const b = randomBytes(bytes);
  b.set([0xff, 0xd8, 0xff, 0xe0], 0);
  return b;
}

export interface FakeS3 {
  endpoint: string;
  bucket: string;
  credentials: { accessKeyId: string; secretAccessKey: string };
  /** The PHOTO_STORAGE/S3_* environment that points the server at this fake. */
  env: Record<string, string>;
  close(): Promise<void>;
}

export async function startFakeS3(bucket = 'loftline-photos'): Promise<FakeS3> {
  const dir = mkdtempSync(join(tmpdir(), 'loftline-s3rver-'));
  const server = new S3rver({ port: 0, address: '127.0.0.1', silent: true, directory: dir });
  const { port } = await server.run();
  const endpoint = `http://127.0.0.1:${port}`;
  // s3rver accepts these fixed keys and no others.
  const credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };
  const admin = new S3Client({ endpoint, region: 'us-east-1', forcePathStyle: true, credentials });
  await admin.send(new CreateBucketCommand({ Bucket: bucket }));
  admin.destroy();
  return {
    endpoint,
    bucket,
    credentials,
    env: {
      PHOTO_STORAGE: 's3',
      S3_ENDPOINT: endpoint,
      S3_BUCKET: bucket,
      S3_REGION: 'us-east-1',
      S3_ACCESS_KEY_ID: credentials.accessKeyId,
      S3_SECRET_ACCESS_KEY: credentials.secretAccessKey,
      S3_FORCE_PATH_STYLE: 'true',
    },
    async close() {
      await server.close();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
