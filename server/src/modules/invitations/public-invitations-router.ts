// Invitee side, under /api/invitations: GET /:token (public preview) · POST /accept {token, signUp?} → Tokens.
import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import { inviteAcceptSchema } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import { requireUser } from '../../http/auth';
import { validate } from '../../http/validate';
import { InvitationService } from './invitation-service';

const tokenParams = z.object({ token: z.string().min(20, 'this invitation link is not valid').max(500, 'this invitation link is not valid') });

/** Checks the bearer token when one is sent (a bad one is still a 401), and lets anonymous callers through. */
function optionalUser(deps: AppDeps): RequestHandler {
  const guard = requireUser(deps);
  return (req, res, next) => (req.headers.authorization ? guard(req, res, next) : next());
}

export function publicInvitationsRouter(deps: AppDeps): Router {
  const service = new InvitationService(deps);
  const router = Router();

  router.post('/accept', optionalUser(deps), validate({ body: inviteAcceptSchema }), async (req, res) => {
    res.json(await service.accept(req.body, req.user ?? null));
  });
  router.get('/:token', validate({ params: tokenParams }), async (req, res) => {
    res.json(await service.preview(String(req.params.token)));
  });
  return router;
}
