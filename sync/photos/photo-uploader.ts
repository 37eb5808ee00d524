import { PHOTO_CHUNK_DEFAULT_BYTES } from '../../shared/schemas';
import { type PhotoApi, PhotoApiError } from './photo-api';
import { sha256Hex } from './sha256';
import type { PhotoStore, QueuedPhoto } from './types';

/*
 * Uploads one waiting photo: ask whether the server has it; resume the upload this device started (its id is
 * kept in the queue entry) or start one; send chunks from the offset the server reports; finish. The server's
 * offset is the truth: after any cut the uploader asks for it rather than assuming. The local bytes are kept
 * until the server answers "stored", and only then is the photo marked uploaded.
 */

export type UploadOutcome =
  | { kind: 'uploaded' }
  /** Try again later (no network, server trouble, session expired); progress so far is kept. */
  | { kind: 'retry'; reason: string }
  /** The server refuses this photo for good (e.g. not an image, role may not upload); it stays on the device. */
  | { kind: 'refused'; reason: string };

export interface UploaderOptions {
  store: PhotoStore;
  api: PhotoApi;
  clubId: string;
  chunkBytes?: number;
  now?: () => number;
}

/** Upper bound on fresh starts within one attempt (the server forgot the upload, or the hash did not match). */
const MAX_RESTARTS = 2;

export async function uploadPhoto(photo: QueuedPhoto, o: UploaderOptions): Promise<UploadOutcome> {
  const now = o.now ?? Date.now;
  const chunkBytes = o.chunkBytes ?? PHOTO_CHUNK_DEFAULT_BYTES;
  const { store, api, clubId } = o;
  const { sha256 } = photo;
  const done = async (): Promise<UploadOutcome> => {
    await store.markUploaded(clubId, sha256, now());
    return { kind: 'uploaded' };
  };
  try {
    if (await api.has(sha256)) return await done();
    const data = await store.bytes(clubId, sha256);
    if (!data) return { kind: 'refused', reason: 'the photo’s bytes are missing from this device' };
    if (sha256Hex(data) !== sha256) return { kind: 'refused', reason: 'the copy on this device is damaged and cannot be sent' };
    let uploadId = photo.uploadId;
    let offset = 0;
    let restarts = 0;
    if (uploadId) {
      const s = await api.state(sha256, uploadId);
      if (s?.state === 'stored') return await done();
      if (s) offset = s.receivedBytes;
      else uploadId = null;
    }
    for (;;) {
      if (!uploadId) {
        if (restarts++ > MAX_RESTARTS) return { kind: 'retry', reason: 'the server keeps dropping this upload' };
        const s = await api.start(sha256, data.byteLength, photo.mimeType);
        if (s.state === 'stored') return await done();
        uploadId = s.uploadId;
        offset = s.receivedBytes;
        await store.recordProgress(clubId, sha256, { uploadId });
      }
      const answer =
        offset < data.byteLength
          ? await api.putChunk(sha256, uploadId, offset, data.subarray(offset, Math.min(offset + chunkBytes, data.byteLength)))
          : await api.complete(sha256, uploadId);
      if (answer.kind === 'gone') {
        uploadId = null;
        continue;
      }
      if (answer.kind === 'rewind') {
        offset = answer.receivedBytes;
        continue;
      }
      if (answer.state.state === 'stored') return await done();
      offset = answer.state.receivedBytes;
    }
  } catch (err) {
    if (err instanceof PhotoApiError) {
      if (err.code === 'hash_mismatch') {
        // The server got different bytes than the device holds (damaged on the way): the server has discarded
        // them; the next attempt starts over.
        await store.recordProgress(clubId, sha256, { uploadId: null });
        return { kind: 'retry', reason: 'the photo arrived damaged; it will be sent again' };
      }
      if (err.retryable) return { kind: 'retry', reason: err.code === 'offline' ? 'no connection to the server' : err.message };
      return { kind: 'refused', reason: err.message };
    }
    throw err;
  }
}
