// The two lists of sync problems and what people do with them: safety conflicts (concurrent changes of a
// safety-relevant field, kept for the lead) are settled by a lead or admin, and a person's own refused changes are
// dismissed once read. Nothing here writes a record: a lead who picks the other value writes it through sync like
// any other change, so review of affected spots re-opens through the same rules.
import type { DataSource } from 'typeorm';
import type { ConflictEntry, RejectedEntry, ResolveConflictBody } from '../../../../sync/protocol';
import { AppError, notFound } from '../../http/errors';

const iso = (v: unknown) => new Date(String(v)).toISOString();
const isoOrNull = (v: unknown) => (v == null ? null : iso(v));

const CONFLICT_COLUMNS = `id, collection, record_id, field, kept_value, kept_clock, kept_by, other_value, other_clock, other_by, created_at,
  resolved_at, resolved_by, choice, note`;

function conflictOf(r: Record<string, unknown>): ConflictEntry {
  return {
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
    resolvedAt: isoOrNull(r.resolved_at),
    resolvedBy: (r.resolved_by as string | null) ?? null,
    choice: (r.choice as ConflictEntry['choice']) ?? null,
    note: (r.note as string | null) ?? null,
  };
}

function rejectedOf(r: Record<string, unknown>): RejectedEntry {
  return {
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
  };
}

export interface ListOptions {
  limit: number;
  recordId?: string;
}

export class SyncProblemsService {
  constructor(private readonly dataSource: DataSource) {}

  /** The caller's own refused changes that they have not dismissed, newest first. */
  async listRejected(clubId: string, userId: string, o: ListOptions): Promise<RejectedEntry[]> {
    const rows: Record<string, unknown>[] = await this.dataSource.query(
      `SELECT id, device_id, mutation_id, collection, record_id, op, fields, clock, code, message, details, created_at FROM sync_rejected
       WHERE club_id = $1 AND user_id = $2 AND dismissed_at IS NULL AND ($3::uuid IS NULL OR record_id = $3) ORDER BY id DESC LIMIT $4`,
      [clubId, userId, o.recordId ?? null, o.limit],
    );
    return rows.map(rejectedOf);
  }

  /** The club's safety conflicts, newest first; only the open ones unless `open` is false. */
  async listConflicts(clubId: string, o: ListOptions & { open: boolean }): Promise<ConflictEntry[]> {
    const rows: Record<string, unknown>[] = await this.dataSource.query(
      `SELECT ${CONFLICT_COLUMNS} FROM sync_conflicts
       WHERE club_id = $1 AND ($2::uuid IS NULL OR record_id = $2) AND (NOT $3::boolean OR resolved_at IS NULL) ORDER BY id DESC LIMIT $4`,
      [clubId, o.recordId ?? null, o.open, o.limit],
    );
    return rows.map(conflictOf);
  }

  /** Settles one open conflict of the club; a conflict of another club is "not found", a settled one a 409. */
  async resolveConflict(clubId: string, conflictId: string, userId: string, body: ResolveConflictBody, now: Date): Promise<ConflictEntry> {
    const note = body.note ? body.note : null;
    const rows: Record<string, unknown>[] = await this.dataSource.query(
      `UPDATE sync_conflicts SET resolved_at = $4, resolved_by = $3, choice = $5, note = $6
       WHERE club_id = $1 AND id = $2 AND resolved_at IS NULL RETURNING ${CONFLICT_COLUMNS}`,
      [clubId, conflictId, userId, now.toISOString(), body.choice, note],
    );
    // TypeORM answers an UPDATE … RETURNING with [rows, count].
    const updated = (Array.isArray(rows[0]) ? rows[0] : rows) as Record<string, unknown>[];
    if (updated.length > 0) return conflictOf(updated[0]!);
    const [existing]: Record<string, unknown>[] = await this.dataSource.query(`SELECT ${CONFLICT_COLUMNS} FROM sync_conflicts WHERE club_id = $1 AND id = $2`, [clubId, conflictId]);
    if (!existing) throw notFound('conflict');
    throw new AppError('already_resolved', 'conflict', 'this conflict was already settled by someone else: reload the list', { conflict: conflictOf(existing) });
  }

  /** Hides one of the caller's own refused changes from their list; another person's entry is "not found". */
  async dismissRejected(clubId: string, userId: string, rejectedId: string, now: Date): Promise<void> {
    const [found]: { id: string }[] = await this.dataSource.query('SELECT id FROM sync_rejected WHERE club_id = $1 AND user_id = $2 AND id = $3', [clubId, userId, rejectedId]);
    if (!found) throw notFound('refused change');
    await this.dataSource.query('UPDATE sync_rejected SET dismissed_at = COALESCE(dismissed_at, $2) WHERE id = $1', [rejectedId, now.toISOString()]);
  }
}
