// A lead or admin settles a safety conflict (which value stays, who, when, why), and a person dismisses their own
// refused change once they have read it. Rows are kept, not deleted: a settled conflict is still on record.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class SyncProblemResolution1796200000000 implements MigrationInterface {
  name = 'SyncProblemResolution1796200000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE sync_conflicts
      ADD COLUMN resolved_at timestamptz NULL,
      ADD COLUMN resolved_by uuid NULL REFERENCES users(id) ON DELETE SET NULL,
      ADD COLUMN choice text NULL CHECK (choice IN ('kept', 'other')),
      ADD COLUMN note text NULL,
      ADD CONSTRAINT sync_conflicts_resolution_whole CHECK ((resolved_at IS NULL) = (choice IS NULL))`);
    await q.query('CREATE INDEX sync_conflicts_open_idx ON sync_conflicts (club_id, id DESC) WHERE resolved_at IS NULL');
    await q.query('ALTER TABLE sync_rejected ADD COLUMN dismissed_at timestamptz NULL');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE sync_rejected DROP COLUMN IF EXISTS dismissed_at');
    await q.query('DROP INDEX IF EXISTS sync_conflicts_open_idx');
    await q.query('ALTER TABLE sync_conflicts DROP CONSTRAINT IF EXISTS sync_conflicts_resolution_whole, DROP COLUMN IF EXISTS note, DROP COLUMN IF EXISTS choice, DROP COLUMN IF EXISTS resolved_by, DROP COLUMN IF EXISTS resolved_at');
  }
}
