// Short-lived access tokens (JWT, HS256). Verification is in http/auth.ts (passport-jwt).
import jwt from 'jsonwebtoken';
import type { Clock } from '../app-deps';

export const ACCESS_TOKEN_ISSUER = 'loftline';
export const ACCESS_TOKEN_AUDIENCE = 'loftline-api';

export interface AccessTokenPayload {
  sub: string;
  /** The session (refresh-token family) it was issued in: signing out or a password reset ends it at once. */
  sid: string;
  typ: 'access';
  iat?: number;
  exp?: number;
}

/** Signs an access token for `userId` in session `sessionId`, issued at the clock's now and valid for `ttlS` seconds. */
export function signAccessToken(userId: string, sessionId: string, secret: string, ttlS: number, clock: Clock): string {
  const iat = Math.floor(clock.now().getTime() / 1000);
  const payload: AccessTokenPayload = { sub: userId, sid: sessionId, typ: 'access', iat };
  return jwt.sign(payload, secret, { algorithm: 'HS256', expiresIn: ttlS, issuer: ACCESS_TOKEN_ISSUER, audience: ACCESS_TOKEN_AUDIENCE });
}
