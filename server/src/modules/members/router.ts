// GET /api/clubs/:clubId/members (any member) · PATCH and DELETE /api/clubs/:clubId/members/:userId {role} (admin)
import { Router } from 'express';
import { z } from 'zod';
import { idSchema, memberRoleUpdateSchema } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireAbility, requireMembership, requireUser } from '../../http/auth';
import { validate } from '../../http/validate';
import { ClubRepository } from '../clubs/club-repository';
import { MemberRepository } from './member-repository';
import { MemberService } from './member-service';

const memberParams = z.object({ clubId: idSchema, userId: idSchema });

export function membersRouter(deps: AppDeps): Router {
  const service = new MemberService(deps.dataSource, new ClubRepository(deps.dataSource), new MemberRepository(deps.dataSource));
  const router = Router({ mergeParams: true });
  const member = [requireUser(deps), requireMembership(deps)];
  const admin = [...member, requireAbility('club.manage')];

  router.get('/', ...member, async (req, res) => {
    res.json(await service.list(req.membership!.clubId));
  });
  router.patch('/:userId', ...admin, validate({ params: memberParams, body: memberRoleUpdateSchema }), async (req, res) => {
    res.json(await service.changeRole(req.membership!.clubId, String(req.params.userId), req.body.role));
  });
  router.delete('/:userId', ...admin, validate({ params: memberParams }), async (req, res) => {
    await service.remove(req.membership!.clubId, String(req.params.userId));
    res.status(204).end();
  });
  return router;
}
