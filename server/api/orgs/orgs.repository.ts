import { and, asc, desc, eq, isNull, sql } from 'drizzle-orm';
import type { DbOrTx } from '@/db/client';
import { newId } from '@/db/new-id';
import { invitations, memberships, organizations, users } from '@/db/schema';
import type { Role } from '@/shared/schemas/auth';
import type { InvitationRow, MemberRow } from '@/shared/schemas/orgs';

const invitationRow = {
  id: invitations.id,
  email: invitations.email,
  role: invitations.role,
  createdAt: invitations.createdAt,
  expiresAt: invitations.expiresAt,
  acceptedAt: invitations.acceptedAt,
};

export function findOrganization(db: DbOrTx, orgId: string) {
  return db.select().from(organizations).where(eq(organizations.id, orgId)).get();
}

export function listMembers(db: DbOrTx, orgId: string): MemberRow[] {
  return db
    .select({
      userId: users.id,
      name: users.name,
      email: users.email,
      role: memberships.role,
      joinedAt: memberships.createdAt,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.orgId, orgId))
    .orderBy(asc(memberships.createdAt), asc(sql`${memberships}.rowid`))
    .all();
}

export function isMemberByEmail(db: DbOrTx, orgId: string, email: string): boolean {
  const row = db
    .select({ id: memberships.id })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.orgId, orgId), eq(users.email, email)))
    .get();
  return row !== undefined;
}

/** Invitations not accepted yet (expired ones included, so an owner sees what to send again). */
export function listPendingInvitations(db: DbOrTx, orgId: string): InvitationRow[] {
  return db
    .select(invitationRow)
    .from(invitations)
    .where(and(eq(invitations.orgId, orgId), isNull(invitations.acceptedAt)))
    .orderBy(desc(invitations.createdAt), desc(sql`${invitations}.rowid`))
    .all();
}

export function deletePendingInvitationsFor(db: DbOrTx, orgId: string, email: string): void {
  db.delete(invitations)
    .where(and(eq(invitations.orgId, orgId), eq(invitations.email, email), isNull(invitations.acceptedAt)))
    .run();
}

export function insertInvitation(
  db: DbOrTx,
  invitation: {
    orgId: string;
    email: string;
    role: Role;
    tokenHash: string;
    invitedBy: string;
    expiresAt: Date;
  },
): InvitationRow {
  const row = {
    id: newId(),
    ...invitation,
    createdAt: new Date().toISOString(),
    expiresAt: invitation.expiresAt.toISOString(),
  };
  db.insert(invitations).values(row).run();
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    createdAt: row.createdAt,
    expiresAt: row.expiresAt,
    acceptedAt: null,
  };
}

/** Deletes a pending invitation of this firm; false when there is none with that id. */
export function deletePendingInvitation(db: DbOrTx, orgId: string, invitationId: string): boolean {
  const result = db
    .delete(invitations)
    .where(
      and(eq(invitations.id, invitationId), eq(invitations.orgId, orgId), isNull(invitations.acceptedAt)),
    )
    .run();
  return result.changes > 0;
}
