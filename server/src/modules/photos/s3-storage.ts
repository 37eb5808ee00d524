// Photo storage in an S3-compatible bucket through the AWS SDK v3. Stored photos: `photos/<aa>/<sha256>`.
// An upload in progress keeps each chunk as its own object `uploads/<uploadId>/<offset, 12 digits>`; S3's own
// multipart upload is not used because it needs parts of at least 5 MiB and our chunks are smaller.
// Assembling reads the chunks back (a photo is at most 20 MB, so holding one in memory is bounded), checks the
// SHA-256, writes the photo in one PutObject, then deletes the chunks.
import { createHash } from 'node:crypto';
import { Readable } from 'node:stream';
import {
  DeleteObjectsCommand,
  GetObjectCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { type AssembleResult, type PhotoStorage, assertSha256, assertUploadId, shardOf } from './photo-storage';

export interface S3Settings {
  endpoint?: string;
  bucket: string;
  region: string;
  accessKeyId?: string;
  secretAccessKey?: string;
  forcePathStyle: boolean;
}

const OFFSET_DIGITS = 12;

function isNotFound(err: unknown): boolean {
  if (err instanceof S3ServiceException) return err.$metadata.httpStatusCode === 404 || err.name === 'NoSuchKey' || err.name === 'NotFound';
  return false;
}

export class S3PhotoStorage implements PhotoStorage {
  readonly kind = 's3' as const;
  private readonly client: S3Client;
  private readonly bucket: string;

  constructor(settings: S3Settings) {
    this.bucket = settings.bucket;
    this.client = new S3Client({
      endpoint: settings.endpoint,
      region: settings.region,
      forcePathStyle: settings.forcePathStyle,
      credentials:
        settings.accessKeyId && settings.secretAccessKey
          ? { accessKeyId: settings.accessKeyId, secretAccessKey: settings.secretAccessKey }
          : undefined,
    });
  }

  private photoKey(sha256: string): string {
    assertSha256(sha256);
    return `photos/${shardOf(sha256)}/${sha256}`;
  }

  private uploadPrefix(uploadId: string): string {
    assertUploadId(uploadId);
    return `uploads/${uploadId.toLowerCase()}/`;
  }

  async has(sha256: string): Promise<boolean> {
    return (await this.size(sha256)) !== null;
  }

  async size(sha256: string): Promise<number | null> {
    try {
      const head = await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: this.photoKey(sha256) }));
      return head.ContentLength ?? 0;
    } catch (err) {
      if (isNotFound(err)) return null;
      throw err;
    }
  }

  async get(sha256: string): Promise<Readable | null> {
    try {
      const got = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: this.photoKey(sha256) }));
      // In Node the SDK's body is an http.IncomingMessage, which is a Readable.
      return got.Body instanceof Readable ? got.Body : Readable.from(Buffer.from(await got.Body!.transformToByteArray()));
    } catch (err) {
      if (isNotFound(err)) return null;
      throw err;
    }
  }

  async writeChunk(uploadId: string, offsetBytes: number, data: Buffer): Promise<void> {
    const key = `${this.uploadPrefix(uploadId)}${String(offsetBytes).padStart(OFFSET_DIGITS, '0')}`;
    await this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: data, ContentLength: data.length }));
  }

  private async listChunks(uploadId: string): Promise<{ key: string; offset: number; size: number }[]> {
    const prefix = this.uploadPrefix(uploadId);
    const chunks: { key: string; offset: number; size: number }[] = [];
    let token: string | undefined;
    do {
      const page = await this.client.send(
        new ListObjectsV2Command({ Bucket: this.bucket, Prefix: prefix, ContinuationToken: token }),
      );
      for (const o of page.Contents ?? []) {
        if (!o.Key) continue;
        chunks.push({ key: o.Key, offset: Number(o.Key.slice(prefix.length)), size: o.Size ?? 0 });
      }
      token = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (token);
    return chunks.sort((a, b) => a.offset - b.offset);
  }

  async assemble(uploadId: string, totalBytes: number, sha256: string): Promise<AssembleResult> {
    const photoKey = this.photoKey(sha256);
    // Follow the chain of chunks from offset 0; a chunk left at an offset that the chain skips is an old attempt.
    const byOffset = new Map((await this.listChunks(uploadId)).map((c) => [c.offset, c]));
    const chain: string[] = [];
    let receivedBytes = 0;
    for (let c = byOffset.get(0); c && c.size > 0; c = byOffset.get(receivedBytes)) {
      chain.push(c.key);
      receivedBytes += c.size;
    }
    if (receivedBytes !== totalBytes) return { kind: 'incomplete', receivedBytes };
    const parts: Buffer[] = [];
    for (const key of chain) {
      const got = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
      parts.push(Buffer.from(await got.Body!.transformToByteArray()));
    }
    const body = Buffer.concat(parts);
    const actualSha256 = createHash('sha256').update(body).digest('hex');
    if (actualSha256 !== sha256 || body.length !== totalBytes) {
      await this.discardUpload(uploadId);
      return { kind: 'hash-mismatch', actualSha256 };
    }
    // Same key, same bytes: two devices completing the same photo at once leave one object.
    await this.client.send(
      new PutObjectCommand({ Bucket: this.bucket, Key: photoKey, Body: body, ContentLength: body.length }),
    );
    await this.discardUpload(uploadId);
    return { kind: 'stored', bytes: body.length };
  }

  async discardUpload(uploadId: string): Promise<void> {
    const keys = (await this.listChunks(uploadId)).map((c) => ({ Key: c.key }));
    for (let i = 0; i < keys.length; i += 1000) {
      await this.client.send(new DeleteObjectsCommand({ Bucket: this.bucket, Delete: { Objects: keys.slice(i, i + 1000) } }));
    }
  }

  /** Lets a caller (the test suite, a dev start) close the SDK's sockets. */
  destroy(): void {
    this.client.destroy();
  }
}
