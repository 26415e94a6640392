import { createHash, randomBytes } from 'node:crypto';

/** Lifetime of an invitation link. */
export const INVITATION_DAYS = 7;

/** A fresh e-mailed link token (256 random bits, URL-safe) and the SHA-256 that is stored in its place. */
export function newLinkToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
