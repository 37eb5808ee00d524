// Push: apply one device's batch of mutations in ONE transaction. Mutations at or below the device's last
// applied id are skipped (a retried or duplicated push changes nothing); the new last id is stored in the same
// transaction as the changes, so "applied" and "remembered as applied" commit together.
import type { Logger } from 'pino';
import type { DataSource, EntityManager } from 'typeorm';
import { COLLECTIONS, type CollectionName, type Role } from '../../../../shared/schemas';
import {
  appendOnlyRefusal,
  checkEditedFields,
  checkNewRecordFields,
  clampClock,
  decodeHlc,
  fieldShape,
  type Mutation,
  type PushRequest,
  type Rejection,
} from '../../../../sync/protocol';
import { CHANGE_SEQ_LOCK_KEY } from '../../db/synced-columns';
import { AppError } from '../../http/errors';
import { mergeMutation, newRow, type FieldConflict } from './merge';
import { rowFromJson, selectForUpdateSql, upsertSql, type RowState } from './row-codec';
import { mayWrite } from '../../../../sync/protocol';
import { runAfterApply, type AfterApplyHook } from './after-apply';
import { createReviewGuard } from '../review/review-guard';
import { createStationCrewGuard } from './station-crew-guard';

export interface PushContext {
  clubId: string;
  userId: string;
  role: Role;
  nowMs: number;
  logger: Logger;
  /** Run inside the transaction once the changed rows are written (notifications); none when omitted. */
  afterApply?: readonly AfterApplyHook[];
}

export interface PushOutcome {
  lastAppliedMutationId: number;
  rejected: Rejection[];
}

interface PendingConflict extends FieldConflict {
  collection: CollectionName;
  recordId: string;
}

const reject = (m: Mutation, code: Rejection['code'], message: string, details?: unknown): Rejection => ({
  mutationId: m.mutationId,
  collection: m.collection,
  recordId: m.recordId,
  op: m.op,
  code,
  message,
  ...(details === undefined ? {} : { details }),
});

async function previousRejections(em: EntityManager, clubId: string, deviceId: string, ids: number[]): Promise<Rejection[]> {
  if (ids.length === 0) return [];
  const rows: { mutation_id: number; collection: CollectionName; record_id: string; op: Mutation['op']; code: Rejection['code']; message: string; details: unknown }[] =
    await em.query('SELECT mutation_id, collection, record_id, op, code, message, details FROM sync_rejected WHERE club_id = $1 AND device_id = $2 AND mutation_id = ANY($3::bigint[])', [clubId, deviceId, ids]);
  return rows.map((r) => ({ mutationId: Number(r.mutation_id), collection: r.collection, recordId: r.record_id, op: r.op, code: r.code, message: r.message, ...(r.details == null ? {} : { details: r.details }) }));
}

async function applyInTransaction(em: EntityManager, req: PushRequest, ctx: PushContext): Promise<PushOutcome> {
  // Serialise pushes (and, through the change_seq trigger, every synced write) from here to commit: taking the
  // lock before any row lock means two pushes can never wait on each other's rows.
  await em.query('SELECT pg_advisory_xact_lock($1)', [CHANGE_SEQ_LOCK_KEY]);
  await em.query('INSERT INTO sync_devices (club_id, device_id, user_id) VALUES ($1, $2, $3) ON CONFLICT DO NOTHING', [ctx.clubId, req.deviceId, ctx.userId]);
  const [device]: { user_id: string; last_mutation_id: number }[] = await em.query(
    'SELECT user_id, last_mutation_id FROM sync_devices WHERE club_id = $1 AND device_id = $2 FOR UPDATE',
    [ctx.clubId, req.deviceId],
  );
  if (device.user_id !== ctx.userId) {
    throw new AppError('device_of_another_user', 'forbidden', 'this device id is registered to another person in this club: sign in as them, or reset the app data');
  }
  const last = Number(device.last_mutation_id);
  const fresh = req.mutations.filter((m) => m.mutationId > last).sort((a, b) => a.mutationId - b.mutationId);
  const replayed = req.mutations.filter((m) => m.mutationId <= last).map((m) => m.mutationId);
  const rejected: Rejection[] = await previousRejections(em, ctx.clubId, req.deviceId, replayed);
  if (fresh.length === 0) return { lastAppliedMutationId: last, rejected };

  const nowIso = new Date(ctx.nowMs).toISOString();
  const rows = new Map<string, RowState>();
  const byCollection = new Map<CollectionName, string[]>();
  for (const m of fresh) byCollection.set(m.collection, [...new Set([...(byCollection.get(m.collection) ?? []), m.recordId])]);
  for (const [collection, ids] of byCollection) {
    const found: { j: Record<string, unknown> }[] = await em.query(selectForUpdateSql(collection), [ids]);
    for (const f of found) rows.set(`${collection}/${f.j.id}`, rowFromJson(collection, f.j));
  }
  const loaded = new Map(rows);
  // Ids are global; a row of another club is "not found" to this club.
  const foreign = new Set([...rows.entries()].filter(([, r]) => r.clubId !== ctx.clubId).map(([k]) => k));

  const reviewGuard = createReviewGuard(em, ctx.clubId, ctx.userId);
  const crewGuard = createStationCrewGuard(em, ctx.clubId);
  const dirty = new Set<string>();
  const conflicts: PendingConflict[] = [];
  const newRejections: { m: Mutation; r: Rejection }[] = [];
  let clampedCount = 0;
  for (const m of fresh) {
    const key = `${m.collection}/${m.recordId}`;
    const refuse = (code: Rejection['code'], message: string, details?: unknown) => newRejections.push({ m, r: reject(m, code, message, details) });
    if (decodeHlc(m.clock).node !== req.deviceId) {
      refuse('bad-clock', 'the change is stamped with another device’s clock');
      continue;
    }
    const existing = foreign.has(key) ? undefined : rows.get(key);
    if (foreign.has(key)) {
      refuse('not-found', `no such record in ${m.collection}`);
      continue;
    }
    const isNew = !existing;
    if (!mayWrite(ctx.role, m.collection, m.op, Object.keys(m.fields), isNew)) {
      refuse('forbidden', `your role in this club (${ctx.role}) may not change ${m.collection}`, { needs: COLLECTIONS[m.collection].ability, role: ctx.role });
      continue;
    }
    const appendOnly = appendOnlyRefusal(m.collection, m.op, !isNew);
    if (appendOnly) {
      refuse('append-only', appendOnly);
      continue;
    }
    const { clock, clamped } = clampClock(m.clock, ctx.nowMs);
    if (clamped) clampedCount += 1;
    if (m.op !== 'upsert') {
      if (!existing) {
        refuse('not-found', `no such record in ${m.collection} to ${m.op === 'delete' ? 'delete' : 'restore'}`);
        continue;
      }
      const r = mergeMutation(m.collection, existing, { op: m.op, fields: {}, baseClocks: {}, clock }, nowIso);
      if (r.changed) dirty.add(key);
      rows.set(key, r.row);
      continue;
    }
    if (!existing) {
      const checked = checkNewRecordFields(m.collection, m.fields);
      if (!checked.ok) {
        // Valid field by field but missing fields a new record needs: an edit of a record this server no longer has.
        // (Every field present and valid on its own but the whole refused — a cross-field rule — is just invalid.)
        const shape = fieldShape(m.collection);
        const missingSome = () => Object.entries(shape).some(([k, field]) => !(k in m.fields) && !field.safeParse(undefined).success);
        if (checkEditedFields(m.collection, m.fields).ok && missingSome()) refuse('not-found', `no such record in ${m.collection}: it may have been removed for good`);
        else refuse('invalid', checked.message, checked.details);
        continue;
      }
      // A review decision is judged again here against the club's records (a blocked result is never accepted).
      const reviewProblem = m.collection === 'reviewDecisions' ? await reviewGuard.check(checked.fields as Parameters<typeof reviewGuard.check>[0]) : null;
      // A station's crew must be members of this club (they are who its sheet e-mails go to).
      const crewProblem = m.collection === 'stations' ? await crewGuard.check((checked.fields as { crewMemberIds?: string[] }).crewMemberIds) : null;
      if (reviewProblem || crewProblem) {
        refuse('invalid', (reviewProblem ?? crewProblem)!);
        continue;
      }
      rows.set(key, newRow(m.collection, m.recordId, ctx.clubId, checked.fields, clock, nowIso));
      dirty.add(key);
      continue;
    }
    const checked = checkEditedFields(m.collection, m.fields);
    if (!checked.ok) {
      refuse('invalid', checked.message, checked.details);
      continue;
    }
    // Only the crew this change names is judged: a member who left later does not block other edits of the station.
    const editCrewProblem = m.collection === 'stations' ? await crewGuard.check((checked.fields as { crewMemberIds?: string[] }).crewMemberIds) : null;
    if (editCrewProblem) {
      refuse('invalid', editCrewProblem);
      continue;
    }
    const r = mergeMutation(m.collection, existing, { op: 'upsert', fields: checked.fields, baseClocks: m.baseClocks, clock }, nowIso);
    const whole = COLLECTIONS[m.collection].fields.safeParse(r.row.fields);
    if (!whole.success) {
      const issue = whole.error.issues[0];
      refuse('invalid', `${issue?.path.join('.') || 'record'}: ${issue?.message ?? 'invalid'}`, { issues: whole.error.issues });
      continue;
    }
    for (const c of r.conflicts) conflicts.push({ ...c, collection: m.collection, recordId: m.recordId });
    if (r.changed) dirty.add(key);
    rows.set(key, r.row);
  }
  if (clampedCount > 0) {
    ctx.logger.warn({ clubId: ctx.clubId, deviceId: req.deviceId, clampedCount }, 'sync: clamped clocks too far ahead of the server');
  }

  const dirtyByCollection = new Map<CollectionName, RowState[]>();
  for (const key of dirty) {
    const row = rows.get(key)!;
    dirtyByCollection.set(row.collection, [...(dirtyByCollection.get(row.collection) ?? []), row]);
  }
  for (const [collection, list] of dirtyByCollection) {
    const { sql, toJson } = upsertSql(collection);
    await em.query(sql, [JSON.stringify(list.map(toJson))]);
  }
  if (ctx.afterApply?.length) {
    const changes = [...dirty].map((key) => ({ before: loaded.get(key) ?? null, after: rows.get(key)! }));
    await runAfterApply(em, ctx.afterApply, { clubId: ctx.clubId, userId: ctx.userId, nowMs: ctx.nowMs, changes }, ctx.logger);
  }
  if (newRejections.length > 0) {
    await em.query(
      `INSERT INTO sync_rejected (club_id, user_id, device_id, mutation_id, collection, record_id, op, fields, clock, code, message, details)
       SELECT $1, $2, $3, x.mutation_id, x.collection, x.record_id, x.op, x.fields, x.clock, x.code, x.message, x.details
       FROM jsonb_to_recordset($4::jsonb) AS x(mutation_id bigint, collection text, record_id uuid, op text, fields jsonb, clock text, code text, message text, details jsonb)`,
      [
        ctx.clubId,
        ctx.userId,
        req.deviceId,
        JSON.stringify(newRejections.map(({ m, r }) => ({ mutation_id: m.mutationId, collection: m.collection, record_id: m.recordId, op: m.op, fields: m.fields, clock: m.clock, code: r.code, message: r.message, details: r.details ?? null }))),
      ],
    );
  }
  if (conflicts.length > 0) await recordConflicts(em, ctx.clubId, conflicts);
  const lastAppliedMutationId = fresh[fresh.length - 1].mutationId;
  await em.query('UPDATE sync_devices SET last_mutation_id = $3, updated_at = $4 WHERE club_id = $1 AND device_id = $2', [ctx.clubId, req.deviceId, lastAppliedMutationId, nowIso]);
  return { lastAppliedMutationId, rejected: [...rejected, ...newRejections.map((x) => x.r)] };
}

async function recordConflicts(em: EntityManager, clubId: string, conflicts: PendingConflict[]): Promise<void> {
  // Who made each value: the clock's node is the device id, and each device belongs to one person.
  const nodes = [...new Set(conflicts.flatMap((c) => [decodeHlc(c.keptClock).node, decodeHlc(c.otherClock).node]))];
  const owners: { device_id: string; user_id: string }[] = await em.query('SELECT device_id, user_id FROM sync_devices WHERE club_id = $1 AND device_id = ANY($2::text[])', [clubId, nodes]);
  const ownerOf = new Map(owners.map((o) => [o.device_id, o.user_id]));
  const by = (clock: string) => ownerOf.get(decodeHlc(clock).node) ?? null;
  await em.query(
    `INSERT INTO sync_conflicts (club_id, collection, record_id, field, kept_value, kept_clock, kept_by, other_value, other_clock, other_by)
     SELECT $1, x.collection, x.record_id, x.field, x.kept_value, x.kept_clock, x.kept_by, x.other_value, x.other_clock, x.other_by
     FROM jsonb_to_recordset($2::jsonb) AS x(collection text, record_id uuid, field text, kept_value jsonb, kept_clock text, kept_by uuid, other_value jsonb, other_clock text, other_by uuid)`,
    [
      clubId,
      JSON.stringify(
        conflicts.map((c) => ({
          collection: c.collection,
          record_id: c.recordId,
          field: c.field,
          kept_value: c.keptValue ?? null,
          kept_clock: c.keptClock,
          kept_by: by(c.keptClock),
          other_value: c.otherValue ?? null,
          other_clock: c.otherClock,
          other_by: by(c.otherClock),
        })),
      ),
    ],
  );
}

const RETRYABLE = new Set(['40001', '40P01']);

/** Applies a push; retried a few times when PostgreSQL reports a deadlock or serialisation failure. */
export async function applyPush(dataSource: DataSource, req: PushRequest, ctx: PushContext): Promise<PushOutcome> {
  for (let attempt = 0; ; attempt++) {
    try {
      return await dataSource.transaction((em) => applyInTransaction(em, req, ctx));
    } catch (err) {
      const code = (err as { code?: string; driverError?: { code?: string } }).driverError?.code ?? (err as { code?: string }).code;
      if (attempt < 3 && code && RETRYABLE.has(code)) continue;
      throw err;
    }
  }
}
