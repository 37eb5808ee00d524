// POST /api/clubs (creator becomes admin) · GET /api/clubs (mine, with my role) · GET /api/clubs/:clubId ·
// PATCH /api/clubs/:clubId {name?, callSign?} (club.manage)
import { Router } from 'express';
import { clubCreateSchema, clubUpdateSchema } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireAbility, requireMembership, requireUser } from '../../http/auth';
import { validate } from '../../http/validate';
import { ClubRepository } from './club-repository';
import { ClubService } from './club-service';

export function clubsRouter(deps: AppDeps): Router {
  const service = new ClubService(new ClubRepository(deps.dataSource));
  const router = Router();
  const signedIn = requireUser(deps);

  router.post('/', signedIn, validate({ body: clubCreateSchema }), async (req, res) => {
    res.status(201).json(await service.create(req.user!.id, req.body));
  });
  router.get('/', signedIn, async (req, res) => {
    res.json(await service.listMine(req.user!.id));
  });
  router.get('/:clubId', signedIn, requireMembership(deps), async (req, res) => {
    res.json(await service.get(req.membership!.clubId, req.user!.id));
  });
  router.patch('/:clubId', signedIn, requireMembership(deps), requireAbility('club.manage'), validate({ body: clubUpdateSchema }), async (req, res) => {
    res.json(await service.update(req.membership!.clubId, req.user!.id, req.body));
  });
  return router;
}
