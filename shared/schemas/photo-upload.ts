import { z } from 'zod';
import { idSchema } from './common';
import { photoFieldsSchema } from './records';

/*
 * The photo upload API (under /api/clubs/:clubId/photos/:sha256). Photo bytes travel apart from the records:
 * the phone asks whether the server already has a photo, uploads it in chunks it can resume after a cut, and
 * the server checks the SHA-256 before it keeps anything.
 */

/** The largest chunk the server accepts in one PUT. */
export const PHOTO_CHUNK_MAX_BYTES = 1_048_576;
/** What the phone sends per PUT: small enough to get through a weak signal, large enough not to waste requests. */
export const PHOTO_CHUNK_DEFAULT_BYTES = 256 * 1024;

export const sha256Schema = photoFieldsSchema.shape.sha256;
export const photoMimeTypeSchema = photoFieldsSchema.shape.mimeType;
export type PhotoMimeType = z.infer<typeof photoMimeTypeSchema>;

/** POST …/photos/:sha256/uploads — start (or find out there is no need to start) an upload. */
export const photoUploadCreateSchema = z.strictObject({
  bytes: photoFieldsSchema.shape.bytes,
  mimeType: photoMimeTypeSchema,
});
export type PhotoUploadCreate = z.infer<typeof photoUploadCreateSchema>;

/** PUT …/photos/:sha256/uploads/:uploadId?offset=N — the byte offset this chunk starts at. */
export const photoChunkQuerySchema = z.object({
  offset: z.coerce.number({ message: 'offset must be a number of bytes' }).int().min(0, 'offset must be 0 or more'),
});

/** Every upload answer: either the club has the photo, or this is how far the upload has come. */
export const photoUploadStateSchema = z.discriminatedUnion('state', [
  z.object({ state: z.literal('stored'), sha256: sha256Schema, bytes: z.number().int().positive() }),
  z.object({
    state: z.literal('uploading'),
    uploadId: idSchema,
    sha256: sha256Schema,
    bytes: z.number().int().positive(),
    receivedBytes: z.number().int().min(0),
    chunkMaxBytes: z.number().int().positive(),
  }),
]);
export type PhotoUploadState = z.infer<typeof photoUploadStateSchema>;
