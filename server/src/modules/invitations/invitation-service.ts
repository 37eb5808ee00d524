import type { z } from 'zod';
import type { Invitation, Role, Tokens, inviteAcceptSchema } from '../../../../shared/schemas';
import type { AppDeps } from '../../app-deps';
import type { AuthUser } from '../../http/auth';
import { AppError } from '../../http/errors';
import * as authRepo from '../auth/repository';
import { hashToken, newOpaqueToken } from '../auth/secrets';
import { AuthService, toUser } from '../auth/service';
import { ClubRepository } from '../clubs/club-repository';
import { enqueueMail } from '../mail/mail-service';
import { invitationMail } from '../mail/mail-templates';
import { MemberRepository } from '../members/member-repository';
import { InvitationRepository, toInvitation, type InvitationRecord } from './invitation-repository';

export type InviteAcceptInput = z.output<typeof inviteAcceptSchema>;
export type InvitationPreview = { clubName: string; email: string; role: Role; expiresAt: string; needsSignUp: boolean };

const notValid = () =>
  new AppError('invitation_not_found', 'not_found', 'this invitation link is not valid: it may have been replaced by a newer one or withdrawn. Ask the club admin for a new one.');

export class InvitationService {
  private readonly invitations: InvitationRepository;
  private readonly clubs: ClubRepository;
  private readonly members: MemberRepository;
  private readonly auth: AuthService;

  constructor(private readonly deps: AppDeps) {
    this.invitations = new InvitationRepository(deps.dataSource);
    this.clubs = new ClubRepository(deps.dataSource);
    this.members = new MemberRepository(deps.dataSource);
    this.auth = new AuthService(deps);
  }

  private now(): Date {
    return this.deps.clock.now();
  }

  /**
   * Invites an e-mail address with a role: stores the sha256 of a fresh single-use token, revokes any earlier open
   * invitation of the same address (so only the newest link works) and queues the e-mail in the same transaction:
   * either the invitation and its e-mail both exist, or neither does.
   */
  create(clubId: string, inviter: AuthUser, input: { email: string; role: Role }): Promise<Invitation> {
    return this.deps.dataSource.transaction(async (manager) => {
      if (!(await this.clubs.lock(manager, clubId))) throw new AppError('not_found', 'not_found', 'club not found');
      if (await this.members.isMemberByEmail(manager, clubId, input.email)) {
        throw new AppError('already_member', 'conflict', `${input.email} is already a member of this club: change their role in the member list instead`);
      }
      const now = this.now();
      await this.invitations.revokeOpenFor(manager, clubId, input.email, now);
      const token = newOpaqueToken();
      const expiresAt = new Date(now.getTime() + this.deps.config.invitationTtlS * 1000);
      const id = await this.invitations.insert(manager, {
        clubId,
        email: input.email,
        role: input.role,
        tokenHash: hashToken(token),
        invitedBy: inviter.id,
        expiresAt,
        createdAt: now,
      });
      const record = await this.invitations.findInClub(manager, clubId, id);
      if (!record) throw new Error('the invitation just written cannot be read back');
      const invitedBy = inviter.callSign ? `${inviter.displayName} (${inviter.callSign})` : inviter.displayName;
      await enqueueMail(
        this.deps,
        invitationMail({ to: input.email, appUrl: this.deps.config.appUrl, token, clubName: record.clubName, role: input.role, invitedBy, expiresAt }),
        { manager },
      );
      return toInvitation(record);
    });
  }

  async list(clubId: string): Promise<Invitation[]> {
    return (await this.invitations.list(clubId)).map(toInvitation);
  }

  /** Withdraws an open invitation: its link stops working. */
  revoke(clubId: string, invitationId: string): Promise<void> {
    return this.deps.dataSource.transaction(async (manager) => {
      const inv = await this.invitations.findInClub(manager, clubId, invitationId);
      if (!inv || inv.revokedAt) throw new AppError('not_found', 'not_found', 'invitation not found');
      if (inv.acceptedAt) throw new AppError('invitation_used', 'conflict', 'this invitation was already accepted: remove the member instead');
      await this.invitations.markRevoked(manager, inv.id, this.now());
    });
  }

  /** What the invitation page shows before anyone signs in. */
  async preview(token: string): Promise<InvitationPreview> {
    const inv = this.usable(await this.invitations.findByTokenHash(this.deps.dataSource.manager, hashToken(token)));
    const existing = await authRepo.findUserByEmail(this.deps.dataSource.manager, inv.email);
    return { clubName: inv.clubName, email: inv.email, role: inv.role, expiresAt: inv.expiresAt.toISOString(), needsSignUp: !existing };
  }

  /**
   * Joins the club with the invited role. A signed-in caller must be the invited address; a new person sends
   * `signUp` and gets an account for the invited address in the same step. Single use: the row is locked, so
   * two tabs accepting at once make one member and one clear error.
   */
  accept(input: InviteAcceptInput, caller: AuthUser | null): Promise<Tokens> {
    return this.deps.dataSource.transaction(async (manager) => {
      const inv = this.usable(await this.invitations.findByTokenHash(manager, hashToken(input.token), true));
      let user;
      if (caller) {
        if (caller.email !== inv.email) {
          throw new AppError(
            'invitation_email_mismatch',
            'forbidden',
            `this invitation was sent to ${inv.email}, but you are signed in as ${caller.email}. Sign out and open the link again, or ask the admin to invite ${caller.email}.`,
          );
        }
        user = { id: caller.id, email: caller.email, displayName: caller.displayName, callSign: caller.callSign };
      } else if (input.signUp) {
        if (await authRepo.findUserByEmail(manager, inv.email)) {
          throw new AppError('email_taken', 'conflict', `an account for ${inv.email} already exists: sign in, then open the invitation link again`);
        }
        user = await this.auth.createUser({ email: inv.email, ...input.signUp }, manager);
      } else {
        throw new AppError('sign_in_required', 'unauthenticated', `sign in as ${inv.email}, or sign up, to accept this invitation`);
      }
      await this.clubs.lock(manager, inv.clubId);
      const current = await this.members.find(manager, inv.clubId, user.id);
      if (current) {
        throw new AppError('already_member', 'conflict', `you are already a member of ${inv.clubName} (as ${current.role}): ask an admin to change your role`);
      }
      await this.members.add(manager, inv.clubId, user.id, inv.role);
      await this.invitations.markAccepted(manager, inv.id, user.id, this.now());
      const row = await authRepo.findUserById(manager, user.id);
      return this.auth.issueTokens(row ? toUser(row) : user, undefined, manager);
    });
  }

  private usable(inv: InvitationRecord | null): InvitationRecord {
    if (!inv || inv.revokedAt) throw notValid();
    if (inv.acceptedAt) throw new AppError('invitation_used', 'gone', 'this invitation was already accepted: sign in to reach the club');
    if (inv.expiresAt.getTime() <= this.now().getTime()) {
      throw new AppError('invitation_expired', 'gone', 'this invitation has expired: ask the club admin to send a new one');
    }
    return inv;
  }
}
