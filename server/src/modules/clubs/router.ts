// POST /api/clubs (creator becomes admin) · GET /api/clubs (mine, with my role) · GET /api/clubs/:clubId
import { Router } from 'express';
import { clubCreateSchema } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireMembership, requireUser } from '../../http/auth';
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
  return router;
}
