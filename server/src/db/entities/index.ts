// Every entity the DataSource knows. A helper adding tables appends its entities here (small edit).
import {
  ClubEntity,
  InvitationEntity,
  MembershipEntity,
  PasswordResetEntity,
  RefreshTokenEntity,
  UserEntity,
} from './identity';
import { SYNCED_ENTITIES } from './synced';

export * from './identity';
export * from './synced';

export const ENTITIES = [
  UserEntity,
  ClubEntity,
  MembershipEntity,
  InvitationEntity,
  RefreshTokenEntity,
  PasswordResetEntity,
  ...Object.values(SYNCED_ENTITIES),
];
