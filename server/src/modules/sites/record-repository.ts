import type { DataSource, EntityManager } from 'typeorm';
import type { StoredRecord } from '../../../../shared/schemas';
import { SYNCED_ENTITIES, type SyncedRow } from '../../db/entities';

/** The two collections the REST API writes (the rest are written only through sync). */
export type RestCollection = 'sites' | 'events';

export type RecordListOptions = { includeDeleted?: boolean; where?: Record<string, string> };

/** A synced row as the API answers it: the fields, id, club and ISO timestamps (no sync bookkeeping). */
export function toStored<C extends RestCollection>(row: SyncedRow<C>): StoredRecord<C> {
  const { fieldClocks: _c, deletedClock: _d, changeSeq: _s, createdAt, updatedAt, deletedAt, ...rest } = row;
  return { ...rest, createdAt: createdAt.toISOString(), updatedAt: updatedAt.toISOString(), deletedAt: deletedAt?.toISOString() ?? null } as unknown as StoredRecord<C>;
}

/**
 * Reads and writes of one synced table for the REST API. Every write goes through the same table the sync
 * protocol serves; the table's trigger stamps change_seq, so phones pull REST edits like any other.
 */
export class RecordRepository<C extends RestCollection> {
  constructor(
    private readonly dataSource: DataSource,
    readonly collection: C,
    /** ORDER BY of lists, newest first. */
    private readonly order: Record<string, 'DESC' | 'ASC'>,
  ) {}

  private repo(manager: EntityManager = this.dataSource.manager) {
    return manager.getRepository<SyncedRow<C>>(SYNCED_ENTITIES[this.collection]);
  }

  async list(clubId: string, options: RecordListOptions = {}): Promise<SyncedRow<C>[]> {
    const qb = this.repo().createQueryBuilder('r').where('r.clubId = :clubId', { clubId });
    if (!options.includeDeleted) qb.andWhere('r.deletedAt IS NULL');
    for (const [field, value] of Object.entries(options.where ?? {})) qb.andWhere(`r.${field} = :${field}`, { [field]: value });
    for (const [field, dir] of Object.entries(this.order)) qb.addOrderBy(`r.${field}`, dir);
    return qb.addOrderBy('r.id', 'ASC').getMany();
  }

  /** One row of this club (deleted or not); `lock` holds it until the transaction ends. */
  async find(manager: EntityManager, clubId: string, id: string, lock = false): Promise<SyncedRow<C> | null> {
    const qb = this.repo(manager).createQueryBuilder('r').where('r.id = :id AND r.clubId = :clubId', { id, clubId });
    if (lock) qb.setLock('pessimistic_write');
    return qb.getOne();
  }

  /** Whether the id is used by any club (client-generated ids must not collide). */
  async idTaken(manager: EntityManager, id: string): Promise<boolean> {
    return (await this.repo(manager).countBy({ id } as never)) > 0;
  }

  async insert(manager: EntityManager, row: Omit<SyncedRow<C>, 'changeSeq' | 'deletedClock'>): Promise<void> {
    await this.repo(manager).insert(row as never);
  }

  async update(manager: EntityManager, id: string, values: Partial<SyncedRow<C>>): Promise<void> {
    await this.repo(manager).update({ id } as never, values as never);
  }
}
