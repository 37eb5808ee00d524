import { z } from 'zod';
import { idSchema, isoDaySchema, isoInstantSchema, latLonSchema, latSchema, lonSchema, nameText, recordMetaSchema, shortText } from './common';
import type { Ability } from './roles';

/*
 * The records a club keeps about a field day, as stored on the phone (IndexedDB) and in PostgreSQL.
 * Each `*FieldsSchema` is what a client may write; the full record adds id, clubId and timestamps.
 * The sync layer moves these records field by field, so every field is a plain JSON value.
 * Units are SI and named in the field (heightM, powerW); feet appear only in the UI.
 */

const notes = shortText(4000, 'notes').default('');
const optionalNumber = (schema: z.ZodNumber) => schema.nullable().default(null);

// ---- sites and events -------------------------------------------------------------------------------

export const GROUND_CHOICE_NOTE_MAX = 500;
export const siteFieldsSchema = z.strictObject({
  name: nameText(120, 'site name'),
  refLat: latSchema,
  refLon: lonSchema,
  notes,
  /** Plain-words description of the soil the scout saw ("wet meadow"), kept beside the class it maps to. */
  groundDescription: shortText(GROUND_CHOICE_NOTE_MAX, 'ground description').default(''),
  /** A ground class name from shared/ground (kebab-case), or null when custom values are given. */
  groundClass: z.string().max(60).nullable().default(null),
  groundSigmaSPerM: optionalNumber(z.number().positive('conductivity must be above 0').max(10, 'conductivity above 10 S/m is not ground')),
  groundEpsR: optionalNumber(z.number().min(1, 'relative permittivity is at least 1').max(100, 'relative permittivity above 100 is not ground')),
  accessNotes: shortText(4000, 'access notes').default(''),
  /** Site rules in plain words, one per line ("no stakes", "no launchers after 18:00"). */
  rules: shortText(4000, 'site rules').default(''),
});

/**
 * The site fields a scout records during the survey ("survey.write": ground, site notes). Changing only these
 * needs survey.write; anything else on a site (name, reference point) or creating a site needs event.write.
 */
export const SITE_SURVEY_FIELDS = ['groundDescription', 'groundClass', 'groundSigmaSPerM', 'groundEpsR', 'accessNotes', 'rules', 'notes'] as const;

export const eventFieldsSchema = z
  .strictObject({
    siteId: idSchema,
    name: nameText(120, 'event name'),
    startsOn: isoDaySchema,
    endsOn: isoDaySchema,
    notes,
  })
  .refine((e) => e.endsOn >= e.startsOn, { message: 'the event must end on or after its first day', path: ['endsOn'] });

// ---- the survey ------------------------------------------------------------------------------------

export const SUPPORT_KINDS = ['tree', 'mast', 'structure'] as const;
export const LAUNCH_METHODS = ['hand-throw', 'throw-bag', 'slingshot', 'pneumatic', 'climb', 'none'] as const;
export const supportFieldsSchema = z.strictObject({
  siteId: idSchema,
  kind: z.enum(SUPPORT_KINDS, { message: 'kind must be tree, mast or structure' }),
  label: nameText(60, 'label'),
  lat: latSchema,
  lon: lonSchema,
  /** Radius of the 68 % circle of the averaged fix, metres. */
  positionAccuracyM: optionalNumber(z.number().min(0).max(500, 'a fix worse than 500 m cannot place a support')),
  /** Overall height of the tree, mast or structure above its base. */
  heightM: optionalNumber(z.number().positive('height must be above 0').max(120, 'no support here is taller than 120 m')),
  /** Highest point a line can actually be attached (over a branch, at a mast's top pulley). */
  attachHeightM: optionalNumber(z.number().positive('attachment height must be above 0').max(120)),
  launchMethod: z.enum(LAUNCH_METHODS).nullable().default(null),
  /** How many wire ends this support can carry (a mast with one pulley: 1). */
  maxEnds: z.number().int().min(1).max(4).default(2),
  species: shortText(80, 'species').default(''),
  condition: shortText(1000, 'condition').default(''),
  /** For a mast spot: the mast the club would bring ("9 m telescopic fibreglass"). */
  mastModel: shortText(120, 'mast').default(''),
  notes,
});

export const MEASUREMENT_KINDS = ['gps-fix', 'height'] as const;
/** A reading kept as its own record: two scouts' readings of the same tree both survive. */
export const measurementFieldsSchema = z.strictObject({
  siteId: idSchema,
  /** The collection and id of the record measured ("supports", "hazards"). */
  subjectCollection: z.enum(['supports', 'hazards', 'operatingPositions']),
  subjectId: idSchema,
  kind: z.enum(MEASUREMENT_KINDS),
  /** How it was taken: "averaged-fix", "tangent", "two-angle", "percent", "sine", "estimate", "offset". */
  method: shortText(40, 'method'),
  /** The raw readings the method used, so the value can be recomputed and audited. */
  inputs: z.record(z.string(), z.union([z.number(), z.string(), z.boolean(), z.null()])).default({}),
  /** Result: metres for a height; for a fix, lat/lon in inputs and the accuracy here. */
  valueM: z.number().nullable().default(null),
  takenAt: isoInstantSchema,
  takenBy: idSchema.nullable().default(null),
});

export const HAZARD_KINDS = ['power-line', 'path', 'road', 'parking', 'building', 'water'] as const;
export const VOLTAGE_CLASSES = ['service-drop', 'distribution', 'transmission', 'unknown'] as const;
export const hazardFieldsSchema = z
  .strictObject({
    siteId: idSchema,
    kind: z.enum(HAZARD_KINDS),
    label: nameText(60, 'label'),
    points: z.array(latLonSchema).min(1, 'mark at least one point').max(200, 'at most 200 points'),
    /** Closed outline (parking, building, water) rather than a line. */
    isArea: z.boolean().default(false),
    heightM: optionalNumber(z.number().positive().max(200, 'no line here is higher than 200 m')),
    voltageClass: z.enum(VOLTAGE_CLASSES).nullable().default(null),
    /** Nominal phase-to-phase voltage when known. Unknown voltage is planned as transmission. */
    voltageKv: optionalNumber(z.number().positive().max(1200)),
    notes,
  })
  .refine((h) => h.kind !== 'power-line' || h.points.length >= 2, {
    message: 'a power line needs at least two points',
    path: ['points'],
  });

export const operatingPositionFieldsSchema = z.strictObject({
  siteId: idSchema,
  label: nameText(60, 'label'),
  lat: latSchema,
  lon: lonSchema,
  notes,
});

export const photoFieldsSchema = z.strictObject({
  siteId: idSchema,
  subjectCollection: z.enum(['supports', 'hazards', 'operatingPositions', 'sites']),
  subjectId: idSchema,
  sha256: z.string().regex(/^[0-9a-f]{64}$/, 'sha256 must be 64 lowercase hex digits'),
  mimeType: z.enum(['image/jpeg', 'image/png', 'image/webp']),
  bytes: z.number().int().positive().max(20_000_000, 'a photo may be at most 20 MB'),
  width: z.number().int().positive().nullable().default(null),
  height: z.number().int().positive().nullable().default(null),
  caption: shortText(300, 'caption').default(''),
  takenAt: isoInstantSchema,
});

// ---- the plan ---------------------------------------------------------------------------------------

export const MODES = ['ssb', 'cw', 'digital', 'fm'] as const;
export const PURPOSES = ['long-distance', 'regional', 'near-vertical'] as const;
export const BAND_NAMES = ['160m', '80m', '60m', '40m', '30m', '20m', '17m', '15m', '12m', '10m', '6m'] as const;
export const stationFieldsSchema = z.strictObject({
  eventId: idSchema,
  name: nameText(60, 'station name'),
  bands: z.array(z.enum(BAND_NAMES)).min(1, 'pick at least one band').max(11),
  mode: z.enum(MODES),
  powerW: z.number().positive('power must be above 0').max(1500, 'US amateur limit is 1500 W PEP (47 CFR 97.313)'),
  purpose: z.enum(PURPOSES),
  /** Club members (user ids) who put this station's antennas up on the day; they get its crew sheets first. */
  crewMemberIds: z.array(idSchema).max(30, 'at most 30 crew members per station').default([]),
  notes,
});

export const COAX_TYPES = ['RG-8', 'RG-213', 'RG-8X', 'RG-58', 'RG-174', 'LMR-400'] as const;
export const coaxFieldsSchema = z.strictObject({
  label: nameText(60, 'label'),
  type: z.enum(COAX_TYPES),
  lengthM: z.number().positive().max(300, 'a coax piece longer than 300 m is not plausible'),
  notes,
});

export const SPOT_STATES = ['planned', 'waiting-review', 'sent-back', 'cleared', 'up', 'down'] as const;
export const spotStateSchema = z.enum(SPOT_STATES);
export type SpotState = z.infer<typeof spotStateSchema>;
export const antennaSpotFieldsSchema = z.strictObject({
  eventId: idSchema,
  stationId: idSchema,
  band: z.enum(BAND_NAMES),
  shape: z.enum(['flat', 'inverted-v']),
  /** One support for an inverted-V, two for a flat-top. */
  supportIds: z.array(idSchema).min(1).max(2),
  /**
   * For an inverted-V: the compass bearing of the line through both leg ends, degrees from true north in
   * [0, 180) (a wire laid 30°–210° is 30). Null for a flat-top, or to let the engine pick its best direction.
   */
  legAzimuthDeg: optionalNumber(z.number().min(0, 'leg bearing is 0 to 179.9°').lt(180, 'leg bearing is 0 to 179.9° (a wire along 200° is along 20°)')),
  coaxId: idSchema.nullable().default(null),
  operatingPositionId: idSchema.nullable().default(null),
  state: spotStateSchema.default('planned'),
  stateReason: shortText(500, 'reason').default(''),
  /** Fingerprint of the supports, hazards and ground the clearances were computed from. */
  inputsFingerprint: z.string().max(128).default(''),
  measuredSwr: optionalNumber(z.number().min(1, 'SWR is at least 1').max(100)),
  notes,
}).refine((s) => s.legAzimuthDeg === null || s.shape === 'inverted-v', {
  message: 'only an inverted-V has a leg bearing',
  path: ['legAzimuthDeg'],
});

export const reviewDecisionFieldsSchema = z.strictObject({
  spotId: idSchema,
  /** Which clearance result this decides (stable key from the engine, e.g. "power-line:<hazardId>"). */
  resultKey: z.string().min(1).max(200),
  decision: z.enum(['accept', 'send-back']),
  reason: z.string().trim().min(3, 'write the reason for the decision').max(2000),
  inputsFingerprint: z.string().max(128),
  decidedAt: isoInstantSchema,
  decidedBy: idSchema,
});

// ---- the collections --------------------------------------------------------------------------------

/**
 * The synced collections, the schema of the fields a client writes, and the ability a writer needs.
 * Events and sites are also created online through the REST API; they sync down to phones like the rest.
 * Review decisions are append-only: a new decision supersedes, none is edited.
 */
export const COLLECTIONS = {
  sites: { fields: siteFieldsSchema, ability: 'event.write', appendOnly: false },
  events: { fields: eventFieldsSchema, ability: 'event.write', appendOnly: false },
  supports: { fields: supportFieldsSchema, ability: 'survey.write', appendOnly: false },
  measurements: { fields: measurementFieldsSchema, ability: 'survey.write', appendOnly: true },
  hazards: { fields: hazardFieldsSchema, ability: 'survey.write', appendOnly: false },
  operatingPositions: { fields: operatingPositionFieldsSchema, ability: 'survey.write', appendOnly: false },
  photos: { fields: photoFieldsSchema, ability: 'survey.write', appendOnly: false },
  stations: { fields: stationFieldsSchema, ability: 'plan.write', appendOnly: false },
  coax: { fields: coaxFieldsSchema, ability: 'plan.write', appendOnly: false },
  antennaSpots: { fields: antennaSpotFieldsSchema, ability: 'plan.write', appendOnly: false },
  reviewDecisions: { fields: reviewDecisionFieldsSchema, ability: 'review.decide', appendOnly: true },
} as const satisfies Record<string, { fields: z.ZodType; ability: Ability; appendOnly: boolean }>;

export type CollectionName = keyof typeof COLLECTIONS;
export const collectionNameSchema = z.enum(Object.keys(COLLECTIONS) as [CollectionName, ...CollectionName[]]);
export type CollectionFields<C extends CollectionName> = z.infer<(typeof COLLECTIONS)[C]['fields']>;
/** A stored record: the writable fields plus id, club and timestamps. */
export type StoredRecord<C extends CollectionName> = CollectionFields<C> & z.infer<typeof recordMetaSchema> & { clubId: string };

export type Site = StoredRecord<'sites'>;
export type ClubEvent = StoredRecord<'events'>;
export type Support = StoredRecord<'supports'>;
export type Measurement = StoredRecord<'measurements'>;
export type Hazard = StoredRecord<'hazards'>;
export type OperatingPosition = StoredRecord<'operatingPositions'>;
export type Photo = StoredRecord<'photos'>;
export type Station = StoredRecord<'stations'>;
export type Coax = StoredRecord<'coax'>;
export type AntennaSpot = StoredRecord<'antennaSpots'>;
export type ReviewDecision = StoredRecord<'reviewDecisions'>;

/** Fields whose concurrent change is kept as a conflict for the lead to see (safety-relevant). */
export const SAFETY_FIELDS: Partial<Record<CollectionName, readonly string[]>> = {
  supports: ['heightM', 'attachHeightM', 'lat', 'lon', 'maxEnds'],
  hazards: ['points', 'heightM', 'voltageClass', 'voltageKv', 'kind'],
  sites: ['groundClass', 'groundSigmaSPerM', 'groundEpsR'],
};
