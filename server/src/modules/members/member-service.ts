import type { DataSource, EntityManager } from 'typeorm';
import type { Member, Role } from '../../../../shared/schemas';
import { AppError } from '../../http/errors';
import type { ClubRepository } from '../clubs/club-repository';
import type { MemberRepository } from './member-repository';

const lastAdmin = (what: string) =>
  new AppError('last_admin', 'conflict', `${what}: a club needs at least one admin. Make another member an admin first.`);

export class MemberService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly clubs: ClubRepository,
    private readonly members: MemberRepository,
  ) {}

  list(clubId: string): Promise<Member[]> {
    return this.members.list(clubId);
  }

  /** Gives a member another role in this club. The last admin cannot be demoted. */
  changeRole(clubId: string, userId: string, role: Role): Promise<Member> {
    return this.dataSource.transaction(async (manager) => {
      const member = await this.lockedMember(manager, clubId, userId);
      if (member.role === role) return member;
      if (member.role === 'admin' && (await this.members.countAdmins(manager, clubId)) <= 1) {
        throw lastAdmin('this member is the only admin');
      }
      await this.members.setRole(manager, clubId, userId, role);
      return { ...member, role };
    });
  }

  /** Takes a person out of this club (their other clubs are untouched). The last admin cannot be removed. */
  remove(clubId: string, userId: string): Promise<void> {
    return this.dataSource.transaction(async (manager) => {
      const member = await this.lockedMember(manager, clubId, userId);
      if (member.role === 'admin' && (await this.members.countAdmins(manager, clubId)) <= 1) {
        throw lastAdmin('this member is the only admin');
      }
      await this.members.remove(manager, clubId, userId);
    });
  }

  private async lockedMember(manager: EntityManager, clubId: string, userId: string): Promise<Member> {
    // The club row lock serialises every membership change of this club (see ClubRepository.lock).
    if (!(await this.clubs.lock(manager, clubId))) throw new AppError('not_found', 'not_found', 'club not found');
    const member = await this.members.find(manager, clubId, userId);
    if (!member) throw new AppError('not_found', 'not_found', 'this person is not a member of the club');
    return member;
  }
}
