// /api/clubs/:clubId/sync/…: push, pull, and the lists of refused changes and safety conflicts.
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
  type ConflictEntry,
  type PullResponse,
  type PushResponse,
  type RejectedEntry,
} from '../../../../sync/protocol';
import type { AppDeps } from '../../app-deps';
import { requireMembership, requireUser } from '../../http/auth';
import { AppError } from '../../http/errors';
import { pullChanges } from './pull-service';
import { applyPush } from './push-service';
import { AFTER_APPLY_HOOKS } from './after-apply-hooks';

const versionsOnly = z.object({ protocolVersion: z.number().int(), schemaVersion: z.number().int() });

function versionAnswer(body: unknown): { type: 'client-too-old' | 'server-too-old'; message: string; serverProtocolVersion: number } | null {
  const v = versionsOnly.safeParse(body);
  if (!v.success) throw new AppError('validation_failed', 'invalid', 'a sync request carries protocolVersion and schemaVersion', { issues: v.error.issues });
  const verdict = checkVersions(v.data.protocolVersion, v.data.schemaVersion);
  return verdict.type === 'ok' ? null : { ...verdict, serverProtocolVersion: PROTOCOL_VERSION };
}

const listQuery = z.object({ limit: z.coerce.number().int().min(1).max(500).default(100), recordId: idSchema.optional() });
const iso = (v: unknown) => new Date(String(v)).toISOString();

export function syncRouter(deps: AppDeps): Router {
  const router = Router({ mergeParams: true });
  router.use(requireUser(deps), requireMembership(deps));
  const afterApply = AFTER_APPLY_HOOKS.map((hook) => hook(deps));

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
    const rows: Record<string, unknown>[] = await deps.dataSource.query(
      `SELECT id, device_id, mutation_id, collection, record_id, op, fields, clock, code, message, details, created_at FROM sync_rejected
       WHERE club_id = $1 AND user_id = $2 AND ($3::uuid IS NULL OR record_id = $3) ORDER BY id DESC LIMIT $4`,
      [m.clubId, m.userId, q.recordId ?? null, q.limit],
    );
    const list: RejectedEntry[] = rows.map((r) => ({
      id: String(r.id),
      deviceId: String(r.device_id),
      mutationId: Number(r.mutation_id),
      collection: r.collection as RejectedEntry['collection'],
      recordId: String(r.record_id),
      op: r.op as RejectedEntry['op'],
      fields: r.fields as Record<string, unknown>,
      clock: String(r.clock),
      code: r.code as RejectedEntry['code'],
      message: String(r.message),
      ...(r.details == null ? {} : { details: r.details }),
      createdAt: iso(r.created_at),
    }));
    res.json(list);
  });

  router.get('/conflicts', async (req, res) => {
    const q = listQuery.parse(req.query);
    const rows: Record<string, unknown>[] = await deps.dataSource.query(
      `SELECT id, collection, record_id, field, kept_value, kept_clock, kept_by, other_value, other_clock, other_by, created_at FROM sync_conflicts
       WHERE club_id = $1 AND ($2::uuid IS NULL OR record_id = $2) ORDER BY id DESC LIMIT $3`,
      [req.membership!.clubId, q.recordId ?? null, q.limit],
    );
    const list: ConflictEntry[] = rows.map((r) => ({
      id: String(r.id),
      collection: r.collection as ConflictEntry['collection'],
      recordId: String(r.record_id),
      field: String(r.field),
      keptValue: r.kept_value,
      keptClock: String(r.kept_clock),
      keptBy: (r.kept_by as string | null) ?? null,
      otherValue: r.other_value,
      otherClock: String(r.other_clock),
      otherBy: (r.other_by as string | null) ?? null,
      createdAt: iso(r.created_at),
    }));
    res.json(list);
  });

  return router;
}
