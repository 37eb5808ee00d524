import type { DataSource, EntityManager } from 'typeorm';
import type { Member, Role } from '../../../../shared/schemas';

type MemberRow = { user_id: string; email: string; display_name: string; call_sign: string; role: Role; joined_at: Date };
const toMember = (r: MemberRow): Member => ({
  userId: r.user_id,
  email: r.email,
  displayName: r.display_name,
  callSign: r.call_sign,
  role: r.role,
  joinedAt: r.joined_at.toISOString(),
});

const SELECT_MEMBERS = `SELECT m.user_id, u.email, u.display_name, u.call_sign, m.role, m.created_at AS joined_at
  FROM memberships m JOIN users u ON u.id = m.user_id
  WHERE m.club_id = $1`;

export class MemberRepository {
  constructor(private readonly dataSource: DataSource) {}

  /** Admins first, then by name: the order people scan a club's roster in. */
  async list(clubId: string): Promise<Member[]> {
    const rows: MemberRow[] = await this.dataSource.query(
      `${SELECT_MEMBERS} ORDER BY (m.role = 'admin') DESC, lower(u.display_name), u.email`,
      [clubId],
    );
    return rows.map(toMember);
  }

  async find(manager: EntityManager, clubId: string, userId: string): Promise<Member | null> {
    const rows: MemberRow[] = await manager.query(`${SELECT_MEMBERS} AND m.user_id = $2`, [clubId, userId]);
    return rows[0] ? toMember(rows[0]) : null;
  }

  async isMemberByEmail(manager: EntityManager, clubId: string, email: string): Promise<boolean> {
    const rows: unknown[] = await manager.query(
      'SELECT 1 FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.club_id = $1 AND u.email = $2',
      [clubId, email],
    );
    return rows.length > 0;
  }

  async countAdmins(manager: EntityManager, clubId: string): Promise<number> {
    const rows: { n: number }[] = await manager.query("SELECT count(*)::int AS n FROM memberships WHERE club_id = $1 AND role = 'admin'", [clubId]);
    return rows[0]?.n ?? 0;
  }

  async add(manager: EntityManager, clubId: string, userId: string, role: Role): Promise<void> {
    await manager.query('INSERT INTO memberships (club_id, user_id, role) VALUES ($1, $2, $3)', [clubId, userId, role]);
  }

  async setRole(manager: EntityManager, clubId: string, userId: string, role: Role): Promise<void> {
    await manager.query('UPDATE memberships SET role = $3, updated_at = now() WHERE club_id = $1 AND user_id = $2', [clubId, userId, role]);
  }

  async remove(manager: EntityManager, clubId: string, userId: string): Promise<void> {
    await manager.query('DELETE FROM memberships WHERE club_id = $1 AND user_id = $2', [clubId, userId]);
  }
}
