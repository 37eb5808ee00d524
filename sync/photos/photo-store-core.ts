import { type NewPhoto, type PhotoStore, type PhotoTxRunner, type QueuedPhoto, photoKey, queuedPhotoSchema } from './types';

/*
 * The PhotoStore logic, written once over a transaction runner; idb-photo-store and memory-photo-store only
 * supply the transactions. Every entry read from storage is parsed: a damaged entry is an error, never data.
 */

const parse = (v: unknown): QueuedPhoto | null => (v === undefined || v === null ? null : queuedPhotoSchema.parse(v));

/** A copy of exactly the bytes of the view (a Uint8Array may be a window onto a larger buffer). */
const ownBuffer = (data: Uint8Array): ArrayBuffer => data.slice().buffer as ArrayBuffer;

function entryFor(photo: NewPhoto, state: QueuedPhoto['state'], nowMs: number): QueuedPhoto {
  return {
    key: photoKey(photo.clubId, photo.sha256),
    clubId: photo.clubId,
    sha256: photo.sha256,
    mimeType: photo.mimeType,
    bytes: photo.data.byteLength,
    state,
    uploadId: null,
    addedAtMs: nowMs,
    uploadedAtMs: state === 'waiting' ? null : nowMs,
    attempts: 0,
    lastError: null,
  };
}

export function createPhotoStoreFromTx(run: PhotoTxRunner, close: () => Promise<void>): PhotoStore {
  return {
    add: (photo, nowMs) =>
      run('readwrite', async (tx) => {
        const key = photoKey(photo.clubId, photo.sha256);
        const known = parse(await tx.getEntry(key));
        if (known?.state === 'downloaded') {
          // Taken again after it was seen from the server: the server has it, nothing to upload.
          const uploaded = { ...known, state: 'uploaded' as const };
          await tx.putEntry(uploaded);
          return uploaded;
        }
        if (known) return known;
        const entry = entryFor(photo, 'waiting', nowMs);
        await tx.putBytes(key, ownBuffer(photo.data));
        await tx.putEntry(entry);
        return entry;
      }),

    cacheDownloaded: (photo, nowMs) =>
      run('readwrite', async (tx) => {
        const key = photoKey(photo.clubId, photo.sha256);
        if (parse(await tx.getEntry(key))) return;
        await tx.putBytes(key, ownBuffer(photo.data));
        await tx.putEntry(entryFor(photo, 'downloaded', nowMs));
      }),

    get: (clubId, sha256) => run('readonly', async (tx) => parse(await tx.getEntry(photoKey(clubId, sha256)))),

    bytes: (clubId, sha256) =>
      run('readonly', async (tx) => {
        const b = await tx.getBytes(photoKey(clubId, sha256));
        return b ? new Uint8Array(b) : null;
      }),

    waiting: (clubId) =>
      run('readonly', async (tx) =>
        (await tx.entriesOfClub(clubId))
          .map((v) => queuedPhotoSchema.parse(v))
          .filter((e) => e.state === 'waiting')
          .sort((a, b) => a.addedAtMs - b.addedAtMs || a.sha256.localeCompare(b.sha256)),
      ),

    countWaiting: (clubId) =>
      run('readonly', async (tx) => (await tx.entriesOfClub(clubId)).filter((v) => queuedPhotoSchema.parse(v).state === 'waiting').length),

    recordProgress: (clubId, sha256, progress) =>
      run('readwrite', async (tx) => {
        const known = parse(await tx.getEntry(photoKey(clubId, sha256)));
        if (known) await tx.putEntry({ ...known, ...progress });
      }),

    markUploaded: (clubId, sha256, nowMs) =>
      run('readwrite', async (tx) => {
        const known = parse(await tx.getEntry(photoKey(clubId, sha256)));
        if (!known || known.state !== 'waiting') return;
        await tx.putEntry({ ...known, state: 'uploaded', uploadId: null, uploadedAtMs: nowMs, attempts: 0, lastError: null });
      }),

    close,
  };
}
