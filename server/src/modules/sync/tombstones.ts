// Tombstones (deleted records) are kept so that every device learns of the delete. After `keepDays` they may be
// removed for good; a device whose cursor is older than the newest removed tombstone could have missed it, so its
// next pull is answered "resync-required" (it pushes its outbox first, then reloads from the start).
import type { DataSource } from 'typeorm';
import { tableOf } from '../../db/synced-columns';
import { COLLECTION_NAMES } from './row-codec';

export const DEFAULT_TOMBSTONE_KEEP_DAYS = 90;

/** Removes tombstones deleted before `before`; returns how many per club, and moves each club's horizon. */
export async function purgeTombstones(dataSource: DataSource, before: Date): Promise<Map<string, number>> {
  return dataSource.transaction(async (em) => {
    const counts = new Map<string, number>();
    const horizons = new Map<string, number>();
    for (const c of COLLECTION_NAMES) {
      // TypeORM answers a DELETE … RETURNING as [rows, rowCount].
      const result: unknown[] = await em.query(`DELETE FROM ${tableOf(c)} WHERE deleted_at IS NOT NULL AND deleted_at < $1 RETURNING club_id, change_seq`, [before.toISOString()]);
      const gone = (Array.isArray(result[0]) ? result[0] : result) as { club_id: string; change_seq: number }[];
      for (const g of gone) {
        counts.set(g.club_id, (counts.get(g.club_id) ?? 0) + 1);
        horizons.set(g.club_id, Math.max(horizons.get(g.club_id) ?? 0, Number(g.change_seq)));
      }
    }
    for (const [clubId, seq] of horizons) {
      await em.query(
        'INSERT INTO sync_horizons (club_id, horizon_seq) VALUES ($1, $2) ON CONFLICT (club_id) DO UPDATE SET horizon_seq = GREATEST(sync_horizons.horizon_seq, EXCLUDED.horizon_seq)',
        [clubId, seq],
      );
    }
    return counts;
  });
}
