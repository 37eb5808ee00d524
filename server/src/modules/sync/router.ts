// /api/clubs/:clubId/sync/…: push, pull, the lists of refused changes and safety conflicts, settling a conflict
// (leads and admins: plan.write) and dismissing one's own refused change.
// Every member may sync (reading a club's data needs only membership); each mutation is checked against the
// member's role. A request from a newer or older app gets a typed "too old" answer, not an error.
import { Router } from 'express';
import { z } from 'zod';
import { idSchema } from '../../../../shared/schemas';
import {
  PROTOCOL_VERSION,
  checkVersions,
  pullRequestSchema,
  pushRequestSchema,
  problemIdSchema,
  resolveConflictBodySchema,
  type PullResponse,
  type PushResponse,
  type ResolveConflictBody,
} from '../../../../sync/protocol';
import type { AppDeps } from '../../app-deps';
import { requireAbility, requireMembership, requireUser } from '../../http/auth';
import { AppError } from '../../http/errors';
import { validate } from '../../http/validate';
import { pullChanges } from './pull-service';
import { applyPush } from './push-service';
import { AFTER_APPLY_HOOKS } from './after-apply-hooks';
import { SyncProblemsService } from './problems-service';

const versionsOnly = z.object({ protocolVersion: z.number().int(), schemaVersion: z.number().int() });

function versionAnswer(body: unknown): { type: 'client-too-old' | 'server-too-old'; message: string; serverProtocolVersion: number } | null {
  const v = versionsOnly.safeParse(body);
  if (!v.success) throw new AppError('validation_failed', 'invalid', 'a sync request carries protocolVersion and schemaVersion', { issues: v.error.issues });
  const verdict = checkVersions(v.data.protocolVersion, v.data.schemaVersion);
  return verdict.type === 'ok' ? null : { ...verdict, serverProtocolVersion: PROTOCOL_VERSION };
}

const listQuery = z.object({ limit: z.coerce.number().int().min(1).max(500).default(100), recordId: idSchema.optional() });
/** ?open=true (the default) lists the conflicts nobody has settled; ?open=false lists them all. */
const conflictsQuery = listQuery.extend({
  open: z.enum(['true', 'false'], { message: "open must be 'true' or 'false'" }).default('true').transform((v) => v === 'true'),
});

export function syncRouter(deps: AppDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(requireUser(deps), requireMembership(deps));
  const afterApply = AFTER_APPLY_HOOKS.map((hook) => hook(deps));
  const problems = new SyncProblemsService(deps.dataSource);

  router.post('/push', async (req, res) => {
    const tooOld = versionAnswer(req.body);
    if (tooOld) return void res.json(tooOld satisfies PushResponse);
    const body = pushRequestSchema.parse(req.body);
    const m = req.membership!;
    const nowMs = deps.clock.now().getTime();
    const outcome = await applyPush(deps.dataSource, body, { clubId: m.clubId, userId: m.userId, role: m.role, nowMs, logger: deps.logger, afterApply });
    res.json({ type: 'pushed', lastAppliedMutationId: outcome.lastAppliedMutationId, rejected: outcome.rejected, serverTimeMs: deps.clock.now().getTime() } satisfies PushResponse);
  });

  router.post('/pull', async (req, res) => {
    const tooOld = versionAnswer(req.body);
    if (tooOld) return void res.json(tooOld satisfies PullResponse);
    const body = pullRequestSchema.parse(req.body);
    const outcome = await pullChanges(deps.dataSource, req.membership!.clubId, body.cursor, body.limit);
    res.json({ ...outcome, serverTimeMs: deps.clock.now().getTime() } satisfies PullResponse);
  });

  router.get('/rejected', async (req, res) => {
    const q = listQuery.parse(req.query);
    const m = req.membership!;
    res.json(await problems.listRejected(m.clubId, m.userId, q));
  });

  router.post('/rejected/:rejectedId/dismiss', validate({ params: z.object({ clubId: z.string(), rejectedId: problemIdSchema }) }), async (req, res) => {
    const m = req.membership!;
    await problems.dismissRejected(m.clubId, m.userId, String(req.params.rejectedId), deps.clock.now());
    res.status(204).end();
  });

  router.get('/conflicts', async (req, res) => {
    const q = conflictsQuery.parse(req.query);
    res.json(await problems.listConflicts(req.membership!.clubId, q));
  });

  router.post(
    '/conflicts/:conflictId/resolve',
    requireAbility('plan.write'),
    validate({ params: z.object({ clubId: z.string(), conflictId: problemIdSchema }), body: resolveConflictBodySchema }),
    async (req, res) => {
      const m = req.membership!;
      res.json(await problems.resolveConflict(m.clubId, String(req.params.conflictId), m.userId, req.body as ResolveConflictBody, deps.clock.now()));
    },
  );

  return router;
}
