// Photo storage in a folder: `${root}/<aa>/<sha256>` for stored photos, `${root}/.uploads/<uploadId>` while an
// upload is in progress. The final step is a rename inside one file system, so a photo appears whole or not at all.
import { createHash } from 'node:crypto';
import { constants, createReadStream } from 'node:fs';
import { mkdir, open, rename, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';
import type { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { type AssembleResult, type PhotoStorage, assertSha256, assertUploadId, shardOf } from './photo-storage';

const isMissing = (err: unknown) => (err as NodeJS.ErrnoException | null)?.code === 'ENOENT';

export class FsPhotoStorage implements PhotoStorage {
  readonly kind = 'fs' as const;
  private readonly uploadsDir: string;

  constructor(private readonly root: string) {
    this.uploadsDir = join(root, '.uploads');
  }

  private photoPath(sha256: string): string {
    assertSha256(sha256);
    return join(this.root, shardOf(sha256), sha256);
  }

  private uploadPath(uploadId: string): string {
    assertUploadId(uploadId);
    return join(this.uploadsDir, uploadId.toLowerCase());
  }

  async has(sha256: string): Promise<boolean> {
    return (await this.size(sha256)) !== null;
  }

  async size(sha256: string): Promise<number | null> {
    try {
      return (await stat(this.photoPath(sha256))).size;
    } catch (err) {
      if (isMissing(err)) return null;
      throw err;
    }
  }

  async get(sha256: string): Promise<Readable | null> {
    const path = this.photoPath(sha256);
    // Open first so a missing photo is a null, not a stream that errors later.
    try {
      const handle = await open(path, 'r');
      return handle.createReadStream();
    } catch (err) {
      if (isMissing(err)) return null;
      throw err;
    }
  }

  async writeChunk(uploadId: string, offsetBytes: number, data: Buffer): Promise<void> {
    const path = this.uploadPath(uploadId);
    await mkdir(this.uploadsDir, { recursive: true });
    // Not 'a' mode: on Linux positional writes to a file opened for append land at the end regardless.
    const handle = await open(path, constants.O_WRONLY | constants.O_CREAT, 0o600);
    try {
      await handle.write(data, 0, data.length, offsetBytes);
      // Anything past this chunk is left over from an earlier attempt at a later offset: drop it, so the file
      // always holds exactly the bytes received so far.
      await handle.truncate(offsetBytes + data.length);
      // The database records the new offset after this returns; make the bytes durable first.
      await handle.datasync();
    } finally {
      await handle.close();
    }
  }

  async assemble(uploadId: string, totalBytes: number, sha256: string): Promise<AssembleResult> {
    const staged = this.uploadPath(uploadId);
    const final = this.photoPath(sha256);
    let receivedBytes: number;
    try {
      receivedBytes = (await stat(staged)).size;
    } catch (err) {
      if (isMissing(err)) return { kind: 'incomplete', receivedBytes: 0 };
      throw err;
    }
    if (receivedBytes !== totalBytes) return { kind: 'incomplete', receivedBytes };
    const hash = createHash('sha256');
    await pipeline(createReadStream(staged), hash);
    const actualSha256 = hash.digest('hex');
    if (actualSha256 !== sha256) {
      await this.discardUpload(uploadId);
      return { kind: 'hash-mismatch', actualSha256 };
    }
    await mkdir(join(this.root, shardOf(sha256)), { recursive: true });
    // Two devices finishing the same photo at once both rename identical bytes onto the same name: the result is
    // one stored photo either way.
    await rename(staged, final);
    return { kind: 'stored', bytes: totalBytes };
  }

  async discardUpload(uploadId: string): Promise<void> {
    await rm(this.uploadPath(uploadId), { force: true });
  }
}
