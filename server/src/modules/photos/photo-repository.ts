// Plain-object access to photo_objects (what each club holds) and photo_uploads (uploads in progress).
import type { EntityManager } from 'typeorm';
import type { PhotoMimeType } from '../../../../shared/schemas';

export interface PhotoObjectRow {
  sha256: string;
  bytes: number;
  mimeType: PhotoMimeType;
}

export interface PhotoUploadRow {
  id: string;
  clubId: string;
  sha256: string;
  bytes: number;
  mimeType: PhotoMimeType;
  receivedBytes: number;
  updatedAt: Date;
}

interface UploadDbRow {
  id: string;
  club_id: string;
  sha256: string;
  bytes: number;
  mime_type: PhotoMimeType;
  received_bytes: number;
  updated_at: Date;
}

const toUpload = (r: UploadDbRow): PhotoUploadRow => ({
  id: r.id,
  clubId: r.club_id,
  sha256: r.sha256,
  bytes: r.bytes,
  mimeType: r.mime_type,
  receivedBytes: r.received_bytes,
  updatedAt: r.updated_at,
});

const UPLOAD_COLUMNS = 'id, club_id, sha256, bytes, mime_type, received_bytes, updated_at';

export class PhotoRepository {
  async findObject(em: EntityManager, clubId: string, sha256: string): Promise<PhotoObjectRow | null> {
    const rows: { sha256: string; bytes: number; mime_type: PhotoMimeType }[] = await em.query(
      'SELECT sha256, bytes, mime_type FROM photo_objects WHERE club_id = $1 AND sha256 = $2',
      [clubId, sha256],
    );
    const r = rows[0];
    return r ? { sha256: r.sha256, bytes: r.bytes, mimeType: r.mime_type } : null;
  }

  /** Records that the club holds the photo; a second insert of the same photo changes nothing. */
  async insertObject(em: EntityManager, clubId: string, o: PhotoObjectRow, userId: string): Promise<void> {
    await em.query(
      `INSERT INTO photo_objects (club_id, sha256, bytes, mime_type, uploaded_by) VALUES ($1, $2, $3, $4, $5)
       ON CONFLICT (club_id, sha256) DO NOTHING`,
      [clubId, o.sha256, o.bytes, o.mimeType, userId],
    );
  }

  async createUpload(
    em: EntityManager,
    u: { clubId: string; sha256: string; bytes: number; mimeType: PhotoMimeType; userId: string; now: Date },
  ): Promise<PhotoUploadRow> {
    const rows: UploadDbRow[] = await em.query(
      `INSERT INTO photo_uploads (club_id, sha256, bytes, mime_type, created_by, created_at, updated_at)
       VALUES ($1, $2, $3, $4, $5, $6, $6) RETURNING ${UPLOAD_COLUMNS}`,
      [u.clubId, u.sha256, u.bytes, u.mimeType, u.userId, u.now],
    );
    return toUpload(rows[0]!);
  }

  /** The upload, row-locked until the transaction ends when `lock` is set (one chunk at a time per upload). */
  async findUpload(em: EntityManager, clubId: string, sha256: string, uploadId: string, lock: boolean): Promise<PhotoUploadRow | null> {
    const rows: UploadDbRow[] = await em.query(
      `SELECT ${UPLOAD_COLUMNS} FROM photo_uploads WHERE id = $1 AND club_id = $2 AND sha256 = $3${lock ? ' FOR UPDATE' : ''}`,
      [uploadId, clubId, sha256],
    );
    return rows[0] ? toUpload(rows[0]) : null;
  }

  async setReceived(em: EntityManager, uploadId: string, receivedBytes: number, now: Date): Promise<void> {
    await em.query('UPDATE photo_uploads SET received_bytes = $2, updated_at = $3 WHERE id = $1', [uploadId, receivedBytes, now]);
  }

  async deleteUpload(em: EntityManager, uploadId: string): Promise<void> {
    await em.query('DELETE FROM photo_uploads WHERE id = $1', [uploadId]);
  }

  /** Uploads nobody has touched since `before`, oldest first, at most `limit`. */
  async staleUploads(em: EntityManager, before: Date, limit: number): Promise<PhotoUploadRow[]> {
    const rows: UploadDbRow[] = await em.query(
      `SELECT ${UPLOAD_COLUMNS} FROM photo_uploads WHERE updated_at < $1 ORDER BY updated_at LIMIT $2 FOR UPDATE SKIP LOCKED`,
      [before, limit],
    );
    return rows.map(toUpload);
  }
}
