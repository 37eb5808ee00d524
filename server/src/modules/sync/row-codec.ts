// Synced rows ↔ the wire format. Rows are read with to_jsonb (one JSON object per row, column names as keys) and
// written in bulk with jsonb_to_recordset, so a push of a thousand changes is a few statements, not thousands.
import { COLLECTIONS, type CollectionName } from '../../../../shared/schemas';
import type { WireRecord } from '../../../../sync/protocol';
import { SYNCED_FIELD_COLUMNS, snakeCase, tableOf } from '../../db/synced-columns';

/** A synced row as the merge sees it. */
export interface RowState {
  collection: CollectionName;
  id: string;
  clubId: string;
  fields: Record<string, unknown>;
  fieldClocks: Record<string, string>;
  deletedAt: string | null;
  deletedClock: string | null;
  createdAt: string;
  updatedAt: string;
  changeSeq: number | null;
}

export const COLLECTION_NAMES = Object.keys(COLLECTIONS) as CollectionName[];

const iso = (v: unknown): string | null => (v === null || v === undefined ? null : new Date(String(v)).toISOString());

/** A row read as `to_jsonb(t)`. */
export function rowFromJson(collection: CollectionName, j: Record<string, unknown>): RowState {
  const fields: Record<string, unknown> = {};
  for (const [key, col] of Object.entries(SYNCED_FIELD_COLUMNS[collection])) {
    const v = j[snakeCase(key)];
    fields[key] = col.type === 'timestamptz' ? iso(v) : v;
  }
  return {
    collection,
    id: String(j.id),
    clubId: String(j.club_id),
    fields,
    fieldClocks: (j.field_clocks as Record<string, string>) ?? {},
    deletedAt: iso(j.deleted_at),
    deletedClock: (j.deleted_clock as string | null) ?? null,
    createdAt: iso(j.created_at)!,
    updatedAt: iso(j.updated_at)!,
    changeSeq: j.change_seq === undefined || j.change_seq === null ? null : Number(j.change_seq),
  };
}

export function toWire(row: RowState): WireRecord {
  return {
    collection: row.collection,
    id: row.id,
    clubId: row.clubId,
    fields: row.fields,
    fieldClocks: row.fieldClocks,
    deletedAt: row.deletedAt,
    deletedClock: row.deletedClock,
    createdAt: row.createdAt,
    updatedAt: row.updatedAt,
    changeSeq: String(row.changeSeq ?? 0),
  };
}

/** SELECT of the rows with these ids, locked until the transaction ends. $1: uuid[]. */
export function selectForUpdateSql(collection: CollectionName): string {
  return `SELECT to_jsonb(t) AS j FROM ${tableOf(collection)} t WHERE t.id = ANY($1::uuid[]) FOR UPDATE`;
}

interface UpsertSql {
  sql: string;
  toJson: (row: RowState) => Record<string, unknown>;
}

const upsertCache = new Map<CollectionName, UpsertSql>();

/** INSERT … ON CONFLICT DO UPDATE of many rows from one jsonb array ($1). The trigger stamps change_seq. */
export function upsertSql(collection: CollectionName): UpsertSql {
  const known = upsertCache.get(collection);
  if (known) return known;
  const fieldCols = Object.entries(SYNCED_FIELD_COLUMNS[collection]).map(([key, col]) => ({ key, name: snakeCase(key), type: col.type }));
  const cols = [
    { name: 'id', type: 'uuid' },
    { name: 'club_id', type: 'uuid' },
    ...fieldCols.map((c) => ({ name: c.name, type: c.type })),
    { name: 'created_at', type: 'timestamptz' },
    { name: 'updated_at', type: 'timestamptz' },
    { name: 'deleted_at', type: 'timestamptz' },
    { name: 'field_clocks', type: 'jsonb' },
    { name: 'deleted_clock', type: 'text' },
  ];
  const names = cols.map((c) => c.name).join(', ');
  const defs = cols.map((c) => `${c.name} ${c.type}`).join(', ');
  const updates = cols
    .filter((c) => c.name !== 'id' && c.name !== 'club_id' && c.name !== 'created_at')
    .map((c) => `${c.name} = EXCLUDED.${c.name}`)
    .join(', ');
  const table = tableOf(collection);
  const sql = `INSERT INTO ${table} (${names}) SELECT ${names} FROM jsonb_to_recordset($1::jsonb) AS x(${defs})
    ON CONFLICT (id) DO UPDATE SET ${updates} WHERE ${table}.club_id = EXCLUDED.club_id`;
  const toJson = (row: RowState) => {
    const out: Record<string, unknown> = {
      id: row.id,
      club_id: row.clubId,
      created_at: row.createdAt,
      updated_at: row.updatedAt,
      deleted_at: row.deletedAt,
      field_clocks: row.fieldClocks,
      deleted_clock: row.deletedClock,
    };
    for (const c of fieldCols) out[c.name] = row.fields[c.key] ?? null;
    return out;
  };
  const built = { sql, toJson };
  upsertCache.set(collection, built);
  return built;
}
