import { z } from 'zod';
import { idSchema, photoMimeTypeSchema, sha256Schema } from '../../shared/schemas';

/*
 * Photos on the device: the bytes under their SHA-256 and, beside them, where each one stands in the upload queue.
 * A photo the person took stays "waiting" until the server confirms it holds the same bytes; only then is it
 * "uploaded". Photos fetched from the server to look at are kept as "downloaded" so that they show offline too.
 */

export const PHOTO_STATES = ['waiting', 'uploaded', 'downloaded'] as const;
export type PhotoState = (typeof PHOTO_STATES)[number];

export const queuedPhotoSchema = z.strictObject({
  /** `${clubId}/${sha256}`: the same photo attached in two clubs is two entries. */
  key: z.string(),
  clubId: idSchema,
  sha256: sha256Schema,
  mimeType: photoMimeTypeSchema,
  bytes: z.number().int().positive(),
  state: z.enum(PHOTO_STATES),
  /** The server's upload in progress, kept so that a cut upload resumes where it stopped. */
  uploadId: idSchema.nullable(),
  addedAtMs: z.number(),
  uploadedAtMs: z.number().nullable(),
  /** Failed upload attempts since the last success (drives the backoff). */
  attempts: z.number().int().min(0),
  /** Why the last attempt failed, in words a person can act on; null when it did not fail. */
  lastError: z.string().nullable(),
});
export type QueuedPhoto = z.infer<typeof queuedPhotoSchema>;

export interface NewPhoto {
  clubId: string;
  sha256: string;
  mimeType: QueuedPhoto['mimeType'];
  data: Uint8Array;
}

export type PhotoProgress = Partial<Pick<QueuedPhoto, 'uploadId' | 'attempts' | 'lastError'>>;

export const photoKey = (clubId: string, sha256: string) => `${clubId}/${sha256}`;

/**
 * The device's photo database. Every method is one transaction; bytes and queue entry are written together, so
 * a crash never leaves a queued photo without its bytes.
 */
export interface PhotoStore {
  /** Keeps the bytes and queues them for upload. A photo already on the device is left as it is and returned. */
  add(photo: NewPhoto, nowMs: number): Promise<QueuedPhoto>;
  /** Keeps bytes fetched from the server (nothing to upload). */
  cacheDownloaded(photo: NewPhoto, nowMs: number): Promise<void>;
  get(clubId: string, sha256: string): Promise<QueuedPhoto | null>;
  bytes(clubId: string, sha256: string): Promise<Uint8Array | null>;
  /** Photos of a club still to upload, oldest first. */
  waiting(clubId: string): Promise<QueuedPhoto[]>;
  countWaiting(clubId: string): Promise<number>;
  recordProgress(clubId: string, sha256: string, progress: PhotoProgress): Promise<void>;
  /** The server confirmed it holds the photo: it leaves the queue (the bytes stay, to show offline). */
  markUploaded(clubId: string, sha256: string, nowMs: number): Promise<void>;
  close(): Promise<void>;
}

/** The few operations each storage technology provides inside one transaction. */
export interface PhotoStoreTx {
  getEntry(key: string): Promise<unknown>;
  putEntry(entry: QueuedPhoto): Promise<void>;
  entriesOfClub(clubId: string): Promise<unknown[]>;
  getBytes(key: string): Promise<ArrayBuffer | undefined>;
  putBytes(key: string, data: ArrayBuffer): Promise<void>;
}

export type PhotoTxRunner = <T>(mode: 'readonly' | 'readwrite', fn: (tx: PhotoStoreTx) => Promise<T>) => Promise<T>;
