// Entities of the synced collections, built from SYNCED_FIELD_COLUMNS. Entity names are the collection names
// (`dataSource.getRepository<SyncedRow<'supports'>>('supports')`, or `SYNCED_ENTITIES.supports`).
import { EntitySchema, type EntitySchemaColumnOptions } from 'typeorm';
import { COLLECTIONS, type CollectionFields, type CollectionName } from '../../../../shared/schemas';
import { SYNCED_FIELD_COLUMNS, snakeCase, tableOf } from '../synced-columns';

/** A synced row as TypeORM returns it: the fields (instants inside the fields as ISO strings), meta as Dates. */
export type SyncedRow<C extends CollectionName> = CollectionFields<C> & {
  id: string;
  clubId: string;
  createdAt: Date;
  updatedAt: Date;
  deletedAt: Date | null;
  /** Per-field hybrid-logical-clock strings, kept by the sync layer. */
  fieldClocks: Record<string, string>;
  deletedClock: string | null;
  /** Set by the database trigger on every insert and update; never written by the app. */
  changeSeq: number;
};

// Instants inside the fields (takenAt, decidedAt) read back as ISO strings, as the zod schemas describe them.
const isoInstant = {
  to: (v: unknown) => v,
  from: (v: Date | null) => (v instanceof Date ? v.toISOString() : v),
};

function entityFor<C extends CollectionName>(collection: C): EntitySchema<SyncedRow<C>> {
  const columns: Record<string, EntitySchemaColumnOptions> = {
    id: { type: 'uuid', primary: true },
    clubId: { type: 'uuid', name: 'club_id' },
  };
  for (const [prop, col] of Object.entries(SYNCED_FIELD_COLUMNS[collection])) {
    columns[prop] = {
      type: col.type,
      name: snakeCase(prop),
      nullable: col.nullable ?? false,
      ...(col.type === 'timestamptz' ? { transformer: isoInstant } : {}),
    };
  }
  Object.assign(columns, {
    createdAt: { type: 'timestamptz', name: 'created_at', createDate: true },
    updatedAt: { type: 'timestamptz', name: 'updated_at', updateDate: true },
    deletedAt: { type: 'timestamptz', name: 'deleted_at', nullable: true },
    fieldClocks: { type: 'jsonb', name: 'field_clocks', default: () => "'{}'" },
    deletedClock: { type: 'text', name: 'deleted_clock', nullable: true },
    changeSeq: { type: 'bigint', name: 'change_seq', insert: false, update: false, select: true },
  } satisfies Record<string, EntitySchemaColumnOptions>);
  return new EntitySchema<SyncedRow<C>>({ name: collection, tableName: tableOf(collection), columns: columns as never });
}

export const SYNCED_ENTITIES = Object.fromEntries(
  (Object.keys(COLLECTIONS) as CollectionName[]).map((c) => [c, entityFor(c)]),
) as { [C in CollectionName]: EntitySchema<SyncedRow<C>> };
