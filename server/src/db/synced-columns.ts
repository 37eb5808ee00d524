// The columns of every synced table: one table per entry of COLLECTIONS (shared/schemas/records.ts).
// The entities are built from this list; the migrations that created the tables are frozen SQL, and
// tests/server/schema.test.ts checks that this list, the zod field schemas and the live tables agree.
import type { CollectionName } from '../../../shared/schemas';

export type PgColumnType = 'uuid' | 'text' | 'double precision' | 'integer' | 'boolean' | 'jsonb' | 'date' | 'timestamptz';
export interface FieldColumn {
  type: PgColumnType;
  nullable?: boolean;
}

const uuid: FieldColumn = { type: 'uuid' };
const uuidNull: FieldColumn = { type: 'uuid', nullable: true };
const text: FieldColumn = { type: 'text' };
const textNull: FieldColumn = { type: 'text', nullable: true };
const num: FieldColumn = { type: 'double precision' };
const numNull: FieldColumn = { type: 'double precision', nullable: true };
const int: FieldColumn = { type: 'integer' };
const intNull: FieldColumn = { type: 'integer', nullable: true };
const bool: FieldColumn = { type: 'boolean' };
const json: FieldColumn = { type: 'jsonb' };
const day: FieldColumn = { type: 'date' };
const instant: FieldColumn = { type: 'timestamptz' };

/** Property name (camelCase, as in the zod schema) → column. Column names are the snake_case of the property. */
export const SYNCED_FIELD_COLUMNS: { [C in CollectionName]: Record<string, FieldColumn> } = {
  sites: {
    name: text, refLat: num, refLon: num, notes: text, groundDescription: text, groundClass: textNull,
    groundSigmaSPerM: numNull, groundEpsR: numNull, accessNotes: text, rules: text,
  },
  events: { siteId: uuid, name: text, startsOn: day, endsOn: day, notes: text },
  supports: {
    siteId: uuid, kind: text, label: text, lat: num, lon: num, positionAccuracyM: numNull, heightM: numNull,
    attachHeightM: numNull, launchMethod: textNull, maxEnds: int, species: text, condition: text, mastModel: text, notes: text,
  },
  measurements: {
    siteId: uuid, subjectCollection: text, subjectId: uuid, kind: text, method: text, inputs: json, valueM: numNull,
    takenAt: instant, takenBy: uuidNull,
  },
  hazards: {
    siteId: uuid, kind: text, label: text, points: json, isArea: bool, heightM: numNull, voltageClass: textNull,
    voltageKv: numNull, notes: text,
  },
  operatingPositions: { siteId: uuid, label: text, lat: num, lon: num, notes: text },
  photos: {
    siteId: uuid, subjectCollection: text, subjectId: uuid, sha256: text, mimeType: text, bytes: int, width: intNull,
    height: intNull, caption: text, takenAt: instant,
  },
  stations: { eventId: uuid, name: text, bands: json, mode: text, powerW: num, purpose: text, crewMemberIds: json, notes: text },
  coax: { label: text, type: text, lengthM: num, notes: text },
  antennaSpots: {
    eventId: uuid, stationId: uuid, band: text, shape: text, supportIds: json, legAzimuthDeg: numNull, coaxId: uuidNull, operatingPositionId: uuidNull,
    state: text, stateReason: text, inputsFingerprint: text, measuredSwr: numNull, notes: text,
  },
  reviewDecisions: {
    spotId: uuid, resultKey: text, decision: text, reason: text, inputsFingerprint: text, decidedAt: instant, decidedBy: uuid,
  },
};

export const snakeCase = (name: string): string => name.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/** Table name of a collection: `operatingPositions` → `operating_positions`. */
export const tableOf = (collection: CollectionName): string => snakeCase(collection);

/**
 * Key of the transaction-scoped advisory lock every synced-table write takes (see the change_seq trigger):
 * writers are serialised from their first synced write to commit, so change_seq order is commit order.
 */
export const CHANGE_SEQ_LOCK_KEY = 7_305_061;
