// Pull: the club's changes after a cursor, in change_seq order, a page at a time. change_seq becomes visible in
// commit order (the trigger draws it under one advisory lock held to commit), so reading "change_seq > cursor"
// in one statement never skips a row that commits later with a smaller number.
import type { Pool } from 'pg';
import type { DataSource } from 'typeorm';
import type { WireRecord } from '../../../../sync/protocol';
import { tableOf } from '../../db/synced-columns';
import { COLLECTION_NAMES, rowFromJson, toWire } from './row-codec';
import type { CollectionName } from '../../../../shared/schemas';

export type PullOutcome = { type: 'changes'; changes: WireRecord[]; cursor: string; hasMore: boolean } | { type: 'resync-required'; message: string };

const unionSql = COLLECTION_NAMES.map(
  (c) => `(SELECT '${c}' AS collection, t.change_seq, to_jsonb(t) AS j FROM ${tableOf(c)} t WHERE t.club_id = $1 AND t.change_seq > $2 ORDER BY t.change_seq LIMIT $3)`,
).join(' UNION ALL ');
const PULL_SQL = `SELECT collection, j FROM (${unionSql}) u ORDER BY change_seq LIMIT $3`;

export async function pullChanges(dataSource: DataSource, clubId: string, cursor: string, limit: number): Promise<PullOutcome> {
  const after = Number(cursor);
  if (after > 0) {
    const [h]: { horizon_seq: number }[] = await dataSource.query('SELECT horizon_seq FROM sync_horizons WHERE club_id = $1', [clubId]);
    if (h && after < Number(h.horizon_seq)) {
      return { type: 'resync-required', message: 'This device has been away longer than deleted records are kept: it will reload the club’s data after sending its changes.' };
    }
    const [seq]: { last_value: number; is_called: boolean }[] = await dataSource.query('SELECT last_value, is_called FROM change_seq');
    const highest = seq.is_called ? Number(seq.last_value) : 0;
    if (after > highest) return { type: 'resync-required', message: 'This device knows of changes the server does not have (the server was restored): it will reload the club’s data after sending its changes.' };
  }
  // A named (prepared) statement: planning the eleven-way UNION costs more than running it on an index.
  const pool = (dataSource.driver as unknown as { master: Pool }).master;
  const { rows } = await pool.query<{ collection: CollectionName; j: Record<string, unknown> }>({ name: 'loftline_sync_pull', text: PULL_SQL, values: [clubId, after, limit + 1] });
  const page = rows.slice(0, limit).map((r) => toWire(rowFromJson(r.collection, r.j)));
  return { type: 'changes', changes: page, cursor: page.length > 0 ? page[page.length - 1].changeSeq : cursor, hasMore: rows.length > limit };
}
