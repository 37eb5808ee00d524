// The initial schema: identity (users, clubs, memberships, invitations, refresh tokens, password resets) and one
// table per synced collection. Frozen: later changes go in new migration files appended to MIGRATIONS.
import type { MigrationInterface, QueryRunner } from 'typeorm';

const ROLE_CHECK = "CHECK (role IN ('admin', 'lead', 'safety', 'scout', 'crew'))";

const IDENTITY = [
  `CREATE TABLE users (
    id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
    email text NOT NULL UNIQUE CHECK (email = lower(email)),
    display_name text NOT NULL,
    call_sign text NOT NULL DEFAULT '',
    password_hash text NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE TABLE clubs (
    id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
    name text NOT NULL,
    call_sign text NOT NULL DEFAULT '',
    created_by uuid REFERENCES users(id) ON DELETE SET NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now()
  )`,
  `CREATE TABLE memberships (
    id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
    role text NOT NULL ${ROLE_CHECK},
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    CONSTRAINT memberships_club_user_unique UNIQUE (club_id, user_id)
  )`,
  'CREATE INDEX memberships_user_idx ON memberships (user_id)',
  `CREATE TABLE invitations (
    id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    email text NOT NULL CHECK (email = lower(email)),
    role text NOT NULL ${ROLE_CHECK},
    token_hash text NOT NULL UNIQUE,
    invited_by uuid REFERENCES users(id) ON DELETE SET NULL,
    expires_at timestamptz NOT NULL,
    accepted_at timestamptz,
    accepted_by uuid REFERENCES users(id) ON DELETE SET NULL,
    revoked_at timestamptz,
    created_at timestamptz NOT NULL DEFAULT now()
  )`,
  'CREATE INDEX invitations_club_idx ON invitations (club_id)',
  `CREATE TABLE refresh_tokens (
    id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
    user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
    family_id uuid NOT NULL,
    token_hash text NOT NULL UNIQUE,
    expires_at timestamptz NOT NULL,
    rotated_at timestamptz,
    revoked_at timestamptz,
    created_at timestamptz NOT NULL DEFAULT now()
  )`,
  'CREATE INDEX refresh_tokens_family_idx ON refresh_tokens (family_id)',
  `CREATE TABLE password_resets (
    id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
    user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
    token_hash text NOT NULL UNIQUE,
    expires_at timestamptz NOT NULL,
    used_at timestamptz,
    created_at timestamptz NOT NULL DEFAULT now()
  )`,
];

// change_seq: every insert or update of a synced row takes the same transaction-scoped advisory lock before it
// draws the next number, so transactions that write synced rows run their writes one at a time until commit and
// change_seq order is commit order: a pull by change_seq > cursor never skips a row that commits later.
// The lock key is CHANGE_SEQ_LOCK_KEY in server/src/db/synced-columns.ts.
const CHANGE_SEQ = [
  'CREATE SEQUENCE change_seq AS bigint',
  `CREATE FUNCTION loftline_stamp_change_seq() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN
    PERFORM pg_advisory_xact_lock(7305061);
    NEW.change_seq := nextval('change_seq');
    RETURN NEW;
  END
  $$`,
];

const SYNCED_TABLES = ['sites', 'events', 'supports', 'measurements', 'hazards', 'operating_positions', 'photos', 'stations', 'coax', 'antenna_spots', 'review_decisions'];

const SYNCED = [
  `CREATE TABLE sites (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    name text NOT NULL,
    ref_lat double precision NOT NULL,
    ref_lon double precision NOT NULL,
    notes text NOT NULL,
    ground_description text NOT NULL,
    ground_class text,
    ground_sigma_s_per_m double precision,
    ground_eps_r double precision,
    access_notes text NOT NULL,
    rules text NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE events (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    site_id uuid NOT NULL,
    name text NOT NULL,
    starts_on date NOT NULL,
    ends_on date NOT NULL,
    notes text NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE supports (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    site_id uuid NOT NULL,
    kind text NOT NULL,
    label text NOT NULL,
    lat double precision NOT NULL,
    lon double precision NOT NULL,
    position_accuracy_m double precision,
    height_m double precision,
    attach_height_m double precision,
    launch_method text,
    max_ends integer NOT NULL,
    species text NOT NULL,
    condition text NOT NULL,
    mast_model text NOT NULL,
    notes text NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE measurements (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    site_id uuid NOT NULL,
    subject_collection text NOT NULL,
    subject_id uuid NOT NULL,
    kind text NOT NULL,
    method text NOT NULL,
    inputs jsonb NOT NULL,
    value_m double precision,
    taken_at timestamptz NOT NULL,
    taken_by uuid,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE hazards (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    site_id uuid NOT NULL,
    kind text NOT NULL,
    label text NOT NULL,
    points jsonb NOT NULL,
    is_area boolean NOT NULL,
    height_m double precision,
    voltage_class text,
    voltage_kv double precision,
    notes text NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE operating_positions (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    site_id uuid NOT NULL,
    label text NOT NULL,
    lat double precision NOT NULL,
    lon double precision NOT NULL,
    notes text NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE photos (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    site_id uuid NOT NULL,
    subject_collection text NOT NULL,
    subject_id uuid NOT NULL,
    sha256 text NOT NULL,
    mime_type text NOT NULL,
    bytes integer NOT NULL,
    width integer,
    height integer,
    caption text NOT NULL,
    taken_at timestamptz NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE stations (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    event_id uuid NOT NULL,
    name text NOT NULL,
    bands jsonb NOT NULL,
    mode text NOT NULL,
    power_w double precision NOT NULL,
    purpose text NOT NULL,
    notes text NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE coax (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    label text NOT NULL,
    type text NOT NULL,
    length_m double precision NOT NULL,
    notes text NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE antenna_spots (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    event_id uuid NOT NULL,
    station_id uuid NOT NULL,
    band text NOT NULL,
    shape text NOT NULL,
    support_ids jsonb NOT NULL,
    coax_id uuid,
    operating_position_id uuid,
    state text NOT NULL,
    state_reason text NOT NULL,
    inputs_fingerprint text NOT NULL,
    measured_swr double precision,
    notes text NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
  `CREATE TABLE review_decisions (
    id uuid PRIMARY KEY,
    club_id uuid NOT NULL REFERENCES clubs(id) ON DELETE CASCADE,
    spot_id uuid NOT NULL,
    result_key text NOT NULL,
    decision text NOT NULL,
    reason text NOT NULL,
    inputs_fingerprint text NOT NULL,
    decided_at timestamptz NOT NULL,
    decided_by uuid NOT NULL,
    created_at timestamptz NOT NULL DEFAULT now(),
    updated_at timestamptz NOT NULL DEFAULT now(),
    deleted_at timestamptz,
    field_clocks jsonb NOT NULL DEFAULT '{}',
    deleted_clock text,
    change_seq bigint NOT NULL
  )`,
];

const SYNCED_EXTRAS = SYNCED_TABLES.flatMap((t) => [
  `CREATE INDEX ${t}_club_seq_idx ON ${t} (club_id, change_seq)`,
  `CREATE UNIQUE INDEX ${t}_seq_idx ON ${t} (change_seq)`,
  `CREATE TRIGGER ${t}_change_seq BEFORE INSERT OR UPDATE ON ${t} FOR EACH ROW EXECUTE FUNCTION loftline_stamp_change_seq()`,
]);

const LOOKUPS = [
  'CREATE INDEX events_site_idx ON events (site_id)',
  'CREATE INDEX supports_site_idx ON supports (site_id)',
  'CREATE INDEX measurements_subject_idx ON measurements (subject_id)',
  'CREATE INDEX hazards_site_idx ON hazards (site_id)',
  'CREATE INDEX operating_positions_site_idx ON operating_positions (site_id)',
  'CREATE INDEX photos_site_idx ON photos (site_id)',
  'CREATE INDEX photos_sha256_idx ON photos (club_id, sha256)',
  'CREATE INDEX stations_event_idx ON stations (event_id)',
  'CREATE INDEX antenna_spots_event_idx ON antenna_spots (event_id)',
  'CREATE INDEX review_decisions_spot_idx ON review_decisions (spot_id)',
];

export class InitialSchema1796163364737 implements MigrationInterface {
  name = 'InitialSchema1796163364737';

  async up(q: QueryRunner): Promise<void> {
    for (const sql of [...IDENTITY, ...CHANGE_SEQ, ...SYNCED, ...SYNCED_EXTRAS, ...LOOKUPS]) await q.query(sql);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of [...SYNCED_TABLES].reverse()) await q.query(`DROP TABLE IF EXISTS ${t}`);
    await q.query('DROP FUNCTION IF EXISTS loftline_stamp_change_seq()');
    await q.query('DROP SEQUENCE IF EXISTS change_seq');
    for (const t of ['password_resets', 'refresh_tokens', 'invitations', 'memberships', 'clubs', 'users']) await q.query(`DROP TABLE IF EXISTS ${t}`);
  }
}
