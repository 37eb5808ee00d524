import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import type { CollectionFields, StoredRecord } from '../../../../shared/schemas';
import { checkEditedFields, checkNewRecordFields, type FieldCheck } from '../../../../sync/protocol';
import type { Clock } from '../../app-deps';
import type { SyncedRow } from '../../db/entities';
import { AppError } from '../../http/errors';
import { toStored, type RecordListOptions, type RecordRepository, type RestCollection } from './record-repository';
import { restWriteClock } from './rest-write-clock';

const LABEL: Record<RestCollection, string> = { sites: 'site', events: 'event' };

function fieldsOrThrow(check: FieldCheck): Record<string, unknown> {
  if (!check.ok) throw new AppError('validation_failed', 'invalid', check.message, check.details);
  return check.fields;
}

/** Extra rules a collection checks against the database (an event's site must be one of the club's sites). */
export type FieldGuard<C extends RestCollection> = (manager: EntityManager, clubId: string, fields: CollectionFields<C>) => Promise<void>;

/**
 * Create, read, edit and soft-delete of one synced collection over REST. Validation uses the same field rules
 * the sync protocol applies to a phone's mutations, and every written field gets a fresh clock, so a REST edit
 * and a phone's edit of the same record merge as two edits would through sync.
 */
export class RecordService<C extends RestCollection> {
  private readonly label: string;

  constructor(
    private readonly dataSource: DataSource,
    private readonly records: RecordRepository<C>,
    private readonly clock: Clock,
    private readonly guard?: FieldGuard<C>,
  ) {
    this.label = LABEL[records.collection];
  }

  private notFound(): AppError {
    return new AppError('not_found', 'not_found', `${this.label} not found`);
  }

  async list(clubId: string, options?: RecordListOptions): Promise<StoredRecord<C>[]> {
    return (await this.records.list(clubId, options)).map((r) => toStored(r));
  }

  /** A deleted record is gone for the REST API (404); sync still carries its tombstone to phones. */
  async get(clubId: string, id: string): Promise<StoredRecord<C>> {
    const row = await this.records.find(this.dataSource.manager, clubId, id);
    if (!row || row.deletedAt) throw this.notFound();
    return toStored(row);
  }

  /** `id` may come from the client (records made offline keep their id); otherwise a new UUID. */
  create(clubId: string, input: { id?: string; fields: unknown }): Promise<StoredRecord<C>> {
    const fields = fieldsOrThrow(checkNewRecordFields(this.records.collection, input.fields)) as CollectionFields<C>;
    return this.dataSource.transaction(async (manager) => {
      const id = input.id ?? randomUUID();
      if (input.id && (await this.records.idTaken(manager, id))) {
        throw new AppError('id_taken', 'conflict', `a record with id ${id} already exists`);
      }
      await this.guard?.(manager, clubId, fields);
      const now = this.clock.now();
      const stamp = restWriteClock(now.getTime(), []);
      const fieldClocks = Object.fromEntries(Object.keys(fields).map((k) => [k, stamp]));
      await this.records.insert(manager, { ...fields, id, clubId, createdAt: now, updatedAt: now, deletedAt: null, fieldClocks } as never);
      const row = await this.records.find(manager, clubId, id);
      if (!row) throw new Error(`the ${this.label} just written cannot be read back`);
      return toStored(row);
    });
  }

  /** Changes only the fields sent; the merged record must still pass every rule (e.g. an event ends on or after it starts). */
  update(clubId: string, id: string, patch: Record<string, unknown>): Promise<StoredRecord<C>> {
    const changed = fieldsOrThrow(checkEditedFields(this.records.collection, patch));
    if (Object.keys(changed).length === 0) throw new AppError('nothing_to_change', 'invalid', `send at least one field of the ${this.label} to change`);
    return this.dataSource.transaction(async (manager) => {
      const row = await this.records.find(manager, clubId, id, true);
      if (!row || row.deletedAt) throw this.notFound();
      const fieldNames = Object.keys(changed);
      const merged = { ...fieldsOf(toStored(row)), ...changed };
      const fields = fieldsOrThrow(checkNewRecordFields(this.records.collection, merged)) as CollectionFields<C>;
      await this.guard?.(manager, clubId, fields);
      const now = this.clock.now();
      const stamp = restWriteClock(now.getTime(), [...Object.values(row.fieldClocks ?? {}), row.deletedClock]);
      const fieldClocks = { ...row.fieldClocks, ...Object.fromEntries(fieldNames.map((k) => [k, stamp])) };
      const values = Object.fromEntries(fieldNames.map((k) => [k, (fields as Record<string, unknown>)[k]]));
      await this.records.update(manager, id, { ...values, fieldClocks, updatedAt: now } as Partial<SyncedRow<C>>);
      const updated = await this.records.find(manager, clubId, id);
      return toStored(updated!);
    });
  }

  /** Soft delete: the row stays with deletedAt set (and a clock), so phones learn of the deletion when they sync. */
  remove(clubId: string, id: string): Promise<void> {
    return this.dataSource.transaction(async (manager) => {
      const row = await this.records.find(manager, clubId, id, true);
      if (!row || row.deletedAt) throw this.notFound();
      const now = this.clock.now();
      const deletedClock = restWriteClock(now.getTime(), [...Object.values(row.fieldClocks ?? {}), row.deletedClock]);
      await this.records.update(manager, id, { deletedAt: now, deletedClock, updatedAt: now } as Partial<SyncedRow<C>>);
    });
  }
}

/** Only the collection's own fields of a stored record (drops id, clubId and timestamps). */
function fieldsOf(record: object): Record<string, unknown> {
  const { id: _i, clubId: _c, createdAt: _a, updatedAt: _u, deletedAt: _d, ...fields } = record as Record<string, unknown>;
  return fields;
}
