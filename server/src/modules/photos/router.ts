// Photos of a club, under /api/clubs/:clubId/photos/:sha256 (member to read; survey.write to upload):
//   HEAD …/:sha256                       → 200 with Content-Length and Content-Type, or 404
//   GET  …/:sha256                       → the bytes
//   POST …/:sha256/uploads {bytes, mimeType}          → 201 uploading | 200 stored (already have it)
//   GET  …/:sha256/uploads/:uploadId                  → how far it has come (to resume)
//   PUT  …/:sha256/uploads/:uploadId?offset=N  (raw)  → the new offset; 409 offset_mismatch with the right one
//   POST …/:sha256/uploads/:uploadId/complete         → stored; 400 hash_mismatch when the bytes are not the photo
import express, { Router } from 'express';
import { pipeline } from 'node:stream/promises';
import { z } from 'zod';
import {
  PHOTO_CHUNK_MAX_BYTES,
  idSchema,
  photoChunkQuerySchema,
  photoUploadCreateSchema,
  sha256Schema,
} from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireAbility, requireMembership, requireUser } from '../../http/auth';
import { validate } from '../../http/validate';
import { PhotoRepository } from './photo-repository';
import { type PhotoActor, PhotoService } from './photo-service';
import type { PhotoStorage } from './photo-storage';
import { photoStorageFromEnv } from './photo-storage-config';

const photoParams = z.object({ clubId: idSchema, sha256: sha256Schema });
const uploadParams = photoParams.extend({ uploadId: idSchema });

// A photo's bytes never change (the address is their hash): the browser may keep them as long as it likes,
// but only for this signed-in person (private), since the request carried a token.
const IMMUTABLE = 'private, max-age=31536000, immutable';

function actorOf(req: express.Request): PhotoActor {
  return { clubId: req.membership!.clubId, userId: req.membership!.userId };
}

export function photosRouter(deps: AppDeps, storage: PhotoStorage = photoStorageFromEnv(process.env, deps.config.dataDir)): Router {
  const service = new PhotoService(deps.dataSource, storage, new PhotoRepository(), deps.clock, deps.logger);
  const router = Router({ mergeParams: true });
  const member = [requireUser(deps), requireMembership(deps)];
  const writer = [...member, requireAbility('survey.write')];
  const sha = (req: express.Request) => String(req.params.sha256);
  const uploadId = (req: express.Request) => String(req.params.uploadId);

  router.head('/:sha256', ...member, validate({ params: photoParams }), async (req, res) => {
    const o = await service.stat(actorOf(req).clubId, sha(req));
    res.set({ 'Content-Type': o.mimeType, 'Content-Length': String(o.bytes), ETag: `"${o.sha256}"`, 'Cache-Control': IMMUTABLE });
    res.status(200).end();
  });

  router.get('/:sha256', ...member, validate({ params: photoParams }), async (req, res) => {
    const { object, stream } = await service.open(actorOf(req).clubId, sha(req));
    res.set({ 'Content-Type': object.mimeType, 'Content-Length': String(object.bytes), ETag: `"${object.sha256}"`, 'Cache-Control': IMMUTABLE });
    await pipeline(stream, res);
  });

  router.post('/:sha256/uploads', ...writer, validate({ params: photoParams, body: photoUploadCreateSchema }), async (req, res) => {
    const { created, state } = await service.start(actorOf(req), sha(req), req.body);
    res.status(created ? 201 : 200).json(state);
  });

  router.get('/:sha256/uploads/:uploadId', ...writer, validate({ params: uploadParams }), async (req, res) => {
    res.json(await service.state(actorOf(req), sha(req), uploadId(req)));
  });

  router.put(
    '/:sha256/uploads/:uploadId',
    ...writer,
    validate({ params: uploadParams, query: photoChunkQuerySchema }),
    // Any content type: the chunk is raw bytes. Over the limit → 413 from the error middleware.
    express.raw({ type: () => true, limit: PHOTO_CHUNK_MAX_BYTES }),
    async (req, res) => {
      const body = Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0);
      const { offset } = req.query as unknown as z.infer<typeof photoChunkQuerySchema>;
      res.json(await service.writeChunk(actorOf(req), sha(req), uploadId(req), offset, body));
    },
  );

  router.post('/:sha256/uploads/:uploadId/complete', ...writer, validate({ params: uploadParams }), async (req, res) => {
    res.json(await service.complete(actorOf(req), sha(req), uploadId(req)));
  });

  return router;
}
