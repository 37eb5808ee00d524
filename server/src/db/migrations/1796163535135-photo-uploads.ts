// Photo bytes kept per club (content-addressed by SHA-256) and the resumable uploads in progress.
// A photo is listed for a club only after someone in that club uploaded bytes that hash to it: the storage may hold
// the same bytes for another club, but a club cannot learn that, nor read them, without having the photo itself.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class PhotoUploads1796163535135 implements MigrationInterface {
  name = 'PhotoUploads1796163535135';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE photo_objects (
      club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
      sha256 text NOT NULL CHECK (sha256 ~ '^[0-9a-f]{64}$'),
      bytes integer NOT NULL CHECK (bytes > 0),
      mime_type text NOT NULL CHECK (mime_type IN ('image/jpeg', 'image/png', 'image/webp')),
      uploaded_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (club_id, sha256)
    )`);
    await q.query(`CREATE TABLE photo_uploads (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
      sha256 text NOT NULL CHECK (sha256 ~ '^[0-9a-f]{64}$'),
      bytes integer NOT NULL CHECK (bytes > 0),
      mime_type text NOT NULL CHECK (mime_type IN ('image/jpeg', 'image/png', 'image/webp')),
      received_bytes integer NOT NULL DEFAULT 0 CHECK (received_bytes >= 0 AND received_bytes <= bytes),
      created_by uuid REFERENCES users(id) ON DELETE SET NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    )`);
    await q.query('CREATE INDEX photo_uploads_club_sha_idx ON photo_uploads (club_id, sha256)');
    await q.query('CREATE INDEX photo_uploads_updated_idx ON photo_uploads (updated_at)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE photo_uploads');
    await q.query('DROP TABLE photo_objects');
  }
}
