// Sign-up, sign-in, rotating refresh tokens, sign-out, password reset by e-mail. Throws AppError kinds, never
// HTTP statuses. Other modules reuse createUser/issueTokens (e.g. accepting an invitation signs a person up).
import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { Club, Tokens, User, signInSchema, signUpSchema } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import type { UserRow } from '../../db/entities';
import { signAccessToken } from '../../http/access-token';
import { AppError } from '../../http/errors';
import { passwordResetMail } from '../mail/mail-templates';
import * as repo from './repository';
import { burnPasswordCheck, hashPassword, hashToken, newOpaqueToken, verifyPassword } from './secrets';

export type SignUpInput = z.output<typeof signUpSchema>;
export type SignInInput = z.output<typeof signInSchema>;

export const toUser = (u: UserRow): User => ({ id: u.id, email: u.email, displayName: u.displayName, callSign: u.callSign });

const refreshInvalid = () => new AppError('refresh_invalid', 'unauthenticated', 'this session is no longer valid: sign in again');

export class AuthService {
  constructor(private readonly deps: AppDeps) {}

  private get db() {
    return this.deps.dataSource;
  }

  private now(): Date {
    return this.deps.clock.now();
  }

  /** Creates an account (no tokens); 409 email_taken when the address already has one. */
  async createUser(input: SignUpInput, em?: EntityManager): Promise<User> {
    const db = em ?? this.db;
    if (await repo.findUserByEmail(db, input.email)) {
      throw new AppError('email_taken', 'conflict', 'an account with this e-mail already exists: sign in, or reset the password');
    }
    const passwordHash = await hashPassword(input.password);
    try {
      const u = await repo.insertUser(db, { email: input.email, displayName: input.displayName, callSign: input.callSign, passwordHash });
      return toUser(u);
    } catch (err) {
      if ((err as { code?: string }).code === '23505') throw new AppError('email_taken', 'conflict', 'an account with this e-mail already exists');
      throw err;
    }
  }

  /** A new session: an access token and the first refresh token of a new family. */
  async issueTokens(user: User, familyId: string = randomUUID(), em?: EntityManager): Promise<Tokens> {
    const { jwtSecret, accessTokenTtlS, refreshTokenTtlS } = this.deps.config;
    const refreshToken = newOpaqueToken();
    await repo.insertRefreshToken(em ?? this.db, {
      userId: user.id,
      familyId,
      tokenHash: hashToken(refreshToken),
      expiresAt: new Date(this.now().getTime() + refreshTokenTtlS * 1000),
    });
    return { accessToken: signAccessToken(user.id, familyId, jwtSecret, accessTokenTtlS, this.deps.clock), refreshToken, expiresIn: accessTokenTtlS, user };
  }

  async signUp(input: SignUpInput): Promise<Tokens> {
    const user = await this.createUser(input);
    return this.issueTokens(user);
  }

  async signIn(input: SignInInput): Promise<Tokens> {
    const u = await repo.findUserByEmail(this.db, input.email);
    if (!u) {
      await burnPasswordCheck(input.password);
      throw new AppError('invalid_credentials', 'unauthenticated', 'wrong e-mail or password');
    }
    if (!(await verifyPassword(u.passwordHash, input.password))) {
      throw new AppError('invalid_credentials', 'unauthenticated', 'wrong e-mail or password');
    }
    return this.issueTokens(toUser(u));
  }

  /**
   * Rotates a refresh token: the presented one is spent and a new one of the same family issued. Presenting a
   * spent token again means it was copied (or a race of two tabs): the whole family is revoked, signing out
   * every device of that session, so a stolen token stops working as soon as either party uses it.
   */
  async refresh(refreshToken: string): Promise<Tokens> {
    const now = this.now();
    const row = await repo.findRefreshToken(this.db, hashToken(refreshToken));
    if (!row || row.revokedAt) throw refreshInvalid();
    if (row.rotatedAt) {
      await repo.revokeFamily(this.db, row.familyId, now);
      throw new AppError('refresh_reused', 'unauthenticated', 'this refresh token was already used, so the session was closed for safety: sign in again');
    }
    if (row.expiresAt.getTime() <= now.getTime()) throw new AppError('refresh_expired', 'unauthenticated', 'your session has expired: sign in again');
    if (!(await repo.markRotated(this.db, row.id, now))) {
      await repo.revokeFamily(this.db, row.familyId, now);
      throw new AppError('refresh_reused', 'unauthenticated', 'this refresh token was already used, so the session was closed for safety: sign in again');
    }
    const u = await repo.findUserById(this.db, row.userId);
    if (!u) throw refreshInvalid();
    return this.issueTokens(toUser(u), row.familyId);
  }

  /** Ends the session the token belongs to. Unknown or spent tokens are ignored (signing out twice is fine). */
  async signOut(refreshToken: string): Promise<void> {
    const row = await repo.findRefreshToken(this.db, hashToken(refreshToken));
    if (row) await repo.revokeFamily(this.db, row.familyId, this.now());
  }

  /** E-mails a single-use reset link when the address has an account; says nothing either way. */
  async forgotPassword(email: string): Promise<void> {
    const u = await repo.findUserByEmail(this.db, email);
    if (!u) return;
    const token = newOpaqueToken();
    const ttlS = this.deps.config.passwordResetTtlS;
    await repo.insertPasswordReset(this.db, { userId: u.id, tokenHash: hashToken(token), expiresAt: new Date(this.now().getTime() + ttlS * 1000) });
    await this.deps.mail.enqueue(
      passwordResetMail({ to: u.email, appUrl: this.deps.config.appUrl, token, name: u.displayName, validMinutes: Math.round(ttlS / 60) }),
    );
  }

  /** Sets a new password with a reset token (single use, 1 h) and signs out every session of the account. */
  async resetPassword(token: string, password: string): Promise<void> {
    const now = this.now();
    const row = await repo.findPasswordReset(this.db, hashToken(token));
    if (!row) throw new AppError('reset_invalid', 'invalid', 'this reset link is not valid: ask for a new one');
    if (row.usedAt) throw new AppError('reset_used', 'gone', 'this reset link was already used: ask for a new one');
    if (row.expiresAt.getTime() <= now.getTime()) throw new AppError('reset_expired', 'gone', 'this reset link has expired: ask for a new one');
    const passwordHash = await hashPassword(password);
    await this.db.transaction(async (em) => {
      if (!(await repo.markResetUsed(em, row.id, now))) throw new AppError('reset_used', 'gone', 'this reset link was already used: ask for a new one');
      await repo.setPasswordHash(em, row.userId, passwordHash);
      await repo.revokeAllForUser(em, row.userId, now);
    });
  }

  async me(userId: string): Promise<{ user: User; clubs: Club[] }> {
    const u = await repo.findUserById(this.db, userId);
    if (!u) throw new AppError('token_invalid', 'unauthenticated', 'this account no longer exists');
    return { user: toUser(u), clubs: await repo.clubsOfUser(this.db, userId) };
  }
}
