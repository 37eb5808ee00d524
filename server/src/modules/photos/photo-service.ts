// The photo upload job, in the order a phone does it: is it here already? start an upload; send chunks at the
// offset the server has reached; finish, which checks the SHA-256 before the club gets the photo.
// Each chunk and each finish runs with the upload's row locked, so two retries of the same chunk cannot interleave.
import type { Readable } from 'node:stream';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { PHOTO_CHUNK_MAX_BYTES, type PhotoUploadCreate, type PhotoUploadState } from '../../../../shared/schemas';
import type { Clock } from '../../app-deps';
import { AppError } from '../../http/errors';
import { SIGNATURE_BYTES, matchesImageType } from './image-signature';
import type { PhotoObjectRow, PhotoRepository, PhotoUploadRow } from './photo-repository';
import type { PhotoStorage } from './photo-storage';

/** An upload nobody has touched for this long is abandoned: its chunks are removed when the next upload starts. */
export const STALE_UPLOAD_MS = 7 * 24 * 3600 * 1000;
const PRUNE_BATCH = 20;

export interface PhotoActor {
  clubId: string;
  userId: string;
}

const photoNotFound = () => new AppError('not_found', 'not_found', 'photo not found');
const uploadNotFound = () =>
  new AppError('upload_not_found', 'not_found', 'this upload is unknown or was finished or abandoned: start a new upload');

const stored = (o: PhotoObjectRow): PhotoUploadState => ({ state: 'stored', sha256: o.sha256, bytes: o.bytes });
const uploading = (u: PhotoUploadRow, receivedBytes = u.receivedBytes): PhotoUploadState => ({
  state: 'uploading',
  uploadId: u.id,
  sha256: u.sha256,
  bytes: u.bytes,
  receivedBytes,
  chunkMaxBytes: PHOTO_CHUNK_MAX_BYTES,
});

export class PhotoService {
  constructor(
    private readonly ds: DataSource,
    private readonly storage: PhotoStorage,
    private readonly repo: PhotoRepository,
    private readonly clock: Clock,
    private readonly logger: Logger,
  ) {}

  /** The club's photo (size and type), or 404. */
  async stat(clubId: string, sha256: string): Promise<PhotoObjectRow> {
    const o = await this.repo.findObject(this.ds.manager, clubId, sha256);
    if (!o) throw photoNotFound();
    return o;
  }

  async open(clubId: string, sha256: string): Promise<{ object: PhotoObjectRow; stream: Readable }> {
    const object = await this.stat(clubId, sha256);
    const stream = await this.storage.get(sha256);
    if (!stream) {
      // Listed for the club but missing from storage: someone removed files behind the server's back.
      this.logger.error({ clubId, sha256, storage: this.storage.kind }, 'photo listed but missing from storage');
      throw photoNotFound();
    }
    return { object, stream };
  }

  /** Starts an upload, or answers "stored" when the club already has this photo (the same photo twice is a no-op). */
  async start(actor: PhotoActor, sha256: string, body: PhotoUploadCreate): Promise<{ created: boolean; state: PhotoUploadState }> {
    const known = await this.repo.findObject(this.ds.manager, actor.clubId, sha256);
    if (known) return { created: false, state: stored(known) };
    await this.pruneStale();
    const u = await this.repo.createUpload(this.ds.manager, { ...actor, sha256, ...body, now: this.clock.now() });
    return { created: true, state: uploading(u) };
  }

  /** How far an upload has come, to resume after a cut. */
  async state(actor: PhotoActor, sha256: string, uploadId: string): Promise<PhotoUploadState> {
    const known = await this.repo.findObject(this.ds.manager, actor.clubId, sha256);
    if (known) return stored(known);
    const u = await this.repo.findUpload(this.ds.manager, actor.clubId, sha256, uploadId, false);
    if (!u) throw uploadNotFound();
    return uploading(u);
  }

  async writeChunk(actor: PhotoActor, sha256: string, uploadId: string, offsetBytes: number, data: Buffer): Promise<PhotoUploadState> {
    if (data.length === 0) throw new AppError('empty_chunk', 'invalid', 'send the chunk bytes as the request body (Content-Type: application/octet-stream)');
    return this.ds.transaction(async (em) => {
      const u = await this.repo.findUpload(em, actor.clubId, sha256, uploadId, true);
      if (!u) {
        const known = await this.repo.findObject(em, actor.clubId, sha256);
        if (known) return stored(known);
        throw uploadNotFound();
      }
      if (offsetBytes !== u.receivedBytes) {
        throw new AppError('offset_mismatch', 'conflict', `the server has ${u.receivedBytes} bytes of this photo: send the chunk that starts there`, {
          receivedBytes: u.receivedBytes,
        });
      }
      if (offsetBytes + data.length > u.bytes) {
        throw new AppError('chunk_past_end', 'invalid', `this chunk ends at byte ${offsetBytes + data.length}, past the declared ${u.bytes} bytes`);
      }
      if (offsetBytes === 0) {
        const needed = Math.min(SIGNATURE_BYTES, u.bytes);
        if (data.length < needed || !matchesImageType(data.subarray(0, needed), u.mimeType)) {
          throw new AppError('not_an_image', 'invalid', `the file does not start like a ${u.mimeType} image`);
        }
      }
      await this.storage.writeChunk(uploadId, offsetBytes, data);
      const receivedBytes = offsetBytes + data.length;
      await this.repo.setReceived(em, uploadId, receivedBytes, this.clock.now());
      return uploading(u, receivedBytes);
    });
  }

  /** Finishes an upload: the photo is the club's only if the bytes hash to `sha256`. */
  async complete(actor: PhotoActor, sha256: string, uploadId: string): Promise<PhotoUploadState> {
    const outcome = await this.ds.transaction(async (em) => {
      const u = await this.repo.findUpload(em, actor.clubId, sha256, uploadId, true);
      if (!u) {
        // A finish retried after its answer was lost lands here: the photo is already the club's.
        const known = await this.repo.findObject(em, actor.clubId, sha256);
        if (known) return { kind: 'stored' as const, state: stored(known) };
        throw uploadNotFound();
      }
      if (u.receivedBytes !== u.bytes) {
        throw new AppError('upload_incomplete', 'conflict', `the server has ${u.receivedBytes} of ${u.bytes} bytes: send the rest first`, {
          receivedBytes: u.receivedBytes,
        });
      }
      const result = await this.storage.assemble(uploadId, u.bytes, sha256);
      if (result.kind === 'incomplete') {
        // Storage lost chunks it had acknowledged (a crash before they reached disk): rewind to what it holds.
        this.logger.warn({ uploadId, expected: u.bytes, held: result.receivedBytes }, 'photo upload rewound to what storage holds');
        await this.repo.setReceived(em, uploadId, result.receivedBytes, this.clock.now());
        return { kind: 'incomplete' as const, receivedBytes: result.receivedBytes };
      }
      await this.repo.deleteUpload(em, uploadId);
      if (result.kind === 'hash-mismatch') return { kind: 'mismatch' as const, actualSha256: result.actualSha256 };
      const object: PhotoObjectRow = { sha256, bytes: u.bytes, mimeType: u.mimeType };
      await this.repo.insertObject(em, actor.clubId, object, actor.userId);
      return { kind: 'stored' as const, state: stored(object) };
    });
    // Errors are thrown after the transaction so that the rewind or the removal of a bad upload is kept.
    if (outcome.kind === 'incomplete') {
      throw new AppError('upload_incomplete', 'conflict', `the server holds ${outcome.receivedBytes} bytes of this photo: resend from there`, {
        receivedBytes: outcome.receivedBytes,
      });
    }
    if (outcome.kind === 'mismatch') {
      throw new AppError('hash_mismatch', 'invalid', 'the bytes received do not match the photo’s SHA-256: the upload was discarded, start again', {
        expectedSha256: sha256,
        actualSha256: outcome.actualSha256,
      });
    }
    return outcome.state;
  }

  /** Removes a few abandoned uploads; never fails the request that triggered it. */
  private async pruneStale(): Promise<void> {
    try {
      await this.ds.transaction(async (em) => {
        const before = new Date(this.clock.now().getTime() - STALE_UPLOAD_MS);
        for (const u of await this.repo.staleUploads(em, before, PRUNE_BATCH)) {
          await this.storage.discardUpload(u.id);
          await this.repo.deleteUpload(em, u.id);
        }
      });
    } catch (err) {
      this.logger.warn({ err }, 'could not prune abandoned photo uploads');
    }
  }
}
