// Admin side, under /api/clubs/:clubId/invitations: POST {email, role} → 201 (e-mails the link) · GET · DELETE /:invitationId
import { Router } from 'express';
import { z } from 'zod';
import { idSchema, inviteCreateSchema } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireAbility, requireMembership, requireUser } from '../../http/auth';
import { validate } from '../../http/validate';
import { InvitationService } from './invitation-service';

const invitationParams = z.object({ clubId: idSchema, invitationId: idSchema });

export function clubInvitationsRouter(deps: AppDeps): Router {
  const service = new InvitationService(deps);
  const router = Router({ mergeParams: true });
  const admin = [requireUser(deps), requireMembership(deps), requireAbility('club.manage')];

  router.post('/', ...admin, validate({ body: inviteCreateSchema }), async (req, res) => {
    res.status(201).json(await service.create(req.membership!.clubId, req.user!, req.body));
  });
  router.get('/', ...admin, async (req, res) => {
    res.json(await service.list(req.membership!.clubId));
  });
  router.delete('/:invitationId', ...admin, validate({ params: invitationParams }), async (req, res) => {
    await service.revoke(req.membership!.clubId, String(req.params.invitationId));
    res.status(204).end();
  });
  return router;
}
