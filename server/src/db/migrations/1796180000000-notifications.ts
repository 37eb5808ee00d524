// Notifications (server/src/modules/notifications): each person's choice of review e-mails per club, and the
// events already announced (one row per spot + kind + time bucket), so a re-pushed change never mails twice.
import type { MigrationInterface, QueryRunner } from 'typeorm';

export class Notifications1796180000000 implements MigrationInterface {
  name = 'Notifications1796180000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE notification_settings (
      club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      review_waiting boolean NOT NULL DEFAULT true,
      spot_sent_back boolean NOT NULL DEFAULT true,
      spot_cleared boolean NOT NULL DEFAULT true,
      sheet_ready boolean NOT NULL DEFAULT true,
      updated_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (club_id, user_id)
    )`);
    await q.query(`CREATE TABLE notifications_sent (
      club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
      event_key text NOT NULL,
      created_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (club_id, event_key)
    )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE IF EXISTS notifications_sent');
    await q.query('DROP TABLE IF EXISTS notification_settings');
  }
}
