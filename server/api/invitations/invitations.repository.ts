import { and, eq, gt, isNull } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { invitations, organizations, users } from '@/db/schema';

/** A pending, unexpired invitation with its firm and inviter, or undefined. */
export function findOpenInvitation(db: DbOrTx, tokenHash: string, now: Date) {
  return db
    .select({
      id: invitations.id,
      orgId: invitations.orgId,
      email: invitations.email,
      role: invitations.role,
      expiresAt: invitations.expiresAt,
      orgName: organizations.name,
      invitedBy: users.name,
    })
    .from(invitations)
    .innerJoin(organizations, eq(organizations.id, invitations.orgId))
    .innerJoin(users, eq(users.id, invitations.invitedBy))
    .where(
      and(
        eq(invitations.tokenHash, tokenHash),
        isNull(invitations.acceptedAt),
        gt(invitations.expiresAt, now.toISOString()),
      ),
    )
    .get();
}

/** Marks the invitation used; false when another request used it first. */
export function markAccepted(db: DbOrTx, invitationId: string, at: Date): boolean {
  const result = db
    .update(invitations)
    .set({ acceptedAt: at.toISOString() })
    .where(and(eq(invitations.id, invitationId), isNull(invitations.acceptedAt)))
    .run();
  return result.changes > 0;
}
