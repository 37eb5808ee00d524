// Where photo bytes live on the server. Photos are content-addressed by their SHA-256, so a stored photo never
// changes and storing the same bytes twice is harmless (the second write replaces identical bytes).
// An upload arrives in chunks under an upload id; `assemble` checks the hash and only then makes the photo visible.
import type { Readable } from 'node:stream';

export const SHA256_PATTERN = /^[0-9a-f]{64}$/;
const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export type AssembleResult =
  | { kind: 'stored'; bytes: number }
  /** The bytes received hash to something other than what the client declared. The chunks are discarded. */
  | { kind: 'hash-mismatch'; actualSha256: string }
  /** Fewer (or more) bytes than declared are on hand. Nothing is discarded: the client can resume. */
  | { kind: 'incomplete'; receivedBytes: number };

export interface PhotoStorage {
  readonly kind: 'fs' | 's3';
  has(sha256: string): Promise<boolean>;
  /** Size in bytes of a stored photo, or null when it is not stored. */
  size(sha256: string): Promise<number | null>;
  /** The bytes of a stored photo as a stream, or null when it is not stored. */
  get(sha256: string): Promise<Readable | null>;
  /** Writes one chunk of an upload at its byte offset. Writing the same offset again replaces that chunk. */
  writeChunk(uploadId: string, offsetBytes: number, data: Buffer): Promise<void>;
  /** Joins the chunks of an upload, checks their SHA-256 and, if it matches, stores the photo under it. */
  assemble(uploadId: string, totalBytes: number, sha256: string): Promise<AssembleResult>;
  /** Removes whatever an upload left behind (no error when there is nothing). */
  discardUpload(uploadId: string): Promise<void>;
}

/**
 * Storage keys come from request parameters: refuse anything but a hash or a UUID before it reaches a path or a
 * bucket key (the router validates too; this is the second lock on the same door).
 */
export function assertSha256(sha256: string): void {
  if (!SHA256_PATTERN.test(sha256)) throw new Error(`not a SHA-256 hex digest: ${JSON.stringify(sha256)}`);
}

export function assertUploadId(uploadId: string): void {
  if (!UUID_PATTERN.test(uploadId)) throw new Error(`not an upload id: ${JSON.stringify(uploadId)}`);
}

/** Photos are spread over 256 folders by the first two hex digits, so no folder grows past a few thousand files. */
export function shardOf(sha256: string): string {
  return sha256.slice(0, 2);
}
