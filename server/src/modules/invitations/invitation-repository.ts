import type { DataSource, EntityManager } from 'typeorm';
import type { Invitation, Role } from '../../../../shared/schemas';

export type InvitationRecord = {
  id: string;
  clubId: string;
  clubName: string;
  email: string;
  role: Role;
  invitedBy: string | null;
  expiresAt: Date;
  acceptedAt: Date | null;
  revokedAt: Date | null;
};

type Row = {
  id: string;
  club_id: string;
  club_name: string;
  email: string;
  role: Role;
  invited_by: string | null;
  expires_at: Date;
  accepted_at: Date | null;
  revoked_at: Date | null;
};
const toRecord = (r: Row): InvitationRecord => ({
  id: r.id,
  clubId: r.club_id,
  clubName: r.club_name,
  email: r.email,
  role: r.role,
  invitedBy: r.invited_by,
  expiresAt: r.expires_at,
  acceptedAt: r.accepted_at,
  revokedAt: r.revoked_at,
});

export const toInvitation = (r: InvitationRecord): Invitation => ({
  id: r.id,
  email: r.email,
  role: r.role,
  clubId: r.clubId,
  clubName: r.clubName,
  expiresAt: r.expiresAt.toISOString(),
  acceptedAt: r.acceptedAt?.toISOString() ?? null,
});

const SELECT = `SELECT i.id, i.club_id, c.name AS club_name, i.email, i.role, i.invited_by, i.expires_at, i.accepted_at, i.revoked_at
  FROM invitations i JOIN clubs c ON c.id = i.club_id`;

export class InvitationRepository {
  constructor(private readonly dataSource: DataSource) {}

  /** Open (not accepted, not revoked) invitations first, newest first; revoked ones are left out. */
  async list(clubId: string): Promise<InvitationRecord[]> {
    const rows: Row[] = await this.dataSource.query(
      `${SELECT} WHERE i.club_id = $1 AND i.revoked_at IS NULL ORDER BY (i.accepted_at IS NULL) DESC, i.created_at DESC, i.id`,
      [clubId],
    );
    return rows.map(toRecord);
  }

  async findInClub(manager: EntityManager, clubId: string, id: string): Promise<InvitationRecord | null> {
    const rows: Row[] = await manager.query(`${SELECT} WHERE i.club_id = $1 AND i.id = $2`, [clubId, id]);
    return rows[0] ? toRecord(rows[0]) : null;
  }

  /** By the hash of the e-mailed token; `lock` holds the row until the transaction ends (single use). */
  async findByTokenHash(manager: EntityManager, tokenHash: string, lock = false): Promise<InvitationRecord | null> {
    const rows: Row[] = await manager.query(`${SELECT} WHERE i.token_hash = $1${lock ? ' FOR UPDATE OF i' : ''}`, [tokenHash]);
    return rows[0] ? toRecord(rows[0]) : null;
  }

  /** Revokes every open invitation of this e-mail to this club (re-inviting replaces the old link). */
  async revokeOpenFor(manager: EntityManager, clubId: string, email: string, at: Date): Promise<void> {
    await manager.query('UPDATE invitations SET revoked_at = $3 WHERE club_id = $1 AND email = $2 AND accepted_at IS NULL AND revoked_at IS NULL', [
      clubId,
      email,
      at,
    ]);
  }

  async insert(
    manager: EntityManager,
    input: { clubId: string; email: string; role: Role; tokenHash: string; invitedBy: string; expiresAt: Date; createdAt: Date },
  ): Promise<string> {
    const rows: { id: string }[] = await manager.query(
      `INSERT INTO invitations (club_id, email, role, token_hash, invited_by, expires_at, created_at)
       VALUES ($1, $2, $3, $4, $5, $6, $7) RETURNING id`,
      [input.clubId, input.email, input.role, input.tokenHash, input.invitedBy, input.expiresAt, input.createdAt],
    );
    return rows[0]!.id;
  }

  async markRevoked(manager: EntityManager, id: string, at: Date): Promise<void> {
    await manager.query('UPDATE invitations SET revoked_at = $2 WHERE id = $1', [id, at]);
  }

  async markAccepted(manager: EntityManager, id: string, userId: string, at: Date): Promise<void> {
    await manager.query('UPDATE invitations SET accepted_at = $2, accepted_by = $3 WHERE id = $1', [id, at, userId]);
  }
}
