import { createHash, randomBytes } from 'node:crypto';

/** Lifetime of an invitation link. */
export const INVITATION_DAYS = 7;

/** A fresh link token (256 random bits, URL-safe) and the SHA-256 that is stored in its place. */
export function newInvitationToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashInvitationToken(token) };
}

export function hashInvitationToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
