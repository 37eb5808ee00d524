// An inverted-V spot keeps the leg bearing the lead chose (antenna_spots.leg_azimuth_deg; null = the engine's
// best), and a station names the crew members who raise its antennas (stations.crew_member_ids, user ids).
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class SpotLegsAndCrews1796190000000 implements MigrationInterface {
  name = 'SpotLegsAndCrews1796190000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE antenna_spots ADD COLUMN leg_azimuth_deg double precision NULL');
    await q.query(`ALTER TABLE stations ADD COLUMN crew_member_ids jsonb NOT NULL DEFAULT '[]'::jsonb`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('ALTER TABLE stations DROP COLUMN IF EXISTS crew_member_ids');
    await q.query('ALTER TABLE antenna_spots DROP COLUMN IF EXISTS leg_azimuth_deg');
  }
}
