// Bookkeeping of the sync protocol (server/src/modules/sync): the last mutation applied per device (stored in the
// same transaction as the changes, so a retried push is applied exactly once), refused mutations the writer can
// see, concurrent changes of safety-relevant fields kept for the lead, and the tombstone horizon per club.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class SyncBookkeeping1796170000000 implements MigrationInterface {
  name = 'SyncBookkeeping1796170000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE sync_devices (
      club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
      device_id text NOT NULL,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      last_mutation_id bigint NOT NULL DEFAULT 0,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (club_id, device_id)
    )`);
    await q.query(`CREATE TABLE sync_rejected (
      id bigserial PRIMARY KEY,
      club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      device_id text NOT NULL,
      mutation_id bigint NOT NULL,
      collection text NOT NULL,
      record_id uuid NOT NULL,
      op text NOT NULL,
      fields jsonb NOT NULL,
      clock text NOT NULL,
      code text NOT NULL,
      message text NOT NULL,
      details jsonb,
      created_at timestamptz NOT NULL DEFAULT now(),
      CONSTRAINT sync_rejected_mutation_unique UNIQUE (club_id, device_id, mutation_id)
    )`);
    await q.query('CREATE INDEX sync_rejected_user_idx ON sync_rejected (club_id, user_id, id DESC)');
    await q.query(`CREATE TABLE sync_conflicts (
      id bigserial PRIMARY KEY,
      club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
      collection text NOT NULL,
      record_id uuid NOT NULL,
      field text NOT NULL,
      kept_value jsonb,
      kept_clock text NOT NULL,
      kept_by uuid REFERENCES users(id) ON DELETE SET NULL,
      other_value jsonb,
      other_clock text NOT NULL,
      other_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query('CREATE INDEX sync_conflicts_club_idx ON sync_conflicts (club_id, id DESC)');
    await q.query('CREATE INDEX sync_conflicts_record_idx ON sync_conflicts (record_id)');
    await q.query(`CREATE TABLE sync_horizons (
      club_id uuid PRIMARY KEY REFERENCES clubs(id) ON DELETE CASCADE,
      horizon_seq bigint NOT NULL
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['sync_horizons', 'sync_conflicts', 'sync_rejected', 'sync_devices']) await q.query(`DROP TABLE IF EXISTS ${t}`);
  }
}
