// Short-lived access tokens (JWT, HS256). Verification is in http/auth.ts (passport-jwt).
import jwt from 'jsonwebtoken';
import type { Clock } from '../app-deps';

export const ACCESS_TOKEN_ISSUER = 'loftline';
export const ACCESS_TOKEN_AUDIENCE = 'loftline-api';

export interface AccessTokenPayload {
  sub: string;
  typ: 'access';
  iat?: number;
  exp?: number;
}

/** Signs an access token for `userId`, issued at the clock's now and valid for `ttlS` seconds. */
export function signAccessToken(userId: string, secret: string, ttlS: number, clock: Clock): string {
  const iat = Math.floor(clock.now().getTime() / 1000);
  const payload: AccessTokenPayload = { sub: userId, typ: 'access', iat };
  return jwt.sign(payload, secret, { algorithm: 'HS256', expiresIn: ttlS, issuer: ACCESS_TOKEN_ISSUER, audience: ACCESS_TOKEN_AUDIENCE });
}
