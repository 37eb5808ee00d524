import { z } from 'zod';
import { collectionNameSchema, idSchema, isoInstantSchema } from '../../shared/schemas';
import { hlcNodeSchema, hlcStringSchema } from './hlc';

/*
 * The sync wire format. Every request carries the protocol and schema versions; every answer is a tagged union
 * so that "client too old" and "server too old" are typed answers, not errors.
 */

export const MAX_PUSH_MUTATIONS = 1000;
export const MAX_PULL_LIMIT = 1000;

const versionFields = {
  protocolVersion: z.number().int().positive(),
  schemaVersion: z.number().int().positive(),
};

/** A JSON value as a field carries it (checked in detail against the collection's schema on the server). */
const jsonValue: z.ZodType<unknown> = z.unknown();

export const MUTATION_OPS = ['upsert', 'delete', 'undelete'] as const;
export const mutationOpSchema = z.enum(MUTATION_OPS);
export type MutationOp = z.infer<typeof mutationOpSchema>;

export const mutationSchema = z.strictObject({
  /** Per-device counter: 1, 2, 3… in the order the device made its changes. */
  mutationId: z.number().int().positive(),
  collection: collectionNameSchema,
  recordId: idSchema,
  op: mutationOpSchema,
  /** For upsert: the fields written (all of them when creating, the changed ones when editing). */
  fields: z.record(z.string(), jsonValue).default({}),
  /** For each written field, the clock of the value the writer saw when it changed it (null: none seen). */
  baseClocks: z.record(z.string(), hlcStringSchema.nullable()).default({}),
  clock: hlcStringSchema,
});
export type Mutation = z.infer<typeof mutationSchema>;

export const pushRequestSchema = z.strictObject({
  type: z.literal('push'),
  ...versionFields,
  deviceId: hlcNodeSchema,
  mutations: z.array(mutationSchema).max(MAX_PUSH_MUTATIONS, `at most ${MAX_PUSH_MUTATIONS} mutations per push`),
});
export type PushRequest = z.infer<typeof pushRequestSchema>;

export const REJECTION_CODES = ['invalid', 'forbidden', 'not-found', 'append-only', 'bad-clock'] as const;
export const rejectionSchema = z.strictObject({
  mutationId: z.number().int().positive(),
  collection: collectionNameSchema,
  recordId: idSchema,
  op: mutationOpSchema,
  code: z.enum(REJECTION_CODES),
  message: z.string(),
  details: z.unknown().optional(),
});
export type Rejection = z.infer<typeof rejectionSchema>;

const tooOldAnswers = [
  z.strictObject({ type: z.literal('client-too-old'), message: z.string(), serverProtocolVersion: z.number().int() }),
  z.strictObject({ type: z.literal('server-too-old'), message: z.string(), serverProtocolVersion: z.number().int() }),
] as const;

export const pushResponseSchema = z.discriminatedUnion('type', [
  z.strictObject({
    type: z.literal('pushed'),
    /** Every mutation of this device up to this id has been applied or rejected. */
    lastAppliedMutationId: z.number().int().min(0),
    /** Rejections among the mutations of this request (also when they were decided by an earlier delivery). */
    rejected: z.array(rejectionSchema),
    serverTimeMs: z.number().int(),
  }),
  ...tooOldAnswers,
]);
export type PushResponse = z.infer<typeof pushResponseSchema>;

/** Cursor: the change sequence number of the last change received ("0" before the first pull). */
export const cursorSchema = z.string().regex(/^\d{1,19}$/, 'cursor must be a change sequence number');

export const pullRequestSchema = z.strictObject({
  type: z.literal('pull'),
  ...versionFields,
  cursor: cursorSchema,
  limit: z.number().int().min(1).max(MAX_PULL_LIMIT),
});
export type PullRequest = z.infer<typeof pullRequestSchema>;

/** A full record as the server holds it, with the clock of every field and of its deletion state. */
export const wireRecordSchema = z.strictObject({
  collection: collectionNameSchema,
  id: idSchema,
  clubId: idSchema,
  fields: z.record(z.string(), jsonValue),
  fieldClocks: z.record(z.string(), hlcStringSchema),
  deletedAt: isoInstantSchema.nullable(),
  /** Clock of the last delete or undelete (null: never deleted). */
  deletedClock: hlcStringSchema.nullable(),
  createdAt: isoInstantSchema,
  updatedAt: isoInstantSchema,
  changeSeq: cursorSchema,
});
export type WireRecord = z.infer<typeof wireRecordSchema>;

export const pullResponseSchema = z.discriminatedUnion('type', [
  z.strictObject({
    type: z.literal('changes'),
    changes: z.array(wireRecordSchema),
    cursor: cursorSchema,
    hasMore: z.boolean(),
    serverTimeMs: z.number().int(),
  }),
  /** The cursor is older than the tombstone horizon (or from another database): push the outbox, then pull from "0". */
  z.strictObject({ type: z.literal('resync-required'), message: z.string(), serverTimeMs: z.number().int() }),
  ...tooOldAnswers,
]);
export type PullResponse = z.infer<typeof pullResponseSchema>;

/** What GET …/sync/rejected lists: the caller's own rejected mutations, newest first. */
export const rejectedEntrySchema = rejectionSchema.extend({
  id: z.string(),
  deviceId: z.string(),
  fields: z.record(z.string(), jsonValue),
  clock: hlcStringSchema,
  createdAt: isoInstantSchema,
});
export type RejectedEntry = z.infer<typeof rejectedEntrySchema>;

/** What GET …/sync/conflicts lists: concurrent changes of a safety-relevant field, both values and who made them. */
export const conflictEntrySchema = z.strictObject({
  id: z.string(),
  collection: collectionNameSchema,
  recordId: idSchema,
  field: z.string(),
  keptValue: jsonValue,
  keptClock: hlcStringSchema,
  keptBy: idSchema.nullable(),
  otherValue: jsonValue,
  otherClock: hlcStringSchema,
  otherBy: idSchema.nullable(),
  createdAt: isoInstantSchema,
  /** When a lead or admin settled it (null: still open), who, which value they chose, and why. */
  resolvedAt: isoInstantSchema.nullable(),
  resolvedBy: idSchema.nullable(),
  choice: z.enum(['kept', 'other']).nullable(),
  note: z.string().nullable(),
});
export type ConflictEntry = z.infer<typeof conflictEntrySchema>;

/** Server-assigned ids of conflict and refused-change entries (bigserial). */
export const problemIdSchema = z.string().regex(/^[1-9]\d{0,17}$/, 'id must be a positive whole number');

/**
 * POST …/sync/conflicts/:conflictId/resolve. "kept": the value the merge kept stays; "other": the lead has written
 * the other value through sync as an ordinary change (the server does not write it here, so review of affected
 * spots re-opens through the same path as any other edit).
 */
export const resolveConflictBodySchema = z.strictObject({
  choice: z.enum(['kept', 'other'], { message: "choice must be 'kept' or 'other'" }),
  note: z.string().trim().max(500, 'a note is at most 500 characters').optional(),
});
export type ResolveConflictBody = z.infer<typeof resolveConflictBodySchema>;
