// Reads and writes of users and their sign-in secrets. Returns plain objects; knows nothing of HTTP.
import type { DataSource, EntityManager } from 'typeorm';
import { IsNull } from 'typeorm';
import type { Club, Role } from '../../../../shared/schemas';
import { PasswordResetEntity, RefreshTokenEntity, UserEntity, type PasswordResetRow, type RefreshTokenRow, type UserRow } from '../../db/entities';

type Db = DataSource | EntityManager;
const manager = (db: Db): EntityManager => ('manager' in db ? db.manager : db);

export function findUserByEmail(db: Db, email: string): Promise<UserRow | null> {
  return manager(db).findOneBy(UserEntity, { email });
}

export function findUserById(db: Db, id: string): Promise<UserRow | null> {
  return manager(db).findOneBy(UserEntity, { id });
}

export async function insertUser(db: Db, u: Pick<UserRow, 'email' | 'displayName' | 'callSign' | 'passwordHash'>): Promise<UserRow> {
  return manager(db).save(UserEntity, manager(db).create(UserEntity, u));
}

export async function setPasswordHash(db: Db, userId: string, passwordHash: string): Promise<void> {
  await manager(db).update(UserEntity, { id: userId }, { passwordHash });
}

export async function insertRefreshToken(db: Db, t: Pick<RefreshTokenRow, 'userId' | 'familyId' | 'tokenHash' | 'expiresAt'>): Promise<void> {
  await manager(db).insert(RefreshTokenEntity, t);
}

export function findRefreshToken(db: Db, tokenHash: string): Promise<RefreshTokenRow | null> {
  return manager(db).findOneBy(RefreshTokenEntity, { tokenHash });
}

/** Marks a token rotated only if nobody rotated it first; false means it was already used. */
export async function markRotated(db: Db, id: string, at: Date): Promise<boolean> {
  const r = await manager(db).update(RefreshTokenEntity, { id, rotatedAt: IsNull(), revokedAt: IsNull() }, { rotatedAt: at });
  return (r.affected ?? 0) === 1;
}

export async function revokeFamily(db: Db, familyId: string, at: Date): Promise<void> {
  await manager(db).update(RefreshTokenEntity, { familyId, revokedAt: IsNull() }, { revokedAt: at });
}

export async function revokeAllForUser(db: Db, userId: string, at: Date): Promise<void> {
  await manager(db).update(RefreshTokenEntity, { userId, revokedAt: IsNull() }, { revokedAt: at });
}

export async function insertPasswordReset(db: Db, r: Pick<PasswordResetRow, 'userId' | 'tokenHash' | 'expiresAt'>): Promise<void> {
  await manager(db).insert(PasswordResetEntity, r);
}

export function findPasswordReset(db: Db, tokenHash: string): Promise<PasswordResetRow | null> {
  return manager(db).findOneBy(PasswordResetEntity, { tokenHash });
}

/** Marks a reset used only if it was unused; false means someone used it first. */
export async function markResetUsed(db: Db, id: string, at: Date): Promise<boolean> {
  const r = await manager(db).update(PasswordResetEntity, { id, usedAt: IsNull() }, { usedAt: at });
  return (r.affected ?? 0) === 1;
}

/** The clubs a user belongs to, with their role in each, by club name. */
export async function clubsOfUser(db: Db, userId: string): Promise<Club[]> {
  const rows: { id: string; name: string; call_sign: string; role: Role }[] = await manager(db).query(
    `SELECT c.id, c.name, c.call_sign, m.role FROM memberships m JOIN clubs c ON c.id = m.club_id
      WHERE m.user_id = $1 ORDER BY lower(c.name), c.id`,
    [userId],
  );
  return rows.map((r) => ({ id: r.id, name: r.name, callSign: r.call_sign, role: r.role }));
}
