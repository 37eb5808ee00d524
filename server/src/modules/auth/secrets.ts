// Passwords and opaque tokens. Passwords: argon2id with the OWASP Password Storage Cheat Sheet's first
// recommended setting (m = 19 MiB, t = 2, p = 1). Opaque tokens (refresh, reset, invitation): 256 random bits,
// stored only as their sha256, so a leaked table grants nothing.
import { createHash, randomBytes } from 'node:crypto';
import argon2 from 'argon2';

const ARGON2_OPTIONS = { type: argon2.argon2id, memoryCost: 19 * 1024, timeCost: 2, parallelism: 1 } as const;

export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, ARGON2_OPTIONS);
}

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}

let dummyHash: Promise<string> | null = null;
/** Verifies against a throwaway hash so an unknown e-mail takes as long as a wrong password. */
export async function burnPasswordCheck(password: string): Promise<void> {
  dummyHash ??= hashPassword('not-a-real-password-for-timing');
  await verifyPassword(await dummyHash, password);
}

export const newOpaqueToken = (): string => randomBytes(32).toString('base64url');
export const hashToken = (token: string): string => createHash('sha256').update(token, 'utf8').digest('hex');
