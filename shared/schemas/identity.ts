import { z } from 'zod';
import { idSchema, isoInstantSchema, nameText } from './common';
import { roleSchema } from './roles';

/* Bodies and answers of the REST API for people, clubs and membership (see README "API"). */

export const emailSchema = z.string().trim().toLowerCase().max(254, 'e-mail is too long').pipe(z.email({ message: 'enter a valid e-mail address' }));
export const passwordSchema = z
  .string()
  .min(10, 'use at least 10 characters')
  .max(200, 'use at most 200 characters');
export const callSignSchema = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z0-9]{1,3}[0-9][A-Z0-9]{0,4}[A-Z]$/, 'enter a call sign such as K0XYZ')
  .or(z.literal(''));

export const signUpSchema = z.strictObject({
  email: emailSchema,
  password: passwordSchema,
  displayName: nameText(80, 'name'),
  callSign: callSignSchema.default(''),
});
export const signInSchema = z.strictObject({ email: emailSchema, password: z.string().min(1, 'enter your password').max(200) });
export const refreshSchema = z.strictObject({ refreshToken: z.string().min(20).max(500) });
export const forgotPasswordSchema = z.strictObject({ email: emailSchema });
export const resetPasswordSchema = z.strictObject({ token: z.string().min(20).max(500), password: passwordSchema });

export const userSchema = z.object({
  id: idSchema,
  email: z.string(),
  displayName: z.string(),
  callSign: z.string(),
});
export type User = z.infer<typeof userSchema>;

export const tokensSchema = z.object({
  accessToken: z.string(),
  refreshToken: z.string(),
  /** Seconds until the access token expires. */
  expiresIn: z.number(),
  user: userSchema,
});
export type Tokens = z.infer<typeof tokensSchema>;

export const clubCreateSchema = z.strictObject({ name: nameText(120, 'club name'), callSign: callSignSchema.default('') });
/** PATCH /api/clubs/:clubId (club.manage): rename the club or change its call sign; send at least one. */
export const clubUpdateSchema = z
  .strictObject({ name: nameText(120, 'club name').optional(), callSign: callSignSchema.optional() })
  .refine((u) => u.name !== undefined || u.callSign !== undefined, { message: 'send a new name or call sign' });
export const clubSchema = z.object({ id: idSchema, name: z.string(), callSign: z.string(), role: roleSchema });
export type Club = z.infer<typeof clubSchema>;

export const memberSchema = z.object({
  userId: idSchema,
  email: z.string(),
  displayName: z.string(),
  callSign: z.string(),
  role: roleSchema,
  joinedAt: isoInstantSchema,
});
export type Member = z.infer<typeof memberSchema>;
export const memberRoleUpdateSchema = z.strictObject({ role: roleSchema });

export const inviteCreateSchema = z.strictObject({ email: emailSchema, role: roleSchema });
export const invitationSchema = z.object({
  id: idSchema,
  email: z.string(),
  role: roleSchema,
  clubId: idSchema,
  clubName: z.string(),
  expiresAt: isoInstantSchema,
  acceptedAt: isoInstantSchema.nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;
/** Accepting: a signed-in user just sends the token; a new person also signs up in the same step. */
export const inviteAcceptSchema = z.strictObject({
  token: z.string().min(20).max(500),
  signUp: z.strictObject({ password: passwordSchema, displayName: nameText(80, 'name'), callSign: callSignSchema.default('') }).optional(),
});

/** The error body every failing API call answers. */
export const apiErrorSchema = z.object({
  code: z.string(),
  message: z.string(),
  details: z.unknown().optional(),
});
export type ApiError = z.infer<typeof apiErrorSchema>;
