import type { DataSource, EntityManager } from 'typeorm';
import type { Club, Role } from '../../../../shared/schemas';
import { ClubEntity, MembershipEntity } from '../../db/entities';

type ClubWithRoleRow = { id: string; name: string; call_sign: string; role: Role };
const toClub = (r: ClubWithRoleRow): Club => ({ id: r.id, name: r.name, callSign: r.call_sign, role: r.role });

const SELECT_WITH_ROLE = `SELECT c.id, c.name, c.call_sign, m.role
  FROM clubs c JOIN memberships m ON m.club_id = c.id
  WHERE m.user_id = $1`;

export class ClubRepository {
  constructor(private readonly dataSource: DataSource) {}

  /** Inserts the club and its creator's admin membership in one transaction. */
  async createWithAdmin(input: { name: string; callSign: string; userId: string }): Promise<Club> {
    return this.dataSource.transaction(async (manager) => {
      const club = await manager.getRepository(ClubEntity).save({ name: input.name, callSign: input.callSign, createdBy: input.userId });
      await manager.getRepository(MembershipEntity).insert({ clubId: club.id, userId: input.userId, role: 'admin' });
      return { id: club.id, name: club.name, callSign: club.callSign, role: 'admin' as const };
    });
  }

  /** The clubs a person belongs to, with their role in each, by name. */
  async listForUser(userId: string): Promise<Club[]> {
    const rows: ClubWithRoleRow[] = await this.dataSource.query(`${SELECT_WITH_ROLE} ORDER BY lower(c.name), c.id`, [userId]);
    return rows.map(toClub);
  }

  async getForUser(clubId: string, userId: string, manager: EntityManager = this.dataSource.manager): Promise<Club | null> {
    const rows: ClubWithRoleRow[] = await manager.query(`${SELECT_WITH_ROLE} AND c.id = $2`, [userId, clubId]);
    return rows[0] ? toClub(rows[0]) : null;
  }

  async update(clubId: string, changes: { name?: string; callSign?: string }): Promise<void> {
    await this.dataSource.getRepository(ClubEntity).update({ id: clubId }, changes);
  }

  async nameOf(clubId: string, manager: EntityManager = this.dataSource.manager): Promise<string | null> {
    const club = await manager.getRepository(ClubEntity).findOneBy({ id: clubId });
    return club?.name ?? null;
  }

  /**
   * Locks the club row until the transaction ends. Membership changes (role changes, removals, accepting
   * invitations) take it first, so two admins demoting each other at once cannot leave a club with none.
   */
  async lock(manager: EntityManager, clubId: string): Promise<boolean> {
    const rows: unknown[] = await manager.query('SELECT id FROM clubs WHERE id = $1 FOR UPDATE', [clubId]);
    return rows.length > 0;
  }
}
