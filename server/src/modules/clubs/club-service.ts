import type { Club } from '../../../../shared/schemas';
import { AppError } from '../../http/errors';
import type { ClubRepository } from './club-repository';

export class ClubService {
  constructor(private readonly clubs: ClubRepository) {}

  /** A new club; whoever creates it is its first admin. */
  create(userId: string, input: { name: string; callSign: string }): Promise<Club> {
    return this.clubs.createWithAdmin({ ...input, userId });
  }

  listMine(userId: string): Promise<Club[]> {
    return this.clubs.listForUser(userId);
  }

  /** Renames the club or changes its call sign (club.manage). */
  async update(clubId: string, userId: string, changes: { name?: string; callSign?: string }): Promise<Club> {
    await this.clubs.update(clubId, changes);
    return this.get(clubId, userId);
  }

  async get(clubId: string, userId: string): Promise<Club> {
    const club = await this.clubs.getForUser(clubId, userId);
    if (!club) throw new AppError('not_found', 'not_found', 'club not found');
    return club;
  }
}
