// Route guards: requireUser (a valid access token), requireMembership (member of :clubId, else 404 — another
// club's data does not even admit it exists), requireAbility (the member's role grants it, else 403).
import type { RequestHandler } from 'express';
import { Passport } from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import { can, idSchema, type Ability, type Role } from '../../../shared/schemas';
import type { AppDeps } from '../app-deps';
import { IsNull } from 'typeorm';
import { MembershipEntity, RefreshTokenEntity, UserEntity } from '../db/entities';
import { AppError } from './errors';
import { ACCESS_TOKEN_AUDIENCE, ACCESS_TOKEN_ISSUER, type AccessTokenPayload } from './access-token';

export interface AuthUser {
  id: string;
  email: string;
  displayName: string;
  callSign: string;
}

export interface ClubMembership {
  clubId: string;
  userId: string;
  role: Role;
}

declare global {
  namespace Express {
    // passport's Request.user is an (empty) Express.User: give it our shape.
    interface User extends AuthUser {}
    interface Request {
      membership?: ClubMembership;
    }
  }
}

export interface AuthGuards {
  requireUser: RequestHandler;
  requireMembership: RequestHandler;
}

const ACCOUNT_GONE = 'account no longer exists';
const SESSION_ENDED = 'session ended';

const guardsByDeps = new WeakMap<AppDeps, AuthGuards>();

function explainJwtFailure(info: unknown): AppError {
  const name = info instanceof Error ? info.name : '';
  const message = info instanceof Error ? info.message : '';
  if (name === 'TokenExpiredError') return new AppError('token_expired', 'unauthenticated', 'your session has expired: refresh it or sign in again');
  if (message === 'No auth token') return new AppError('unauthenticated', 'unauthenticated', 'sign in first: send Authorization: Bearer <access token>');
  if (name === 'NotBeforeError') return new AppError('token_invalid', 'unauthenticated', 'this access token is not valid yet');
  return new AppError('token_invalid', 'unauthenticated', 'the access token is not valid (tampered, malformed or signed by another server): sign in again');
}

/** Guards bound to one app's secret and database (memoised per deps). */
export function authGuards(deps: AppDeps): AuthGuards {
  const known = guardsByDeps.get(deps);
  if (known) return known;

  const passport = new Passport();
  passport.use(
    new JwtStrategy(
      {
        jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
        secretOrKey: deps.config.jwtSecret,
        algorithms: ['HS256'],
        issuer: ACCESS_TOKEN_ISSUER,
        audience: ACCESS_TOKEN_AUDIENCE,
      },
      (payload: AccessTokenPayload, done: (err: unknown, user?: AuthUser | false, info?: unknown) => void) => {
        if (payload.typ !== 'access' || !idSchema.safeParse(payload.sub).success || !idSchema.safeParse(payload.sid).success) {
          done(null, false, new Error('not an access token'));
          return;
        }
        // The session must still be open: a sign-out, a password reset or a reused refresh token revokes every
        // refresh token of the family, and its access tokens stop working at once rather than up to 15 min later.
        Promise.all([
          deps.dataSource.getRepository(UserEntity).findOneBy({ id: payload.sub }),
          deps.dataSource.getRepository(RefreshTokenEntity).existsBy({ familyId: payload.sid, userId: payload.sub, revokedAt: IsNull() }),
        ]).then(([u, open]) => {
          if (!u) done(null, false, new Error(ACCOUNT_GONE));
          else if (!open) done(null, false, new Error(SESSION_ENDED));
          else done(null, { id: u.id, email: u.email, displayName: u.displayName, callSign: u.callSign });
        }, done);
      },
    ),
  );

  const requireUser: RequestHandler = (req, res, next) => {
    passport.authenticate('jwt', { session: false }, (err: unknown, user: AuthUser | false, info: unknown) => {
      if (err) return next(err);
      if (!user) {
        if (info instanceof Error && info.message === ACCOUNT_GONE) {
          return next(new AppError('token_invalid', 'unauthenticated', 'this account no longer exists'));
        }
        if (info instanceof Error && info.message === SESSION_ENDED) {
          return next(new AppError('session_ended', 'unauthenticated', 'this session was signed out (or its password was reset): sign in again'));
        }
        return next(explainJwtFailure(info));
      }
      req.user = user;
      next();
    })(req, res, next);
  };

  const requireMembership: RequestHandler = async (req, _res, next) => {
    if (!req.user) return next(new AppError('unauthenticated', 'unauthenticated', 'sign in first'));
    const clubId = req.params.clubId;
    // A malformed id is "no such club" to the caller, as is a club they do not belong to.
    if (typeof clubId !== 'string' || !idSchema.safeParse(clubId).success) return next(new AppError('not_found', 'not_found', 'club not found'));
    const m = await deps.dataSource.getRepository(MembershipEntity).findOneBy({ clubId, userId: req.user.id });
    if (!m) return next(new AppError('not_found', 'not_found', 'club not found'));
    req.membership = { clubId, userId: m.userId, role: m.role };
    next();
  };

  const guards = { requireUser, requireMembership };
  guardsByDeps.set(deps, guards);
  return guards;
}

export const requireUser = (deps: AppDeps): RequestHandler => authGuards(deps).requireUser;
export const requireMembership = (deps: AppDeps): RequestHandler => authGuards(deps).requireMembership;

/** 403 unless the member's role in this club grants `ability` (use after requireMembership). */
export function requireAbility(ability: Ability): RequestHandler {
  return (req, _res, next) => {
    const m = req.membership;
    if (!m) return next(new AppError('not_found', 'not_found', 'club not found'));
    if (!can(m.role, ability)) {
      return next(new AppError('forbidden', 'forbidden', `your role in this club (${m.role}) does not allow this`, { needs: ability, role: m.role }));
    }
    next();
  };
}
