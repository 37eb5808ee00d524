// The REST routes of one synced collection under /api/clubs/:clubId/<collection>: GET / (newest first;
// ?includeDeleted=true adds soft-deleted ones) · POST / · GET /:id · PATCH /:id · DELETE /:id (soft).
// Reading needs membership; writing needs the collection's ability (event.write for sites and events).
import { Router } from 'express';
import { z } from 'zod';
import { COLLECTIONS, idSchema } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireAbility, requireMembership, requireUser } from '../../http/auth';
import { validate } from '../../http/validate';
import type { RestCollection } from './record-repository';
import type { RecordService } from './record-service';

const bodyObject = z.record(z.string(), z.unknown(), { message: 'send the fields as a JSON object' });
/** A create body: the collection's fields, plus an optional client-generated `id`. */
const createBody = bodyObject.transform((body, ctx) => {
  const { id, ...fields } = body;
  if (id === undefined) return { fields };
  const parsed = idSchema.safeParse(id);
  if (!parsed.success) {
    ctx.addIssue({ code: 'custom', path: ['id'], message: 'id must be a UUID' });
    return z.NEVER;
  }
  return { id: parsed.data, fields };
});

export function recordRouter<C extends RestCollection>(
  deps: AppDeps,
  collection: C,
  service: RecordService<C>,
  listQuery: z.ZodType<{ includeDeleted: boolean; where: Record<string, string> }>,
): Router {
  const router = Router({ mergeParams: true });
  const param = z.object({ clubId: idSchema, id: idSchema });
  const member = [requireUser(deps), requireMembership(deps)];
  const writer = [...member, requireAbility(COLLECTIONS[collection].ability)];

  router.get('/', ...member, validate({ query: listQuery }), async (req, res) => {
    const q = req.query as unknown as { includeDeleted: boolean; where: Record<string, string> };
    res.json(await service.list(req.membership!.clubId, q));
  });
  router.post('/', ...writer, validate({ body: createBody }), async (req, res) => {
    res.status(201).json(await service.create(req.membership!.clubId, req.body));
  });
  router.get('/:id', ...member, validate({ params: param }), async (req, res) => {
    res.json(await service.get(req.membership!.clubId, String(req.params.id)));
  });
  router.patch('/:id', ...writer, validate({ params: param, body: bodyObject }), async (req, res) => {
    res.json(await service.update(req.membership!.clubId, String(req.params.id), req.body));
  });
  router.delete('/:id', ...writer, validate({ params: param }), async (req, res) => {
    await service.remove(req.membership!.clubId, String(req.params.id));
    res.status(204).end();
  });
  return router;
}

const flag = z.enum(['true', 'false'], { message: 'includeDeleted must be true or false' }).transform((v) => v === 'true');
/** The list query every collection accepts, plus the filters it names (each a UUID, e.g. events by siteId). */
export function listQuerySchema(filters: string[] = []) {
  const shape = Object.fromEntries(filters.map((f) => [f, idSchema.optional()]));
  return z
    .strictObject({ includeDeleted: flag.optional(), ...shape })
    .transform(({ includeDeleted, ...rest }) => ({
      includeDeleted: includeDeleted ?? false,
      where: Object.fromEntries(Object.entries(rest).filter(([, v]) => typeof v === 'string')) as Record<string, string>,
    }));
}
