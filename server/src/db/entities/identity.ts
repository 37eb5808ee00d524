// Entities of people, clubs and sign-in secrets. EntitySchema (not decorators): rows are plain objects, and the
// schema needs no design-time type metadata (tsx emits none).
import { EntitySchema } from 'typeorm';
import type { Role } from '../../../../shared/schemas';

const id = { type: 'uuid', primary: true, generated: 'uuid' } as const;
const createdAt = { type: 'timestamptz', name: 'created_at', createDate: true } as const;
const updatedAt = { type: 'timestamptz', name: 'updated_at', updateDate: true } as const;
const uuidCol = (name: string, nullable = false) => ({ type: 'uuid', name, nullable }) as const;
const instantCol = (name: string, nullable = false) => ({ type: 'timestamptz', name, nullable }) as const;

export interface UserRow {
  id: string;
  email: string;
  displayName: string;
  callSign: string;
  passwordHash: string;
  createdAt: Date;
  updatedAt: Date;
}
export const UserEntity = new EntitySchema<UserRow>({
  name: 'User',
  tableName: 'users',
  columns: {
    id,
    email: { type: 'text', unique: true },
    displayName: { type: 'text', name: 'display_name' },
    callSign: { type: 'text', name: 'call_sign', default: '' },
    passwordHash: { type: 'text', name: 'password_hash' },
    createdAt,
    updatedAt,
  },
});

export interface ClubRow {
  id: string;
  name: string;
  callSign: string;
  createdBy: string | null;
  createdAt: Date;
  updatedAt: Date;
}
export const ClubEntity = new EntitySchema<ClubRow>({
  name: 'Club',
  tableName: 'clubs',
  columns: {
    id,
    name: { type: 'text' },
    callSign: { type: 'text', name: 'call_sign', default: '' },
    createdBy: uuidCol('created_by', true),
    createdAt,
    updatedAt,
  },
});

export interface MembershipRow {
  id: string;
  clubId: string;
  userId: string;
  role: Role;
  createdAt: Date;
  updatedAt: Date;
}
export const MembershipEntity = new EntitySchema<MembershipRow>({
  name: 'Membership',
  tableName: 'memberships',
  columns: {
    id,
    clubId: uuidCol('club_id'),
    userId: uuidCol('user_id'),
    role: { type: 'text' },
    createdAt,
    updatedAt,
  },
});

export interface InvitationRow {
  id: string;
  clubId: string;
  email: string;
  role: Role;
  /** sha256 of the token e-mailed in the link; the token itself is never stored. */
  tokenHash: string;
  invitedBy: string | null;
  expiresAt: Date;
  acceptedAt: Date | null;
  acceptedBy: string | null;
  revokedAt: Date | null;
  createdAt: Date;
}
export const InvitationEntity = new EntitySchema<InvitationRow>({
  name: 'Invitation',
  tableName: 'invitations',
  columns: {
    id,
    clubId: uuidCol('club_id'),
    email: { type: 'text' },
    role: { type: 'text' },
    tokenHash: { type: 'text', name: 'token_hash', unique: true },
    invitedBy: uuidCol('invited_by', true),
    expiresAt: instantCol('expires_at'),
    acceptedAt: instantCol('accepted_at', true),
    acceptedBy: uuidCol('accepted_by', true),
    revokedAt: instantCol('revoked_at', true),
    createdAt,
  },
});

export interface RefreshTokenRow {
  id: string;
  userId: string;
  /** All tokens descended from one sign-in share a family; reuse of a rotated token revokes the family. */
  familyId: string;
  tokenHash: string;
  expiresAt: Date;
  rotatedAt: Date | null;
  revokedAt: Date | null;
  createdAt: Date;
}
export const RefreshTokenEntity = new EntitySchema<RefreshTokenRow>({
  name: 'RefreshToken',
  tableName: 'refresh_tokens',
  columns: {
    id,
    userId: uuidCol('user_id'),
    familyId: uuidCol('family_id'),
    tokenHash: { type: 'text', name: 'token_hash', unique: true },
    expiresAt: instantCol('expires_at'),
    rotatedAt: instantCol('rotated_at', true),
    revokedAt: instantCol('revoked_at', true),
    createdAt,
  },
});

export interface PasswordResetRow {
  id: string;
  userId: string;
  tokenHash: string;
  expiresAt: Date;
  usedAt: Date | null;
  createdAt: Date;
}
export const PasswordResetEntity = new EntitySchema<PasswordResetRow>({
  name: 'PasswordReset',
  tableName: 'password_resets',
  columns: {
    id,
    userId: uuidCol('user_id'),
    tokenHash: { type: 'text', name: 'token_hash', unique: true },
    expiresAt: instantCol('expires_at'),
    usedAt: instantCol('used_at', true),
    createdAt,
  },
});
